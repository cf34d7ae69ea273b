// A worker thread of the sweep pool (sweep-pool.ts): plain JavaScript, like the sheet-analysis worker, so jest and the
// built server load the same file. It runs the engine's sweep and writes the answer as JSON bytes here, off the server's
// thread: for the largest sweeps the JSON text costs more than the physics. The bytes are moved, not copied, back.
import { Piscina } from 'piscina';
import { computeSweep, isEngineError } from '@channelwright/shared/device';

export function sweepJson({ request, process }) {
  try {
    const bytes = Buffer.from(JSON.stringify(computeSweep(request, process)), 'utf8');
    // A Buffer may share a pooled ArrayBuffer; a copy of its own is what can be moved.
    const body = new Uint8Array(bytes.byteLength);
    body.set(bytes);
    return Piscina.move(body);
  } catch (error) {
    if (isEngineError(error)) return { error: { code: error.code, message: error.message, field: error.field } };
    throw error;
  }
}
