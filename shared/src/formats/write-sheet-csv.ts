import type { Device } from '../schemas/device.js';
import { SHEET_CSV_COLUMNS, sheetCsvTitle, type SheetCsvColumn, type SheetCsvColumnInfo } from '../schemas/sheet-csv.js';
import type { Sheet } from '../schemas/sheets.js';
import { csvLine, safeTextCell } from './csv-cell.js';
import { plainNumber, plainNumberIn } from './plain-number.js';
import { sheetMetadata, type SheetExportContext } from './sheet-metadata.js';

export interface SheetCsvOptions {
  /** comments: the metadata as `#` lines above the header; none: the table alone. */
  metadata?: 'comments' | 'none';
  lengths?: 'm' | 'um';
}

type Value = string | number | boolean | null | undefined;

/**
 * A sheet as CSV (the layout of schemas/sheet-csv.ts): `#` metadata lines unless metadata is "none", the
 * header with units, one row per device; CRLF line ends, RFC 4180 quoting, UTF-8 without a byte-order mark.
 */
export function writeSheetCsv(sheet: Sheet, context: SheetExportContext, options: SheetCsvOptions = {}): string {
  const lengths = options.lengths ?? 'm';
  const lines: string[] = [];
  if ((options.metadata ?? 'comments') === 'comments') {
    for (const [key, value] of sheetMetadata(sheet, { ...context, lengths })) lines.push(`# ${key}: ${value}`);
  }
  lines.push(csvLine(SHEET_CSV_COLUMNS.map((column) => sheetCsvTitle(column, lengths))));
  for (const device of sheet.devices) lines.push(csvLine(SHEET_CSV_COLUMNS.map((column) => cellText(column, valueOf(device, column.key), lengths))));
  return `${lines.join('\r\n')}\r\n`;
}

/** The metadata alone as key,value rows: the second file beside a plain table. */
export function writeSheetMetadataCsv(sheet: Sheet, context: SheetExportContext): string {
  const rows = [['key', 'value'], ...sheetMetadata(sheet, context)];
  return `${rows.map((row) => csvLine(row.map(safeTextCell))).join('\r\n')}\r\n`;
}

function cellText(column: SheetCsvColumnInfo, value: Value, lengths: 'm' | 'um'): string {
  if (value === null || value === undefined) return '';
  if (typeof value === 'number') return column.length && lengths === 'um' ? plainNumberIn(value, -6) : plainNumber(value);
  if (typeof value === 'boolean') return String(value);
  return safeTextCell(value);
}

function valueOf(device: Device, key: SheetCsvColumn): Value {
  const { targets, result, sizeRequest } = device;
  switch (key) {
    case 'name':
    case 'function':
    case 'polarity':
    case 'multiplier':
    case 'supplyBranch':
    case 'notes':
      return targets[key];
    case 'flavour':
    case 'matchGroup':
      return targets[key];
    case 'constraint':
      return device.constraint;
    case 'targetVov':
      return targets.vov;
    case 'targetGmId':
      return targets.gmId;
    case 'targetW':
      return targets.w;
    case 'targetVgs':
      return targets.vgs;
    case 'corner':
      return targets.corner;
    case 'temperature':
      return targets.temperature;
    case 'model':
      return targets.model;
    case 'drainNode':
      return targets.nodes?.drain;
    case 'gateNode':
      return targets.nodes?.gate;
    case 'sourceNode':
      return targets.nodes?.source;
    case 'bulkNode':
      return targets.nodes?.bulk;
    case 'warnings':
      return result ? result.warnings.map((w) => w.code).join('; ') : null;
    case 'error':
      return device.error ? `${device.error.code}: ${device.error.message}` : null;
    case 'stale':
      return device.stale;
    case 'id':
    case 'l':
    case 'vds':
    case 'vsb':
      // The target (a VGS-constrained device reaches it to within the width grid).
      return sizeRequest[key];
    default:
      return result?.[key] ?? null;
  }
}
