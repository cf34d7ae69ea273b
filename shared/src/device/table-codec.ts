import { EngineError } from './errors.js';
import { checkLookupTable, checkTableGrid, type LookupTable, TABLE_FIELDS, type TableField, type TableGrid, tablePointCount } from './lookup-table.js';

/**
 * The binary form of a table: "CWLT", a little-endian uint32 header length, the header as ASCII JSON
 * (grid, field order, element type), zero padding to a multiple of 8 bytes, then each column's raw
 * little-endian values one after the other. Pure (no Buffer, no TextEncoder), so a browser can read it too;
 * the server compresses it and hashes it.
 */
const MAGIC = [0x43, 0x57, 0x4c, 0x54]; // "CWLT"
const FORMAT_VERSION = 1;

interface Header {
  version: number;
  grid: TableGrid;
  fields: TableField[];
  type: 'float32' | 'float64';
}

const littleEndianPlatform = new Uint8Array(new Uint16Array([1]).buffer)[0] === 1;

/** JSON with every character above 0x7f escaped, so that one byte is one character. */
function asciiJson(value: unknown): string {
  return JSON.stringify(value).replace(/[\u0080-\uffff]/g, (c) => `\\u${c.charCodeAt(0).toString(16).padStart(4, '0')}`);
}

/** The table as bytes; its columns must all be Float32Array or all Float64Array. */
export function encodeTable(table: LookupTable): Uint8Array {
  const steps = encodeTableInSteps(table);
  for (;;) {
    const step = steps.next();
    if (step.done) return step.value;
  }
}

/** encodeTable one column per step, so that a caller on an event loop can let other work run between them (a full grid's column is megabytes). */
export function* encodeTableInSteps(table: LookupTable): Generator<void, Uint8Array, void> {
  checkLookupTable(table);
  const first = table.columns[TABLE_FIELDS[0]];
  const type = first instanceof Float64Array ? 'float64' : 'float32';
  if (TABLE_FIELDS.some((field) => (table.columns[field] instanceof Float64Array) !== (type === 'float64'))) {
    throw new EngineError('TABLE_INVALID', 'The columns of a table must all be Float32Array or all Float64Array', 'columns');
  }
  const header = asciiJson({ version: FORMAT_VERSION, grid: table.grid, fields: [...TABLE_FIELDS], type } satisfies Header);
  const dataStart = Math.ceil((8 + header.length) / 8) * 8;
  const bytesPerValue = type === 'float64' ? 8 : 4;
  const points = tablePointCount(table.grid);
  const bytes = new Uint8Array(dataStart + TABLE_FIELDS.length * points * bytesPerValue);
  bytes.set(MAGIC, 0);
  new DataView(bytes.buffer).setUint32(4, header.length, true);
  for (let i = 0; i < header.length; i++) bytes[8 + i] = header.charCodeAt(i);
  for (const [index, field] of TABLE_FIELDS.entries()) {
    writeColumn(bytes, dataStart + index * points * bytesPerValue, table.columns[field]);
    yield;
  }
  return bytes;
}

/**
 * Reads what encodeTable wrote; TABLE_INVALID when the bytes are not a table of this format. On a little-endian
 * platform the columns are views on `bytes` (no copy: a full grid is tens of MB), so the caller must not change them.
 */
export function decodeTable(bytes: Uint8Array): LookupTable {
  if (bytes.length < 8 || MAGIC.some((byte, i) => bytes[i] !== byte)) throw new EngineError('TABLE_INVALID', 'These bytes are not a Channelwright table', 'table');
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const headerLength = view.getUint32(4, true);
  if (8 + headerLength > bytes.length) throw new EngineError('TABLE_INVALID', 'The table header is cut short', 'table');
  let text = '';
  for (let i = 0; i < headerLength; i++) text += String.fromCharCode(bytes[8 + i]);
  let header: Header;
  try {
    header = JSON.parse(text) as Header;
  } catch {
    throw new EngineError('TABLE_INVALID', 'The table header is not valid JSON', 'table');
  }
  if (header.version !== FORMAT_VERSION) throw new EngineError('TABLE_INVALID', `Table format version ${header.version} is not known (expected ${FORMAT_VERSION})`, 'table');
  if (!Array.isArray(header.fields) || header.fields.some((field) => !TABLE_FIELDS.includes(field)) || (header.type !== 'float32' && header.type !== 'float64')) {
    throw new EngineError('TABLE_INVALID', 'The table header names unknown fields or an unknown number type', 'table');
  }
  checkTableGrid(header.grid);
  const points = tablePointCount(header.grid);
  const bytesPerValue = header.type === 'float64' ? 8 : 4;
  const dataStart = Math.ceil((8 + headerLength) / 8) * 8;
  if (bytes.length !== dataStart + header.fields.length * points * bytesPerValue) throw new EngineError('TABLE_INVALID', 'The table data does not match its header', 'table');
  const columns = {} as LookupTable['columns'];
  header.fields.forEach((field, index) => {
    columns[field] = readColumn(bytes, dataStart + index * points * bytesPerValue, points, header.type);
  });
  const table = { grid: header.grid, columns };
  checkLookupTable(table);
  return table;
}

function writeColumn(bytes: Uint8Array, offset: number, column: Float32Array | Float64Array): void {
  if (littleEndianPlatform) {
    bytes.set(new Uint8Array(column.buffer, column.byteOffset, column.byteLength), offset);
    return;
  }
  const view = new DataView(bytes.buffer, offset);
  const size = column.BYTES_PER_ELEMENT;
  for (let i = 0; i < column.length; i++) {
    if (size === 8) view.setFloat64(i * 8, column[i], true);
    else view.setFloat32(i * 4, column[i], true);
  }
}

function readColumn(bytes: Uint8Array, offset: number, count: number, type: Header['type']): Float32Array | Float64Array {
  const size = type === 'float64' ? 8 : 4;
  const at = bytes.byteOffset + offset;
  if (littleEndianPlatform && at % size === 0) return type === 'float64' ? new Float64Array(bytes.buffer, at, count) : new Float32Array(bytes.buffer, at, count);
  const column = type === 'float64' ? new Float64Array(count) : new Float32Array(count);
  if (littleEndianPlatform) {
    new Uint8Array(column.buffer).set(bytes.subarray(offset, offset + column.byteLength));
    return column;
  }
  const view = new DataView(bytes.buffer, bytes.byteOffset + offset);
  for (let i = 0; i < count; i++) column[i] = type === 'float64' ? view.getFloat64(i * 8, true) : view.getFloat32(i * 4, true);
  return column;
}
