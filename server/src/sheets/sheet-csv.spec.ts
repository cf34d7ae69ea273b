import { sheetCsvFileName } from './sheet-csv.js';

describe('the sheet CSV file name', () => {
  it('keeps letters, digits, dots, dashes and underscores, and folds everything else to one underscore', () => {
    expect(sheetCsvFileName('Wrenmoss sensor front end', 'Two-stage amplifier')).toBe('Wrenmoss_sensor_front_end-Two-stage_amplifier.csv');
    expect(sheetCsvFileName('a/../b', '"quoted"; x')).toBe('a_.._b-quoted_x.csv');
    expect(sheetCsvFileName('µ', '°')).toBe('sheet-sheet.csv');
  });
});
