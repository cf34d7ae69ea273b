import { type CurrentModel, GM_ID, ID, KERNEL_OUTPUTS, drainCurrentInto } from './drain-current.js';
import { EngineError } from './errors.js';
import { type ChannelTerms, LONG_CHANNEL } from './short-channel.js';
import { say, sayGmId } from './say.js';

/** The weak-inversion limit of gm/ID, 1/(n·UT): no bias gives more (both models). */
export function gmIdLimit(n: number, ut: number): number {
  return 1 / (n * ut);
}

/** The largest overdrive the solvers search, V: beyond it no transistor of this kind is biased. */
export const MAX_OVERDRIVE = 50;

const MAX_ITERATIONS = 200;
const scratch = new Float64Array(KERNEL_OUTPUTS);

/**
 * The overdrive VOV = VGS − VT at which a device of current factor beta (A/V²) carries id (A) at vds:
 * Newton's method on ln ID (slope gm/ID, analytic), kept inside a bracket that bisects when Newton
 * leaves it. Starts from the exact inverse of the saturated model. Converges to 1e-13 in ln ID.
 * Where the square law's tail and its square branch do not meet exactly (VDS of a few UT), it returns
 * the edge of the gap and the caller reports the current reached.
 */
export function overdriveForCurrent(model: CurrentModel, beta: number, n: number, ut: number, lambda: number, vds: number, id: number, terms: ChannelTerms = LONG_CHANNEL): number {
  const target = Math.log(id);
  let v = initialOverdrive(model, beta, n, ut, lambda, vds, id);
  let lo = -Infinity;
  let hi = Infinity;
  let best = v;
  let bestError = Infinity;
  for (let iteration = 0; iteration < MAX_ITERATIONS; iteration++) {
    drainCurrentInto(model, beta, n, ut, lambda, v, vds, scratch, terms);
    const error = scratch[ID] > 0 ? Math.log(scratch[ID]) - target : -Infinity;
    if (Math.abs(error) < bestError) {
      best = v;
      bestError = Math.abs(error);
    }
    if (bestError < 1e-13) return best;
    if (error < 0) lo = v;
    else hi = v;
    if (hi - lo <= 4e-16 * Math.max(1, Math.abs(v))) return best;
    let next = Number.isFinite(error) ? v - error / scratch[GM_ID] : Number.NaN;
    if (!(next > lo && next < hi)) {
      if (Number.isFinite(lo) && Number.isFinite(hi)) next = 0.5 * (lo + hi);
      else if (Number.isFinite(lo)) next = v + Math.max(0.5, Math.abs(v));
      else next = v - Math.max(0.5, Math.abs(v));
    }
    v = next;
  }
  throw new EngineError('SOLVER_DID_NOT_CONVERGE', `The solver did not find the VGS that carries ${id} A; please report these inputs`, 'id');
}

function initialOverdrive(model: CurrentModel, beta: number, n: number, ut: number, lambda: number, vds: number, id: number): number {
  const a = 2 * n * ut;
  const m = 1 + lambda * vds;
  const p = 0.5 * beta * a * a * m;
  if (model === 'square-law') {
    const strong = Math.sqrt((2 * id) / (beta * m));
    if (strong >= a) return strong;
    return a + (a / 2) * Math.log(id / (p * -Math.expm1(-vds / ut)));
  }
  const softplus = Math.sqrt((id * n) / p);
  const x = softplus > 30 ? softplus : Math.log(Math.expm1(softplus));
  return Number.isFinite(x) ? a * x : 0;
}

/**
 * The overdrive at which the device has the given gm/ID (1/V) at vds; gm/ID does not depend on W.
 * gm/ID ≥ 1/(n·UT) is refused (GM_ID_ABOVE_WEAK_INVERSION_LIMIT), as is a gm/ID so low it needs VOV
 * above 50 V (GM_ID_TOO_LOW). All-region: Newton on gm/ID in x = VOV/(2nUT) inside a bisecting bracket;
 * square law: closed form (2/gm·ID in saturation, 1/(gm/ID) + VDS/2 in triode).
 */
export function overdriveForGmId(model: CurrentModel, n: number, ut: number, vds: number, gmId: number, terms: ChannelTerms = LONG_CHANNEL): number {
  const limit = gmIdLimit(n, ut);
  if (!(gmId < limit)) {
    throw new EngineError(
      'GM_ID_ABOVE_WEAK_INVERSION_LIMIT',
      `gm/ID = ${sayGmId(gmId)} is above the weak-inversion limit 1/(n·UT) = ${sayGmId(limit)} at this temperature and VSB (n = ${n.toPrecision(4)}); no bias reaches it`,
      'gmId',
    );
  }
  return model === 'square-law' ? squareLawOverdriveForGmId(n, ut, vds, gmId) : allRegionOverdriveForGmId(n, ut, vds, gmId, terms);
}

function squareLawOverdriveForGmId(n: number, ut: number, vds: number, gmId: number): number {
  const saturated = 2 / gmId;
  const vov = vds >= saturated ? saturated : 1 / gmId + vds / 2;
  if (vov < 2 * n * ut) {
    throw new EngineError(
      'GM_ID_NOT_REACHABLE',
      `With the square law at VDS = ${say(vds, 'V')}, gm/ID = ${sayGmId(gmId)} falls where its triode branch meets its exponential tail; raise VDS or use the all-region model`,
      'gmId',
    );
  }
  return checkOverdrive(vov, gmId);
}

function gmIdAt(a: number, n: number, ut: number, vds: number, x: number, terms: ChannelTerms): number {
  drainCurrentInto('all-region', 1, n, ut, 0, a * x, vds, scratch, terms);
  return scratch[GM_ID];
}

function allRegionOverdriveForGmId(n: number, ut: number, vds: number, gmId: number, terms: ChannelTerms): number {
  const a = 2 * n * ut;
  const xMax = MAX_OVERDRIVE / a;
  if (gmIdAt(a, n, ut, vds, xMax, terms) > gmId) return checkOverdrive(Infinity, gmId);
  const t = (gmId * a) / 2;
  let x = t <= 0.5 ? 1 / t : Math.log(2 * (1 - t));
  let lo = -Infinity;
  let hi = xMax;
  for (let iteration = 0; iteration < MAX_ITERATIONS; iteration++) {
    const g = gmIdAt(a, n, ut, vds, x, terms);
    const error = g - gmId;
    if (Math.abs(error) <= 1e-12 * gmId) return a * x;
    if (error > 0) lo = x;
    else hi = x;
    if (hi - lo <= 1e-15 * Math.max(1, Math.abs(x))) return a * x;
    const step = 1e-7 * Math.max(1, Math.abs(x));
    const slope = (gmIdAt(a, n, ut, vds, x + step, terms) - g) / step;
    let next = slope < 0 ? x - error / slope : Number.NaN;
    if (!(next > lo && next < hi)) next = Number.isFinite(lo) ? 0.5 * (lo + hi) : x - Math.max(1, Math.abs(x));
    x = next;
  }
  throw new EngineError('SOLVER_DID_NOT_CONVERGE', `The solver did not find the overdrive for gm/ID = ${gmId} /V; please report these inputs`, 'gmId');
}

function checkOverdrive(vov: number, gmId: number): number {
  if (vov > MAX_OVERDRIVE) {
    throw new EngineError('GM_ID_TOO_LOW', `gm/ID = ${sayGmId(gmId)} needs an overdrive above ${MAX_OVERDRIVE} V; choose a larger gm/ID`, 'gmId');
  }
  return vov;
}
