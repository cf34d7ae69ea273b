// The worker-thread side of the extraction pool (piscina): reads a curve file and fits a profile's parameters to it
// with the pure engine of @channelwright/shared, off the server's event loop. Plain JavaScript, because a worker
// thread needs a real file both under jest (which compiles TypeScript in memory) and in the built server;
// extraction-workers.ts explains where it is found. Engine refusals come back as values (a thrown error loses its
// code on the way between threads).
import { performance } from 'node:perf_hooks';
import { readCurveFile } from '@channelwright/shared/curve-file';
import { extractParameters, extractionReport } from '@channelwright/shared/extraction';

/** Progress is posted at most this often, ms (a fit reports after every ten iterations). */
const PROGRESS_INTERVAL_MS = 100;

/**
 * Reads a curve file.
 * @param {{ text: string, options: import('@channelwright/shared/curve-file').CurveFileOptions }} task
 */
export function read(task) {
  return readCurveFile(task.text, task.options);
}

/**
 * Reads the file again (it is kept as uploaded) and fits; posts { iterations, maxIterations } on `port` as it goes.
 * @param {{ text: string, options: import('@channelwright/shared/curve-file').CurveFileOptions, fit: object, port: MessagePort }} task
 */
export function fit(task) {
  const { port } = task;
  try {
    const reading = readCurveFile(task.text, task.options);
    if (!reading.ok) return { failed: { code: 'CURVE_FILE_INVALID', message: reading.problems.map((p) => p.message).join('; ') } };
    const { points, rows } = reading.file;
    const started = performance.now();
    let posted = 0;
    const result = extractParameters({ ...task.fit, points }, (progress) => {
      const now = performance.now();
      if (now - posted < PROGRESS_INTERVAL_MS) return;
      posted = now;
      port.postMessage({ iterations: progress.iterations, maxIterations: progress.maxIterations });
    });
    const report = extractionReport(points, rows, result, (performance.now() - started) / 1000);
    return { result: report.result, curves: JSON.stringify(report.curves) };
  } catch (error) {
    if (error && typeof error === 'object' && 'code' in error && typeof error.code === 'string') return { failed: { code: error.code, message: error.message } };
    throw error;
  } finally {
    port.close();
  }
}
