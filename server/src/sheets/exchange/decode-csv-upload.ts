import { importInvalid } from '../../processes/import/import-problems.js';

/**
 * The uploaded bytes as text: UTF-8 with or without a byte-order mark (the reader drops it). UTF-16, bytes
 * that are not UTF-8 and an empty file are refused at once: 400 IMPORT_INVALID, nothing stored.
 */
export function decodeCsvUpload(bytes: Uint8Array): string {
  if ((bytes[0] === 0xff && bytes[1] === 0xfe) || (bytes[0] === 0xfe && bytes[1] === 0xff)) {
    throw importInvalid([{ row: 1, field: 'file', message: 'The file is UTF-16 text: save it as UTF-8 CSV' }]);
  }
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch {
    throw importInvalid([{ row: 1, field: 'file', message: 'The file is not UTF-8 text: save it as UTF-8 CSV' }]);
  }
  if (text.replace(/^\uFEFF/, '').trim() === '') throw importInvalid([{ row: 1, field: 'file', message: 'The file is empty' }]);
  return text;
}
