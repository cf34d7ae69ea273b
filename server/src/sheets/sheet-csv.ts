import { ENGINE_VERSION } from '@channelwright/shared/device';
import { SHEET_CSV_COLUMNS, type Device, type Sheet, type SheetCsvColumn } from '@channelwright/shared/schemas';
import Papa from 'papaparse';

/** The version of the CSV layout below; raise it when a reader would have to change. */
export const SHEET_CSV_FORMAT_VERSION = 1;

type Cell = string | number | boolean | null;

/**
 * A sheet as CSV, RFC 4180 quoting by papaparse, CRLF line ends, UTF-8 without a byte-order mark.
 * Layout: first a `key,value` block of metadata (format, project, sheet, process name and version,
 * engine version, export time, totals), then one empty line, then the device table: a header row
 * whose titles carry the units ("W (m)") and one row per device. Numbers are plain SI written with
 * String(number), which reads back to the same double in any reader (papaparse, Python's csv and
 * float(), spreadsheets). An empty cell is a value the device does not have (no result, ro infinite).
 * Text a spreadsheet would run as a formula is escaped with a leading apostrophe.
 */
export function sheetCsv(sheet: Sheet, projectName: string, exportedAt: Date): string {
  const { totals, process } = sheet;
  const metadata: Cell[][] = [
    ['format', 'channelwright-sheet'],
    ['formatVersion', SHEET_CSV_FORMAT_VERSION],
    ['project', projectName],
    ['sheet', sheet.name],
    ['process', process.name],
    ['processVersion', process.version],
    ['engineVersion', ENGINE_VERSION],
    ['exportedAt', exportedAt.toISOString()],
    ['stale', sheet.stale],
    ['devices', sheet.devices.length],
    ['supplyCurrent (A)', totals.supplyCurrent],
    ['supplyPower (W)', totals.supplyPower],
    ['gateArea (m2)', totals.gateArea],
    ['leakageTemperature (degC)', totals.leakage.slowest.temperature],
    ['leakageSlowestCorner', totals.leakage.slowest.corner],
    ['leakageSlowest (A)', totals.leakage.slowest.current],
    ['leakageFastestCorner', totals.leakage.fastest.corner],
    ['leakageFastest (A)', totals.leakage.fastest.current],
  ];
  const options = { escapeFormulae: true, newline: '\r\n' };
  const head = Papa.unparse({ fields: ['key', 'value'], data: metadata }, options);
  const table = Papa.unparse({ fields: SHEET_CSV_COLUMNS.map(([, title]) => title), data: sheet.devices.map(deviceRow) }, options);
  return `${head}\r\n\r\n${table}\r\n`;
}

function deviceRow(device: Device): Cell[] {
  return SHEET_CSV_COLUMNS.map(([key]) => cellOf(device, key));
}

function cellOf(device: Device, key: SheetCsvColumn): Cell {
  const { targets, result, sizeRequest } = device;
  switch (key) {
    case 'name':
    case 'function':
    case 'polarity':
    case 'multiplier':
    case 'supplyBranch':
      return targets[key];
    case 'flavour':
    case 'matchGroup':
      return targets[key] ?? null;
    case 'constraint':
      return device.constraint;
    case 'warnings':
      return result ? result.warnings.map((w) => w.code).join('; ') : null;
    case 'error':
      return device.error ? `${device.error.code}: ${device.error.message}` : null;
    case 'stale':
      return device.stale;
    case 'corner':
    case 'model':
      return result?.[key] ?? sizeRequest[key];
    case 'temperature':
      return result?.temperature ?? sizeRequest.temperature ?? null;
    case 'id':
    case 'l':
    case 'vds':
    case 'vsb':
      return result?.[key] ?? sizeRequest[key];
    default:
      return result?.[key] ?? null;
  }
}

/** A file name of safe characters: "<project>-<sheet>.csv". */
export function sheetCsvFileName(projectName: string, sheetName: string): string {
  const safe = (text: string) => text.replace(/[^A-Za-z0-9._-]+/g, '_').replace(/^_+|_+$/g, '') || 'sheet';
  return `${safe(projectName)}-${safe(sheetName)}.csv`;
}
