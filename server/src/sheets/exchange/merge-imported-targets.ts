import { deviceTargetsSchema, type DeviceTargets, type SheetCsvColumn } from '@channelwright/shared/schemas';

const CONSTRAINT_COLUMNS: readonly SheetCsvColumn[] = ['constraint', 'targetVov', 'targetGmId', 'targetW', 'targetVgs'];
const NODE_COLUMNS = { drainNode: 'drain', gateNode: 'gate', sourceNode: 'source', bulkNode: 'bulk' } as const;
const PLAIN: ReadonlyArray<SheetCsvColumn & keyof DeviceTargets> = ['name', 'function', 'polarity', 'flavour', 'multiplier', 'matchGroup', 'supplyBranch', 'corner', 'temperature', 'model', 'l', 'id', 'vds', 'vsb', 'notes'];

/**
 * The targets a CSV row leaves on a device it names: the fields whose columns the file has come from the row
 * (an empty optional cell clears the field, back to the sheet's default), every other field stays as stored
 * (the limits always: the CSV has no column for them). Checked again with the shared schema; a refusal is a
 * sentence for the row's problem.
 */
export function mergeImportedTargets(stored: DeviceTargets, row: DeviceTargets, columns: readonly SheetCsvColumn[]): DeviceTargets | string {
  const merged: Record<string, unknown> = { ...stored };
  for (const key of PLAIN) {
    if (!columns.includes(key)) continue;
    if (row[key] === undefined) delete merged[key];
    else merged[key] = row[key];
  }
  if (columns.some((key) => CONSTRAINT_COLUMNS.includes(key))) {
    for (const name of ['vov', 'gmId', 'w', 'vgs'] as const) {
      delete merged[name];
      if (row[name] !== undefined) merged[name] = row[name];
    }
  }
  const nodes: Record<string, string> = { ...stored.nodes };
  for (const [column, terminal] of Object.entries(NODE_COLUMNS)) {
    if (!columns.includes(column as SheetCsvColumn)) continue;
    const given = row.nodes?.[terminal];
    if (given === undefined) delete nodes[terminal];
    else nodes[terminal] = given;
  }
  if (Object.keys(nodes).length > 0) merged.nodes = nodes;
  else delete merged.nodes;
  const checked = deviceTargetsSchema.safeParse(merged);
  return checked.success ? checked.data : checked.error.issues[0].message;
}
