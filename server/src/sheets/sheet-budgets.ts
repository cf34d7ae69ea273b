import type { LeakageBudget, OffsetBudget } from '@channelwright/shared/schemas';
import type { SheetEntity } from './sheet.entity.js';

/** The budget columns of a sheet row from the request's fields (JSON text). */
export function budgetColumns(fields: { leakageBudget?: LeakageBudget | null; offsetBudgets?: OffsetBudget[] }): Partial<Pick<SheetEntity, 'leakageBudget' | 'offsetBudgets'>> {
  return {
    ...(fields.leakageBudget === undefined ? {} : { leakageBudget: fields.leakageBudget === null ? null : JSON.stringify(fields.leakageBudget) }),
    ...(fields.offsetBudgets === undefined ? {} : { offsetBudgets: JSON.stringify(fields.offsetBudgets) }),
  };
}

export function leakageBudgetOf(sheet: Pick<SheetEntity, 'leakageBudget'>): LeakageBudget | null {
  return sheet.leakageBudget === null ? null : (JSON.parse(sheet.leakageBudget) as LeakageBudget);
}

export function offsetBudgetsOf(sheet: Pick<SheetEntity, 'offsetBudgets'>): OffsetBudget[] {
  return JSON.parse(sheet.offsetBudgets || '[]') as OffsetBudget[];
}
