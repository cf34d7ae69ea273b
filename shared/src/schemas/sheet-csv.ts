/**
 * GET /api/sheets/:id/export?format=csv, our own layout (formatVersion 1): UTF-8 without a byte-order
 * mark, CRLF, RFC 4180 quoting. First a `key,value` block of metadata (format, formatVersion, project,
 * sheet, process, processVersion, engineVersion, exportedAt, stale, devices and the totals with units
 * in their keys), then one empty line, then the device table: this header row, one row per device.
 * Numbers are plain SI written by String(number), so papaparse, Python's csv with float() and
 * spreadsheets read back the same double; an empty cell is a value the device does not have.
 * The columns, in order: field key and column title with its unit.
 */
export const SHEET_CSV_COLUMNS = [
  ['name', 'Name'],
  ['function', 'Function'],
  ['polarity', 'Polarity'],
  ['flavour', 'Flavour'],
  ['multiplier', 'Multiplier'],
  ['matchGroup', 'Match group'],
  ['supplyBranch', 'Supply branch'],
  ['constraint', 'Constraint'],
  ['corner', 'Corner'],
  ['temperature', 'Temperature (degC)'],
  ['model', 'Model'],
  ['w', 'W (m)'],
  ['l', 'L (m)'],
  ['wOverL', 'W/L'],
  ['fingers', 'Fingers'],
  ['fingerWidth', 'Finger width (m)'],
  ['id', 'ID (A)'],
  ['vgs', 'VGS (V)'],
  ['vds', 'VDS (V)'],
  ['vsb', 'VSB (V)'],
  ['vt', 'VT (V)'],
  ['vov', 'VOV (V)'],
  ['vdsat', 'VDSsat (V)'],
  ['gmId', 'gm/ID (1/V)'],
  ['gm', 'gm (S)'],
  ['gds', 'gds (S)'],
  ['ro', 'ro (Ohm)'],
  ['intrinsicGain', 'Intrinsic gain (V/V)'],
  ['ic', 'Inversion coefficient'],
  ['region', 'Region'],
  ['cgs', 'Cgs (F)'],
  ['cgd', 'Cgd (F)'],
  ['ft', 'fT (Hz)'],
  ['sigmaVos', 'Pair sigma VOS (V)'],
  ['ioff', 'Ioff (A)'],
  ['warnings', 'Warnings'],
  ['error', 'Error'],
  ['stale', 'Stale'],
] as const;
export type SheetCsvColumn = (typeof SHEET_CSV_COLUMNS)[number][0];
