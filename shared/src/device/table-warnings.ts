import type { Warning } from '../schemas/warning.js';
import type { OperatingPoint } from './operating-point.js';
import type { PreparedDevice } from './resolve-device.js';
import type { TableLine } from './table-lookup.js';
import { operatingPointWarnings } from './warnings.js';

/**
 * The cautions of a table result: those of the analytic models that still apply (not saturated, gm/ID near the
 * weak-inversion limit the table reaches, depletion-mode, VGS or VDS above VDD, temperature outside the process
 * range, forward-biased source), never "short-channel effects are not modelled" (the card models them), and the
 * table's own (a temperature between characterised ones).
 */
export function tableWarnings(device: PreparedDevice, point: OperatingPoint, line: TableLine): Warning[] {
  const analytic = operatingPointWarnings(device, 'all-region', point).filter((warning) => warning.code !== 'L_NEAR_LMIN');
  return [...analytic, ...line.warnings];
}
