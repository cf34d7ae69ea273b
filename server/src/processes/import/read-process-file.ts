import type { Process } from '@channelwright/shared/schemas';
import { decodeUpload } from './decode-upload.js';
import { importInvalid } from './import-problems.js';
import { readProcessCsv } from './read-process-csv.js';
import { readProcessJson } from './read-process-json.js';

export interface ImportedProcess {
  definition: Process;
  nodeClass?: string;
}

/** An uploaded process file (our JSON or the CSV layout) read and validated whole; throws 400 IMPORT_INVALID listing every problem. */
export function readProcessFile(bytes: Uint8Array, fileName: string): ImportedProcess {
  const upload = decodeUpload(bytes, fileName);
  const reading = upload.kind === 'json' ? readProcessJson(upload.text) : readProcessCsv(upload.text);
  const problems = [...upload.problems, ...(reading.ok ? [] : reading.problems)];
  if (problems.length > 0 || !reading.ok) throw importInvalid(problems);
  return { definition: reading.definition, nodeClass: reading.nodeClass };
}
