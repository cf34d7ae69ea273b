import type { DeviceParams, Polarity, Process } from '../schemas/process.js';
import { betaOf, channelOf, slopeFactorOf, thresholdOf } from '../device/channel.js';
import { type CurrentModel, GM_ID, ID, KERNEL_OUTPUTS, drainCurrent, drainCurrentInto } from '../device/drain-current.js';
import { overdriveForGmId } from '../device/overdrive.js';
import { type PreparedDevice, prepareDevice } from '../device/resolve-device.js';
import type { MeasuredCurve, MeasuredPoint } from './measured-curves.js';

/** A model that refuses a point (EngineError) costs this much in ln ID, so the search turns away from it. */
const REFUSAL_PENALTY = 10;
/**
 * Each curve's threshold offset is solved to this (V) inside every evaluation of the shape fit, so that the
 * residuals are a function of the parameters alone (a numerical Jacobian needs that), in at most OFFSET_STEPS.
 */
const OFFSET_TOLERANCE = 1e-11;
const OFFSET_STEPS = 30;

/** The model of an extraction evaluated at the measured points, for one parameter set at a time. */
export class ModelAtPoints {
  private readonly out = new Float64Array(KERNEL_OUTPUTS);

  constructor(
    private readonly polarity: Polarity,
    private readonly model: CurrentModel,
    private readonly base: { readonly tnom: number; readonly vdd: number },
    private readonly points: readonly MeasuredPoint[],
  ) {}

  /** A prepared device per temperature for one parameter set. */
  devicesFor(params: DeviceParams): (temperature: number) => PreparedDevice {
    const process = { name: 'extraction', tnom: this.base.tnom, vdd: this.base.vdd, corners: [], nmos: params, pmos: params } as Process;
    const devices = new Map<number, PreparedDevice>();
    return (temperature) => {
      let device = devices.get(temperature);
      if (!device) {
        device = prepareDevice(process, this.polarity, { temperature });
        devices.set(temperature, device);
      }
      return device;
    };
  }

  /** ID and gm/ID at a point with its gate moved by `shift` (V); NaN where the model refuses. */
  private evaluate(deviceAt: (t: number) => PreparedDevice, point: MeasuredPoint, shift: number): boolean {
    try {
      const device = deviceAt(point.temperature);
      const channel = channelOf(device, this.model, point.w, point.l, point.fingers ?? 1);
      const vov = point.vgs - shift - thresholdOf(device, channel, point.vsb, point.vds);
      drainCurrentInto(this.model, betaOf(channel, point.vsb), slopeFactorOf(device, channel, point.vsb), device.ut, channel.lambda, vov, point.vds, this.out, channel.terms);
      return this.out[ID] > 0 && Number.isFinite(this.out[ID]);
    } catch {
      return false;
    }
  }

  /** The model's current at a point, A (NaN where it refuses). */
  currentOf(params: DeviceParams, index: number): number {
    return this.evaluate(this.devicesFor(params), this.points[index], 0) ? this.out[ID] : Number.NaN;
  }

  /** ln ID_model − ln ID_measured at the given points. */
  logResiduals(params: DeviceParams, indices: readonly number[]): Float64Array {
    const deviceAt = this.devicesFor(params);
    const r = new Float64Array(indices.length);
    indices.forEach((index, k) => {
      const p = this.points[index];
      r[k] = this.evaluate(deviceAt, p, 0) ? Math.log(this.out[ID]) - Math.log(p.id) : REFUSAL_PENALTY;
    });
    return r;
  }

  /**
   * ln ID residuals with each curve moved along VGS by its own best offset (Gauss–Newton on the offset, from the
   * last one found): what is left is the shape of the current against VGS − VT. The offsets are updated in place.
   */
  shapeResiduals(params: DeviceParams, curves: readonly MeasuredCurve[], offsets: Map<MeasuredCurve, number>): Float64Array {
    const deviceAt = this.devicesFor(params);
    const count = curves.reduce((sum, c) => sum + c.indices.length, 0);
    const r = new Float64Array(count);
    let at = 0;
    for (const curve of curves) {
      let shift = offsets.get(curve) ?? 0;
      for (let step = 0; step <= OFFSET_STEPS; step++) {
        let numerator = 0;
        let denominator = 0;
        curve.indices.forEach((index, k) => {
          const p = this.points[index];
          if (this.evaluate(deviceAt, p, shift)) {
            const residual = Math.log(this.out[ID]) - Math.log(p.id);
            r[at + k] = residual;
            numerator += residual * this.out[GM_ID];
            denominator += this.out[GM_ID] ** 2;
          } else {
            r[at + k] = REFUSAL_PENALTY;
          }
        });
        if (step === OFFSET_STEPS || denominator === 0) break;
        // d(ln ID)/d(shift) = −gm/ID, so the Gauss–Newton step on the shift is Σ r·(gm/ID) / Σ (gm/ID)².
        const move = Math.max(-0.2, Math.min(0.2, numerator / denominator));
        shift += move;
        if (Math.abs(move) < OFFSET_TOLERANCE) {
          // One more pass fills r at the final shift.
          step = OFFSET_STEPS - 1;
        }
      }
      offsets.set(curve, shift);
      at += curve.indices.length;
    }
    return r;
  }

  /**
   * ln of the model's current over the measured one, each at the gm/ID the data shows at that point (same W, L,
   * VDS, VSB, temperature): the current density against gm/ID that sizing reads, free of the threshold.
   */
  densityResiduals(params: DeviceParams, indices: readonly number[], gmId: readonly number[]): Float64Array {
    const deviceAt = this.devicesFor(params);
    const r = new Float64Array(indices.length);
    indices.forEach((index, k) => {
      const p = this.points[index];
      try {
        const device = deviceAt(p.temperature);
        const channel = channelOf(device, this.model, p.w, p.l, p.fingers ?? 1);
        const n = slopeFactorOf(device, channel, p.vsb);
        const vov = overdriveForGmId(this.model, n, device.ut, p.vds, gmId[index], channel.terms);
        const id = drainCurrent(this.model, betaOf(channel, p.vsb), n, device.ut, channel.lambda, vov, p.vds, channel.terms);
        r[k] = id > 0 && Number.isFinite(id) ? Math.log(id) - Math.log(p.id) : REFUSAL_PENALTY;
      } catch {
        r[k] = REFUSAL_PENALTY;
      }
    });
    return r;
  }

  /** The model's threshold at a curve's conditions (VSB, VDS, length, temperature), V. */
  thresholdOf(params: DeviceParams, curve: MeasuredCurve): number {
    const device = this.devicesFor(params)(curve.temperature);
    return thresholdOf(device, channelOf(device, this.model, curve.w, curve.l, curve.fingers), curve.vsb, curve.vds);
  }
}
