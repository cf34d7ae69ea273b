// A worker thread of the sheet-analysis pool (analysis-pool.ts): plain JavaScript, because a worker needs a real
// file that jest (TypeScript compiled in memory) and the built server alike can load. It only runs the engine's
// pure sheet analyses on what it is handed; each export is one task (piscina's `name`).
import { cornerMatrixRows, sheetLeakage } from '@channelwright/shared/device';

export function matrixRows({ process, processId, devices, bias, columns }) {
  return cornerMatrixRows(process, processId, devices, bias, columns);
}

export function leakage({ process, processId, devices, budget, engineVersion }) {
  return sheetLeakage(process, processId, devices, budget, engineVersion);
}
