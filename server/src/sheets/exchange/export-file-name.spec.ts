import { exportFileName } from './export-file-name.js';

describe('the export file name', () => {
  it('keeps letters, digits, dots, dashes and underscores, and folds everything else to one underscore', () => {
    expect(exportFileName('Wrenmoss sensor front end', 'Two-stage amplifier', '.csv')).toBe('Wrenmoss_sensor_front_end-Two-stage_amplifier.csv');
    expect(exportFileName('a/../b', '"quoted"; x', '.sp')).toBe('a_.._b-quoted_x.sp');
    expect(exportFileName('µ', '°', '.metadata.csv')).toBe('sheet-sheet.metadata.csv');
  });
});
