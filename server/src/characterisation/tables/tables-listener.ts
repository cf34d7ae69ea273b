/**
 * A feature that uses tables hears when a process version gets new ones (a characterisation finished), e.g. the sheets,
 * whose devices waiting for a table are then computed. Registered with `{ provide: TABLES_LISTENERS, useClass: … }` in
 * that feature's module; characterisation knows no sheet.
 */
export interface TablesListener {
  tablesChanged(processVersionId: string): Promise<void>;
}

export const TABLES_LISTENERS = Symbol('TABLES_LISTENERS');
