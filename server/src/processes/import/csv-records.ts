import { PROCESS_CSV_COLUMNS, type Problem } from '@channelwright/shared/schemas';
import Papa from 'papaparse';

/** One data row of the CSV: its line in the file (the header is line 1) and its four cells, trimmed. */
export interface CsvRecord {
  row: number;
  parameter: string;
  polarity: string;
  value: string;
  unit: string;
}

export interface CsvRecords {
  records: CsvRecord[];
  problems: Problem[];
}

const HEADER = PROCESS_CSV_COLUMNS.join(',');

/**
 * Splits the text into rows with papaparse (commas only, double quotes for cells holding commas or
 * line breaks), checks the header and the number of cells, and skips empty lines and lines starting
 * with "#". A file separated by semicolons is refused at its header with a sentence saying so.
 */
export function readCsvRecords(text: string): CsvRecords {
  const records: CsvRecord[] = [];
  const problems: Problem[] = [];
  let header: { row: number } | undefined;
  let rowStart = 0;
  let line = 1;
  let stopped = false;

  Papa.parse<string[]>(text, {
    delimiter: ',',
    step: (result, parser) => {
      const row = line;
      line += countLineBreaks(text, rowStart, result.meta.cursor);
      rowStart = result.meta.cursor;
      const cells = result.data.map((cell) => cell.trim());
      for (const error of result.errors) problems.push({ row, field: 'file', message: `${error.message} (put a double quote at both ends of a cell)` });
      if (cells.every((cell) => cell === '') || cells[0].startsWith('#')) return;
      if (!header) {
        header = { row };
        const problem = headerProblem(cells, row);
        if (problem) {
          problems.push(problem);
          stopped = true;
          parser.abort();
        }
        return;
      }
      if (cells.length !== PROCESS_CSV_COLUMNS.length) {
        problems.push({
          row,
          field: 'columns',
          message: `The row has ${cells.length} cells, not ${PROCESS_CSV_COLUMNS.length} (${HEADER}); a value holding a comma goes in double quotes`,
        });
        return;
      }
      const [parameter, polarity, value, unit] = cells;
      records.push({ row, parameter, polarity: polarity.toLowerCase(), value, unit });
    },
  });
  if (!header && !stopped) problems.push({ row: 1, field: 'header', message: `The file has no header row: the first row must be ${HEADER}` });
  return { records, problems };
}

function headerProblem(cells: string[], row: number): Problem | undefined {
  const found = cells.join(',');
  if (cells.length === 1 && cells[0].includes(';')) {
    return {
      row,
      field: 'header',
      message:
        'The file separates its cells with semicolons (;), but Channelwright reads commas (,): save it as comma-separated CSV (spreadsheets set to a language with decimal commas write semicolons)',
    };
  }
  if (found.toLowerCase() !== HEADER) return { row, field: 'header', message: `The first row must be the header ${HEADER}, not "${found}"` };
  return undefined;
}

/** Line breaks in text[from, to): "\r\n", "\n" and a lone "\r" each count once. */
function countLineBreaks(text: string, from: number, to: number): number {
  let count = 0;
  for (let i = from; i < to; i++) {
    const c = text.charCodeAt(i);
    if (c === 10 || (c === 13 && text.charCodeAt(i + 1) !== 10)) count++;
  }
  return count;
}
