import type { CornersRequest } from './corners.js';
import type { SizeRequest } from './size.js';
import type { SweepRequest } from './sweep.js';

/**
 * Request and response schemas of the compute API: POST /api/compute/size, /sweep and /corners.
 * All numbers in SI units (A, V, m, F, S, Ω, Hz), temperatures in °C. Voltages are polarity-normalised:
 * for PMOS, vgs means VSG, vds means VSD, vsb means VBS and vt means −VTP, so an enhancement device of
 * either polarity has vt > 0 and a depletion-mode device vt < 0. Every error names its field (the zod
 * issue path joined with dots, e.g. "sweep.points").
 */

export type ComputeRequest = SizeRequest | SweepRequest | CornersRequest;
