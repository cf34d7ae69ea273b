/** A CSV text's lines made ready for a reader: the byte-order mark gone, `#` comment lines blanked. */
export interface CsvText {
  text: string;
  /** The line (1-based) of the header: the first line that is neither blank nor a comment. */
  headerLine: number;
  delimiter: ',' | ';';
}

/**
 * Drops a UTF-8 byte-order mark, blanks every line that starts with "#" outside a quoted cell (so line numbers
 * stay those of the file), and picks the delimiter of the header: a semicolon when it has more semicolons than
 * commas outside quotes (spreadsheets set to a language with a decimal comma write those), else a comma.
 */
export function prepareCsvText(raw: string): CsvText {
  const lines = raw.replace(/^\uFEFF/, '').split(/\r\n|\n|\r/);
  let quoted = false;
  let headerLine = 0;
  for (let i = 0; i < lines.length; i++) {
    if (!quoted && lines[i].trimStart().startsWith('#')) {
      lines[i] = '';
      continue;
    }
    if (!quoted && headerLine === 0 && lines[i].trim() !== '') headerLine = i + 1;
    quoted = ((lines[i].match(/"/g)?.length ?? 0) % 2 === 1) !== quoted;
  }
  const header = headerLine > 0 ? lines[headerLine - 1] : '';
  const outside = header.replace(/"[^"]*"/g, '');
  const delimiter = (outside.match(/;/g)?.length ?? 0) > (outside.match(/,/g)?.length ?? 0) ? ';' : ',';
  return { text: lines.join('\n'), headerLine, delimiter };
}
