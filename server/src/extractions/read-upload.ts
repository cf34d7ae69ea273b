import type { Problem } from '@channelwright/shared/schemas';
import { DomainError } from '../common/errors/domain-error.js';

/** The whole file is refused: 400 CURVE_FILE_INVALID with every problem by row and column; nothing is stored. */
export function curveFileInvalid(problems: Problem[]): DomainError {
  const count = problems.length === 1 ? 'a problem' : `${problems.length} problems`;
  return new DomainError('CURVE_FILE_INVALID', `The curve file has ${count}; nothing was stored`, 400, 'file', problems);
}

/** The uploaded bytes as text: UTF-8, with or without a byte-order mark; UTF-16, other bytes or an empty file are refused. */
export function decodeCurveFile(bytes: Uint8Array): string {
  if ((bytes[0] === 0xff && bytes[1] === 0xfe) || (bytes[0] === 0xfe && bytes[1] === 0xff)) {
    throw curveFileInvalid([{ row: 1, field: 'file', message: 'The file is UTF-16 text: save it as UTF-8 (in a spreadsheet, "CSV UTF-8" or plain "CSV")' }]);
  }
  let text: string;
  try {
    // The decoder drops a leading byte-order mark.
    text = new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch {
    throw curveFileInvalid([{ row: 1, field: 'file', message: 'The file is not UTF-8 text: save it as UTF-8 CSV' }]);
  }
  if (text.trim() === '') throw curveFileInvalid([{ row: 1, field: 'file', message: 'The file is empty' }]);
  return text;
}
