/**
 * File formats: the sheet's CSV (written and read back), its SPICE instance lines, and the helpers they
 * share (plain numbers, netlist-safe names, CSV cells). Pure text in, text out; no I/O.
 */
export { plainNumber, plainNumberIn } from './plain-number.js';
export { netlistName, uniqueNetlistNames } from './netlist-name.js';
export { safeTextCell, quoteCell, csvLine } from './csv-cell.js';
export { prepareCsvText, type CsvText } from './csv-lines.js';
export { sheetMetadata, EXPORT_CAUTION, type SheetExportContext } from './sheet-metadata.js';
export { writeSheetCsv, writeSheetMetadataCsv, type SheetCsvOptions } from './write-sheet-csv.js';
export { readSheetCsv, type SheetCsvRow, type SheetCsvReading } from './read-sheet-csv.js';
export { writeSpiceDeck, spiceModelName, spiceInstanceNames, type SpiceDeckContext } from './spice-deck.js';
