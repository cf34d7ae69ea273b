import type { Problem } from '@channelwright/shared/schemas';
import { importInvalid } from './import-problems.js';

export type UploadKind = 'json' | 'csv' | 'card';

export interface DecodedUpload {
  kind: UploadKind;
  text: string;
  /** Problems of the bytes themselves (a byte-order mark); the text is still read so every problem is listed at once. */
  problems: Problem[];
}

const UTF8_BOM = [0xef, 0xbb, 0xbf];

/** File names of SPICE model cards (common practice, no source). */
const CARD_EXTENSIONS = ['.lib', '.l', '.mod', '.model', '.models', '.sp', '.spi', '.spice', '.cir', '.txt', '.mdl', '.inc'];

/**
 * The uploaded bytes as text: UTF-8 only, without a byte-order mark (a mark is reported, and the rest
 * still read so the list of problems is complete). JSON when the name ends in .json or the text starts
 * with "{"; a model card when the name ends like one (.lib, .mod, .sp …) or its first line is a SPICE
 * comment or dot-command; CSV otherwise (`kind` forces one). An empty file, UTF-16 or bytes that are not
 * UTF-8 refuse the file at once.
 */
export function decodeUpload(bytes: Uint8Array, fileName: string, kind?: UploadKind): DecodedUpload {
  const problems: Problem[] = [];
  let body = bytes;
  if (UTF8_BOM.every((byte, i) => bytes[i] === byte)) {
    problems.push({
      row: 1,
      field: 'file',
      message: 'The file starts with a byte-order mark (BOM): save it as UTF-8 without BOM (in a spreadsheet, plain "CSV", not "CSV UTF-8 with BOM")',
    });
    body = bytes.subarray(UTF8_BOM.length);
  } else if ((bytes[0] === 0xff && bytes[1] === 0xfe) || (bytes[0] === 0xfe && bytes[1] === 0xff)) {
    throw importInvalid([{ row: 1, field: 'file', message: 'The file is UTF-16 text: save it as UTF-8' }]);
  }
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true, ignoreBOM: true }).decode(body);
  } catch {
    throw importInvalid([{ row: 1, field: 'file', message: 'The file is not UTF-8 text: save it as UTF-8 (CSV, JSON or a SPICE model card)' }]);
  }
  if (text.trim() === '') throw importInvalid([...problems, { row: 1, field: 'file', message: 'The file is empty' }]);
  return { kind: kind ?? kindOf(fileName, text), text, problems };
}

function kindOf(fileName: string, text: string): UploadKind {
  const name = fileName.toLowerCase();
  if (name.endsWith('.json')) return 'json';
  if (name.endsWith('.csv')) return 'csv';
  if (CARD_EXTENSIONS.some((extension) => name.endsWith(extension))) return 'card';
  const start = text.trimStart();
  if (start.startsWith('{')) return 'json';
  return start.startsWith('*') || start.startsWith('.') ? 'card' : 'csv';
}
