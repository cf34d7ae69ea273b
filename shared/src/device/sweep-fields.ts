import type { SweepField } from '../schemas/sweep.js';
import { gateCapacitances, transitFrequency } from './capacitance.js';
import { maskOf } from './drain-current.js';
import { leakage } from './leakage.js';
import { pelgromPairSigma } from './mismatch.js';
import type { PreparedDevice } from './resolve-device.js';
import type { KernelOutputs, SeriesInputs } from './sweep-inputs.js';

/** The columns of the fields asked for, each a fresh array computed in its own pass over the points. */
export function fieldColumns(
  fields: readonly SweepField[],
  inputs: SeriesInputs,
  outputs: KernelOutputs,
  deviceAt: (i: number) => PreparedDevice,
  count: number,
): Partial<Record<SweepField, Float64Array>> {
  const { w, l, leff, vt, vov, vds, vsb, tempC, n, gmbRatio, beta, ut, fingers, dw } = inputs;
  const [mw, ml, mLeff, mt, mo, md, mn, mg, mb, mu] = [w, l, leff, vt, vov, vds, n, gmbRatio, beta, ut].map(maskOf);
  const { id, gm, gds, gmId, vdsat } = outputs;
  const { params, cox } = deviceAt(0);
  const { cgdo, avt } = params;
  const columns: Partial<Record<SweepField, Float64Array>> = {};
  const want = (field: SweepField) => fields.includes(field);
  const derive = (compute: (i: number) => number) => {
    const column = new Float64Array(count);
    for (let i = 0; i < count; i++) column[i] = compute(i);
    return column;
  };
  const copy = (source: Float64Array) => (source.length === 1 ? new Float64Array(count).fill(source[0]) : source.slice(0, count));
  if (want('w')) columns.w = copy(w);
  if (want('l')) columns.l = copy(l);
  if (want('wOverL')) columns.wOverL = derive((i) => w[i & mw] / l[i & ml]);
  if (want('vgs')) columns.vgs = derive((i) => vt[i & mt] + vov[i & mo]);
  if (want('vds')) columns.vds = copy(vds);
  if (want('vsb')) columns.vsb = copy(vsb);
  if (want('temperature')) columns.temperature = copy(tempC);
  if (want('vt')) columns.vt = copy(vt);
  if (want('vov')) columns.vov = copy(vov);
  if (want('n')) columns.n = copy(n);
  if (want('vdsat')) columns.vdsat = vdsat;
  if (want('saturated')) columns.saturated = derive((i) => (vds[i & md] >= vdsat[i] ? 1 : 0));
  if (want('id')) columns.id = id;
  if (want('gm')) columns.gm = gm;
  if (want('gmb')) columns.gmb = derive((i) => gm[i] * gmbRatio[i & mg]);
  if (want('gds')) columns.gds = gds;
  if (want('ro')) columns.ro = derive((i) => 1 / gds[i]);
  if (want('gmId')) columns.gmId = gmId;
  if (want('intrinsicGain')) columns.intrinsicGain = derive((i) => gm[i] / gds[i]);
  if (want('ic') || want('region')) columns.ic = derive((i) => id[i] / (2 * n[i & mn] * beta[i & mb] * ut[i & mu] * ut[i & mu]));
  const capacitancesAt = (i: number) =>
    gateCapacitances(w[i & mw] - fingers * dw, leff[i & mLeff], cox, cgdo, { vov: vov[i & mo], vds: vds[i & md], n: n[i & mn], ut: ut[i & mu] });
  if (want('cgs')) columns.cgs = derive((i) => capacitancesAt(i).cgs);
  if (want('cgd')) columns.cgd = derive((i) => capacitancesAt(i).cgd);
  if (want('cgg')) columns.cgg = derive((i) => capacitancesAt(i).cgg);
  if (want('ft')) columns.ft = derive((i) => transitFrequency(gm[i], capacitancesAt(i).cgg));
  if (want('sigmaVt')) columns.sigmaVt = derive((i) => pelgromPairSigma(avt, w[i & mw], l[i & ml]));
  if (want('ioff')) {
    columns.ioff = derive((i) => leakage(deviceAt(i), w[i & mw], l[i & ml], fingers).ioff ?? Number.NaN);
  }
  return columns;
}
