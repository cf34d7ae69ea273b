import { CORNER_FIGURES, type CornerFigure, type CornersRequest, type CornersResponse, WORSE_DIRECTION } from '../schemas/corners.js';
import type { Warning } from '../schemas/warning.js';
import { type Process, cornerNames } from '../schemas/process.js';
import { betaOf, channelOf, slopeFactorOf, thresholdOf } from './channel.js';
import type { CurrentModel } from './drain-current.js';
import { EngineError, isEngineError } from './errors.js';
import { type OperatingPoint, operatingPoint } from './operating-point.js';
import { overdriveForCurrent } from './overdrive.js';
import { type PreparedDevice, prepareDevice } from './resolve-device.js';
import { say, voltageNames } from './say.js';
import { checkLength } from './solve.js';
import { operatingPointWarnings } from './warnings.js';

export interface CornerPoint {
  corner: string;
  temperature: number;
  op: OperatingPoint | null;
  warnings: Warning[];
  error?: { code: string; message: string };
}

export type CornerAnalysis = Pick<CornersResponse, 'extremes' | 'worst'> & { points: CornerPoint[] };

/** The corners of a request, or TT and every corner of the process. */
export function cornersOf(request: Pick<CornersRequest, 'corners'>, process: Process): string[] {
  return request.corners ?? cornerNames(process);
}

/** The temperatures of a request, or tempRange.min, tnom and tempRange.max (tnom alone without a range). */
export function temperaturesOf(request: Pick<CornersRequest, 'temperatures'>, process: Process): number[] {
  if (request.temperatures) return request.temperatures;
  const range = process.tempRange;
  return range ? [...new Set([range.min, process.tnom, range.max])] : [process.tnom];
}

/**
 * A sized device (w, l) over corners × temperatures, biased by current (VGS solved at each point so that
 * ID is the same everywhere) or by voltage (VGS the same everywhere, ID follows). Each point has its
 * operating point and warnings, or the error that left it without one; `extremes` gives the lowest and
 * highest value of each figure and where, `worst` the worse of the two for figures that have a worse
 * direction (lowest gm, highest ioff …).
 */
export function cornerAnalysis(request: CornersRequest & { model: CurrentModel }, process: Process): CornerAnalysis {
  const points: CornerPoint[] = [];
  const corners = cornersOf(request, process);
  for (const [index, corner] of corners.entries()) {
    for (const temperature of temperaturesOf(request, process)) {
      const device = prepareDevice(process, request.polarity, { corner, temperature, flavour: request.flavour, cornerField: request.corners ? `corners.${index}` : 'corner' });
      try {
        const op = biasedOperatingPoint(device, request);
        const warnings = operatingPointWarnings(device, request.model, op);
        if (request.w < device.params.wmin) warnings.push({ code: 'W_BELOW_WMIN', message: `W = ${say(request.w, 'm')} is below wmin = ${say(device.params.wmin, 'm')}` });
        points.push({ corner, temperature, op, warnings });
      } catch (error) {
        if (!isEngineError(error)) throw error;
        points.push({ corner, temperature, op: null, warnings: [], error: { code: error.code, message: error.message } });
      }
    }
  }
  return { points, ...extremesOf(points) };
}

function biasedOperatingPoint(device: PreparedDevice, request: CornersRequest & { model: CurrentModel }): OperatingPoint {
  const { w, l, vds, vsb, model } = request;
  const fingers = request.fingers ?? 1;
  checkLength(device, l);
  const channel = channelOf(device, model, w, l, fingers);
  const vt = thresholdOf(device, channel, vsb, vds);
  let vgs = request.vgs as number;
  if (request.bias === 'current') {
    const id = request.id as number;
    vgs = vt + overdriveForCurrent(model, betaOf(channel, vsb), slopeFactorOf(device, channel, vsb), device.ut, channel.lambda, vds, id, channel.terms);
    if (vgs > device.vdd) {
      throw new EngineError('ID_NOT_REACHABLE_BELOW_VDD', `At ${device.corner}, ${say(device.temperature, '°C')}, W = ${say(w, 'm')} would need ${voltageNames(device.polarity).vgs} = ${say(vgs, 'V')} (above VDD = ${say(device.vdd, 'V')}) to carry ${say(id, 'A')}`, 'id');
    }
  }
  return operatingPoint(device, model, w, l, { vgs, vds, vsb }, fingers);
}

/** The lowest and highest value of each figure over the points, and the worse of the two where a figure has a worse direction. */
export function extremesOf(points: readonly CornerPoint[]): Pick<CornersResponse, 'extremes' | 'worst'> {
  const extremes: CornersResponse['extremes'] = {};
  const worst: CornersResponse['worst'] = {};
  for (const figure of CORNER_FIGURES) {
    let min: { value: number; corner: string; temperature: number } | undefined;
    let max: typeof min;
    for (const { op, corner, temperature } of points) {
      const value = op?.[figure as CornerFigure];
      if (typeof value !== 'number' || !Number.isFinite(value)) continue;
      if (!min || value < min.value) min = { value, corner, temperature };
      if (!max || value > max.value) max = { value, corner, temperature };
    }
    if (!min || !max) continue;
    extremes[figure] = { min, max };
    const direction = WORSE_DIRECTION[figure];
    if (direction) worst[figure] = { ...(direction === 'min' ? min : max), direction };
  }
  return { extremes, worst };
}
