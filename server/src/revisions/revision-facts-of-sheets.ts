import { Injectable } from '@nestjs/common';
import type { SheetRevisionFact, SheetRevisionFacts } from '../sheets/sheet-revision-facts.js';
import type { LoadedSheet } from '../sheets/sheet-response.js';
import { RevisionReader } from './revision-reader.js';
import { sheetMatchesRevision } from './sheet-matches-revision.js';

/** Tells the sheets' export the newest revision of a sheet, its hash, and whether the sheet has changed since. */
@Injectable()
export class RevisionFactsOfSheets implements SheetRevisionFacts {
  constructor(private readonly reader: RevisionReader) {}

  async newestOf(loaded: LoadedSheet): Promise<SheetRevisionFact | null> {
    const [newest] = await this.reader.loadSheet(loaded.sheet.id);
    if (!newest) return null;
    const devices = await this.reader.devices(newest.revision.id);
    return { label: `r${newest.revision.number}`, hash: newest.revision.hash, matchesSheet: sheetMatchesRevision(loaded, newest.revision, devices) };
  }
}
