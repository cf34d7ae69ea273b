import { PROCESS_IMPORT_MAX_BYTES, type ModelCardInput, type Process } from '@channelwright/shared/schemas';
import { DomainError } from '../../common/errors/domain-error.js';
import { decodeUpload } from './decode-upload.js';
import { importInvalid } from './import-problems.js';
import { readProcessCsv } from './read-process-csv.js';
import { readProcessJson } from './read-process-json.js';

export interface ImportedProcess {
  definition: Process;
  nodeClass?: string;
  /** The model card our JSON file carries (its text is parsed again when stored, never trusted). */
  modelCard?: ModelCardInput;
}

/** What an upload holds: a process file read and validated, or the text of a model card (parsed when stored). */
export type ReadUpload = { kind: 'process'; process: ImportedProcess } | { kind: 'card'; text: string };

/**
 * An uploaded file read: a model card's text (by its name or its first line), or a process file (our JSON or the CSV
 * layout) validated whole, at most PROCESS_IMPORT_MAX_BYTES (413 above; a card may be larger). Throws 400
 * IMPORT_INVALID listing every problem of a process file.
 */
export function readUpload(bytes: Uint8Array, fileName: string, field: 'file' | 'card' = 'file'): ReadUpload {
  const upload = decodeUpload(bytes, fileName, field === 'card' ? 'card' : undefined);
  if (upload.kind === 'card') {
    if (upload.problems.length > 0) throw importInvalid(upload.problems);
    return { kind: 'card', text: upload.text };
  }
  if (bytes.length > PROCESS_IMPORT_MAX_BYTES) {
    throw new DomainError('PAYLOAD_TOO_LARGE', `The process file is larger than ${PROCESS_IMPORT_MAX_BYTES / 1024 / 1024} MB; nothing was stored`, 413, field);
  }
  const reading = upload.kind === 'json' ? readProcessJson(upload.text) : readProcessCsv(upload.text);
  const problems = [...upload.problems, ...(reading.ok ? [] : reading.problems)];
  if (problems.length > 0 || !reading.ok) throw importInvalid(problems);
  return { kind: 'process', process: { definition: reading.definition, nodeClass: reading.nodeClass, modelCard: reading.modelCard } };
}
