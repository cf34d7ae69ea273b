import { existsSync, readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import type { ModelCardMapping } from '@channelwright/shared/schemas';
import { Injectable } from '@nestjs/common';
import type { DemoModelCards } from '../../processes/processes-demo.seeder.js';

const DEMO_CORNERS = { TT: 'tt', FF: 'ff', SS: 'ss', FS: 'fs', SF: 'sf' };

/** The invented cards of the invented demo processes (docs/characterisation.md, section 2) and their mappings. */
const CARDS: Readonly<Record<string, { file: string; mapping: ModelCardMapping }>> = {
  'BF180-G': {
    file: 'bf180g.lib',
    mapping: {
      corners: DEMO_CORNERS,
      devices: [
        { model: 'bfn18', polarity: 'nmos' },
        { model: 'bfp18', polarity: 'pmos' },
        { model: 'bfn18na', polarity: 'nmos', flavour: 'native' },
      ],
    },
  },
  'BF130-G': {
    file: 'bf130g.lib',
    mapping: {
      corners: DEMO_CORNERS,
      devices: [
        { model: 'bfn13', polarity: 'nmos' },
        { model: 'bfp13', polarity: 'pmos' },
      ],
    },
  },
};

/** A card file: beside the running module when a build step copied the cards there, else in src/ (jest and dist/ both find it). */
function demoCardFile(name: string): string {
  const beside = join(import.meta.dirname, '..', 'demo-cards', name);
  if (existsSync(beside)) return beside;
  return resolve(import.meta.dirname, '..', '..', '..', 'src', 'characterisation', 'demo-cards', name);
}

/** Gives the library the demo processes' invented cards (DEMO_MODEL_CARDS). */
@Injectable()
export class DemoModelCardFiles implements DemoModelCards {
  cardFor(processName: string): { text: string; mapping: ModelCardMapping } | null {
    const card = CARDS[processName];
    return card ? { text: readFileSync(demoCardFile(card.file), 'utf8'), mapping: card.mapping } : null;
  }
}
