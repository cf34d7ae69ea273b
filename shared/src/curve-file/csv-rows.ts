import Papa from 'papaparse';
import type { Problem } from '../schemas/api-error.js';

/** One non-empty, non-comment line of a CSV file: its line number (from 1) and its cells, trimmed. */
export interface CsvRow {
  line: number;
  cells: string[];
}

export type Delimiter = ',' | ';' | '\t';

export interface CsvRows {
  delimiter: Delimiter;
  rows: CsvRow[];
  problems: Problem[];
}

const DELIMITERS: readonly Delimiter[] = [',', ';', '\t'];

/** The delimiter of a file: the one of comma, semicolon and tab that its first line of content holds most often. */
function delimiterOf(text: string): Delimiter {
  const first = text.split(/\r\n|\n|\r/).find((line) => line.trim() !== '' && !line.trimStart().startsWith('#')) ?? '';
  const count = (d: string) => first.split(d).length - 1;
  return DELIMITERS.reduce((best, d) => (count(d) > count(best) ? d : best), ',');
}

/**
 * Splits a CSV text into rows with papaparse (double quotes around cells holding the delimiter or line breaks),
 * keeping each row's line number in the file; skips empty lines and lines starting with "#". A leading
 * byte-order mark is dropped (a spreadsheet's "CSV UTF-8" writes one).
 */
export function csvRows(text: string): CsvRows {
  const body = text.startsWith('\uFEFF') ? text.slice(1) : text;
  const delimiter = delimiterOf(body);
  const rows: CsvRow[] = [];
  const problems: Problem[] = [];
  let rowStart = 0;
  let line = 1;
  Papa.parse<string[]>(body, {
    delimiter,
    step: (result) => {
      const row = line;
      line += lineBreaks(body, rowStart, result.meta.cursor);
      rowStart = result.meta.cursor;
      for (const error of result.errors) problems.push({ row, field: 'file', message: `Row ${row}: ${error.message} (put a double quote at both ends of a cell)` });
      const cells = result.data.map((cell) => cell.trim());
      if (cells.every((cell) => cell === '') || cells[0].startsWith('#')) return;
      rows.push({ line: row, cells });
    },
  });
  return { delimiter, rows, problems };
}

/** Line breaks in text[from, to): "\r\n", "\n" and a lone "\r" each count once. */
function lineBreaks(text: string, from: number, to: number): number {
  let count = 0;
  for (let i = from; i < to; i++) {
    const c = text.charCodeAt(i);
    if (c === 10 || (c === 13 && text.charCodeAt(i + 1) !== 10)) count++;
  }
  return count;
}
