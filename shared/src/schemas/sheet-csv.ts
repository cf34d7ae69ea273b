/**
 * The sheet's CSV (GET /api/sheets/:id/export?format=csv, read back by POST /api/sheets/:id/import),
 * formatVersion 2: UTF-8 without a byte-order mark, CRLF, RFC 4180 quoting. The metadata comes first as `#`
 * comment lines (or, with metadata=none, not at all; format=csv-metadata gives it as a second file), then a
 * header row whose titles carry the units ("W (m)", "W (um)" with lengths=um), then one row per device.
 * Numbers are plain decimal text in the header's unit (no prefixes, no thousands separators); an empty cell
 * is a value the device does not have. PMOS voltages are polarity-normalised: its VGS, VDS and VSB columns
 * hold VSG, VSD and VBS (positive for an enhancement device), its VT column −VTP.
 *
 * `target` columns are what an import reads; the others are results the engine computes again.
 * `unit` is the SI unit of a number column ('' plain), absent for text; `length` marks lengths (m or µm).
 */
export interface SheetCsvColumnInfo {
  readonly key: string;
  /** The title without its unit. */
  readonly label: string;
  readonly unit?: string;
  readonly length?: boolean;
  readonly target?: boolean;
}

export const SHEET_CSV_FORMAT_VERSION = 2;

const c = <K extends string>(key: K, label: string, extra: Omit<SheetCsvColumnInfo, 'key' | 'label'> = {}): SheetCsvColumnInfo & { key: K } => ({ key, label, ...extra });

export const SHEET_CSV_COLUMNS = [
  c('name', 'Name', { target: true }),
  c('function', 'Function', { target: true }),
  c('polarity', 'Polarity', { target: true }),
  c('flavour', 'Flavour', { target: true }),
  c('multiplier', 'Multiplier', { unit: '', target: true }),
  c('matchGroup', 'Match group', { target: true }),
  c('supplyBranch', 'Supply branch', { target: true }),
  c('constraint', 'Constraint', { target: true }),
  c('targetVov', 'Target VOV', { unit: 'V', target: true }),
  c('targetGmId', 'Target gm/ID', { unit: '1/V', target: true }),
  c('targetW', 'Target W', { unit: 'm', length: true, target: true }),
  c('targetVgs', 'Target VGS', { unit: 'V', target: true }),
  c('corner', 'Corner', { target: true }),
  c('temperature', 'Temperature', { unit: 'degC', target: true }),
  c('model', 'Model', { target: true }),
  c('w', 'W', { unit: 'm', length: true }),
  c('l', 'L', { unit: 'm', length: true, target: true }),
  c('wOverL', 'W/L', { unit: '' }),
  c('fingers', 'Fingers', { unit: '' }),
  c('fingerWidth', 'Finger width', { unit: 'm', length: true }),
  c('id', 'ID', { unit: 'A', target: true }),
  c('vgs', 'VGS', { unit: 'V' }),
  c('vds', 'VDS', { unit: 'V', target: true }),
  c('vsb', 'VSB', { unit: 'V', target: true }),
  c('vt', 'VT', { unit: 'V' }),
  c('vov', 'VOV', { unit: 'V' }),
  c('vdsat', 'VDSsat', { unit: 'V' }),
  c('gmId', 'gm/ID', { unit: '1/V' }),
  c('gm', 'gm', { unit: 'S' }),
  c('gds', 'gds', { unit: 'S' }),
  c('ro', 'ro', { unit: 'Ohm' }),
  c('intrinsicGain', 'Intrinsic gain', { unit: 'V/V' }),
  c('ic', 'Inversion coefficient', { unit: '' }),
  c('region', 'Region'),
  c('cgs', 'Cgs', { unit: 'F' }),
  c('cgd', 'Cgd', { unit: 'F' }),
  c('ft', 'fT', { unit: 'Hz' }),
  c('sigmaVos', 'Pair sigma VOS', { unit: 'V' }),
  c('ioff', 'Ioff', { unit: 'A' }),
  c('drainNode', 'Drain node', { target: true }),
  c('gateNode', 'Gate node', { target: true }),
  c('sourceNode', 'Source node', { target: true }),
  c('bulkNode', 'Bulk node', { target: true }),
  c('warnings', 'Warnings'),
  c('error', 'Error'),
  c('stale', 'Stale'),
  c('notes', 'Notes', { target: true }),
] as const satisfies readonly SheetCsvColumnInfo[];
export type SheetCsvColumn = (typeof SHEET_CSV_COLUMNS)[number]['key'];

/** The header title of a column: "W (m)", "W (um)" with lengths in µm, "Name" for text. */
export function sheetCsvTitle(column: SheetCsvColumnInfo, lengths: 'm' | 'um' = 'm'): string {
  if (column.unit === undefined) return column.label;
  if (column.unit === '') return column.label;
  return `${column.label} (${column.length && lengths === 'um' ? 'um' : column.unit})`;
}

/** What the `#` lines say about PMOS voltages, and an import's reader should know. */
export const SHEET_CSV_SIGN_CONVENTION =
  'PMOS voltages are polarity-normalised: the VGS, VDS and VSB columns of a PMOS hold VSG, VSD and VBS (positive for an enhancement device) and its VT column holds -VTP';
