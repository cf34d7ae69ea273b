/**
 * A text cell a spreadsheet would run as a formula (it starts with =, +, -, @, a tab or a carriage return)
 * gets a leading apostrophe (OWASP, "CSV Injection", 2024, common practice). Numbers are written apart and
 * never escaped, so -0.5 stays a number.
 */
export function safeTextCell(text: string): string {
  return /^[=+\-@\t\r]/.test(text) ? `'${text}` : text;
}

/** RFC 4180: a cell with a comma, a double quote or a line break goes in double quotes, its quotes doubled. */
export function quoteCell(text: string, delimiter = ','): string {
  return text.includes(delimiter) || /["\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

/** One CSV line of already formatted cells. */
export function csvLine(cells: readonly string[], delimiter = ','): string {
  return cells.map((cell) => quoteCell(cell, delimiter)).join(delimiter);
}
