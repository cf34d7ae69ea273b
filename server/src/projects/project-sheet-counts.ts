/**
 * How many sheets each project holds, for the project list: answered by the sheets feature, which
 * registers one with `{ provide: PROJECT_SHEET_COUNTS, useClass: … }` (projects knows no sheet).
 */
export interface ProjectSheetCounts {
  countByProject(projectIds: readonly string[]): Promise<ReadonlyMap<string, number>>;
}

export const PROJECT_SHEET_COUNTS = Symbol('PROJECT_SHEET_COUNTS');
