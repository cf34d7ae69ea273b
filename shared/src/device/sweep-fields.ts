import type { SweepField } from '../schemas/sweep.js';
import { gateDrainCapacitance, gateSourceCapacitance, transitFrequency } from './capacitance.js';
import { ID, KERNEL_OUTPUTS, allRegionCurrentInto, maskOf } from './drain-current.js';
import { pelgromPairSigma } from './mismatch.js';
import type { PreparedDevice } from './resolve-device.js';
import { slopeFactor } from './slope-factor.js';
import type { KernelOutputs, SeriesInputs } from './sweep-inputs.js';

/** The columns of the fields asked for, each a fresh array computed in its own pass over the points. */
export function fieldColumns(fields: readonly SweepField[], inputs: SeriesInputs, outputs: KernelOutputs, device: PreparedDevice, count: number): Partial<Record<SweepField, Float64Array>> {
  const { w, l, vt, vov, vds, vsb, tempC, n, gmbRatio, beta, ut, vtZeroBias, lambda } = inputs;
  const [mw, ml, mt, mo, md, mn, mg, mb, mu, mz, mLambda] = [w, l, vt, vov, vds, n, gmbRatio, beta, ut, vtZeroBias, lambda].map(maskOf);
  const { id, gm, gds, gmId, vdsat } = outputs;
  const { params, cox, vdd } = device;
  const { cgdo, avt, ldiff } = params;
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
  const cgs = (i: number) => gateSourceCapacitance(w[i & mw], l[i & ml], cox, cgdo);
  const cgd = (i: number) => gateDrainCapacitance(w[i & mw], cgdo);
  if (want('cgs')) columns.cgs = derive(cgs);
  if (want('cgd')) columns.cgd = derive(cgd);
  if (want('ft')) columns.ft = derive((i) => transitFrequency(gm[i], cgs(i), cgd(i)));
  if (want('sigmaVt')) columns.sigmaVt = derive((i) => pelgromPairSigma(avt, w[i & mw], l[i & ml]));
  if (want('ioff')) {
    const out = new Float64Array(KERNEL_OUTPUTS);
    const nAtZeroBias = slopeFactor(params, 0);
    const jg = params.jg ?? 0;
    const js = params.js ?? 0;
    columns.ioff = derive((i) => {
      const vt0 = vtZeroBias[i & mz];
      if (vt0 < 0) return Number.NaN;
      allRegionCurrentInto(beta[i & mb], nAtZeroBias, ut[i & mu], lambda[i & mLambda], -vt0, vdd, out);
      return out[ID] + jg * w[i & mw] * l[i & ml] + js * w[i & mw] * ldiff;
    });
  }
  return columns;
}
