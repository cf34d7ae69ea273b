import type { LoadedSheet } from './sheet-response.js';

/** The sheet's newest revision as an export names it: its label, its hash, and whether the sheet still holds what it froze. */
export interface SheetRevisionFact {
  label: string;
  hash: string;
  matchesSheet: boolean;
}

/**
 * A feature that freezes sheets (revisions) tells the export which revision a sheet is at: it registers
 * `{ provide: SHEET_REVISION_FACTS, useClass: … }`. Sheets know no revision; with none registered, exports
 * say "no revision".
 */
export interface SheetRevisionFacts {
  newestOf(loaded: LoadedSheet): Promise<SheetRevisionFact | null>;
}

export const SHEET_REVISION_FACTS = Symbol('SHEET_REVISION_FACTS');
