import type { AuditRecord } from './audit-record.js';

interface SheetFacts {
  id: string;
  projectId: string;
  name: string;
}

const DEVICE_VERBS = { 'device.created': 'Added', 'device.updated': 'Edited', 'device.deleted': 'Deleted' } as const;
const SHEET_VERBS = { 'sheet.created': 'Created', 'sheet.updated': 'Edited', 'sheet.deleted': 'Deleted', 'sheet.recomputed': 'Recomputed', 'sheet.imported': 'Imported a CSV into', 'sheet.migrated': 'Migrated to a new process:' } as const;

/** The audit record of a device change (the actor is the request's user). */
export function deviceAudit(action: keyof typeof DEVICE_VERBS, sheet: SheetFacts, device: { id: string; name: string }, before?: unknown, after?: unknown): AuditRecord {
  return { projectId: sheet.projectId, entityType: 'device', entityId: device.id, action, before, after, summary: `${DEVICE_VERBS[action]} ${device.name} in ${sheet.name}` };
}

/** The audit record of a change of a sheet's own fields, its deletion or a recompute. */
export function sheetAudit(action: keyof typeof SHEET_VERBS, sheet: SheetFacts, before?: unknown, after?: unknown): AuditRecord {
  return { projectId: sheet.projectId, entityType: 'sheet', entityId: sheet.id, action, before, after, summary: `${SHEET_VERBS[action]} the sheet ${sheet.name}` };
}

/** The parts of a sheet row worth showing before and after an edit. */
export function sheetFields(sheet: {
  name: string;
  description: string;
  processVersionId: string;
  temperature: number | null;
  corner: string;
  model: string;
  leakageBudget: string | null;
  offsetBudgets: string;
  version: number;
}) {
  const { name, description, processVersionId, temperature, corner, model, version } = sheet;
  return { name, description, processVersionId, temperature, corner, model, leakageBudget: sheet.leakageBudget === null ? null : JSON.parse(sheet.leakageBudget), offsetBudgets: JSON.parse(sheet.offsetBudgets || '[]'), version };
}
