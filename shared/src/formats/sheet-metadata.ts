import { SHEET_CSV_FORMAT_VERSION, SHEET_CSV_SIGN_CONVENTION } from '../schemas/sheet-csv.js';
import type { Sheet } from '../schemas/sheets.js';
import { plainNumber } from './plain-number.js';

/** Who exported what, and with which engine: the provenance written beside a sheet's table. */
export interface SheetExportContext {
  projectName: string;
  exportedAt: Date;
  engineVersion: string;
  lengths?: 'm' | 'um';
}

export const EXPORT_CAUTION = "First-order estimates: verify with the foundry's models and sign-off simulation before silicon";

/** The metadata of a sheet's CSV as key, value pairs (the `#` lines, or the second file). */
export function sheetMetadata(sheet: Sheet, context: SheetExportContext): Array<[string, string]> {
  const { totals, process } = sheet;
  const pairs: Array<[string, string | number | boolean]> = [
    ['format', 'channelwright-sheet'],
    ['formatVersion', SHEET_CSV_FORMAT_VERSION],
    ['project', context.projectName],
    ['sheet', sheet.name],
    ['process', process.name],
    ['processVersion', process.version],
    ['engineVersion', context.engineVersion],
    ['exportedAt', context.exportedAt.toISOString()],
    ['stale', sheet.stale],
    ['sheetCorner', sheet.corner],
    ['sheetTemperature (degC)', sheet.temperature === null ? `tnom (${plainNumber(sheet.process.tnom)})` : plainNumber(sheet.temperature)],
    ['sheetModel', sheet.model],
    ['blankCornerTemperatureModel', 'a blank Corner, Temperature or Model cell means the sheet\'s'],
    ['devices', sheet.devices.length],
    ['lengths', context.lengths === 'um' ? 'um' : 'm'],
    ['supplyCurrent (A)', plainNumber(totals.supplyCurrent)],
    ['supplyPower (W)', plainNumber(totals.supplyPower)],
    ['gateArea (m2)', plainNumber(totals.gateArea)],
    ['leakageTemperature (degC)', plainNumber(totals.leakage.slowest.temperature)],
    ['leakageSlowestCorner', totals.leakage.slowest.corner],
    ['leakageSlowest (A)', plainNumber(totals.leakage.slowest.current)],
    ['leakageFastestCorner', totals.leakage.fastest.corner],
    ['leakageFastest (A)', plainNumber(totals.leakage.fastest.current)],
    ['signConvention', SHEET_CSV_SIGN_CONVENTION],
    ['caution', EXPORT_CAUTION],
  ];
  return pairs.map(([key, value]) => [key, oneLine(String(value))]);
}

/** Line breaks would end a `#` line early: they become spaces. */
function oneLine(text: string): string {
  return text.replace(/[\r\n]+/g, ' ');
}
