import type { EntityManager } from 'typeorm';

/**
 * A feature that keeps records of a sheet (revisions) may refuse its deletion: it registers one with
 * `{ provide: SHEET_REMOVAL_CHECKS, useClass: … }`, and `assertRemovable` throws a DomainError (nothing
 * is written) inside the deleting transaction. Sheets know no revision.
 */
export interface SheetRemovalCheck {
  assertRemovable(manager: EntityManager, sheetId: string): Promise<void>;
}

export const SHEET_REMOVAL_CHECKS = Symbol('SHEET_REMOVAL_CHECKS');
