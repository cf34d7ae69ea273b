import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { BF180G, computeSize, thermalVoltage } from '../src/device/index.js';
import { type ExtractionResult, type MeasuredPoint, extractParameters } from '../src/extraction/index.js';
import type { Process } from '../src/schemas/index.js';
import { ngspiceAvailable, onCi, runDc, runFolder } from './support/ngspice.js';

if (!ngspiceAvailable && !onCi) console.warn('ngspice is not installed: the extraction check against BSIM4 is skipped (it fails instead when CI=true)');

// An invented 180 nm-class BSIM4 card of our own (test/fixtures), simulated in Debian's ngspice; the all-region
// model is fitted over L = lmin … 10·lmin and must then size like the card (the target of docs/extraction.md).
const CARD = readFileSync(join(__dirname, 'fixtures', 'invented-180nm-nmos.lib'), 'utf8');
const LENGTHS = [0.18e-6, 0.25e-6, 0.36e-6, 0.5e-6, 0.72e-6, 1e-6, 1.4e-6, 1.8e-6];
const DRAINS = [0.45, 0.9, 1.8];
const BODIES = [0, 0.45, 0.9];
const W_FIT = 10e-6;
/** A narrow device at every length (VDS = 0.9 V, VSB = 0), so that the fit can tell ΔW: sizing at gm/ID = 5 S/A draws W down to 0.13 µm. */
const W_NARROW = 0.5e-6;
const TARGET_ID = 10e-6;

interface Curve {
  vgs: number[];
  id: number[];
}

/** One batch run: every device on the shared gate, its own drain and body sources; the drain currents by VGS. */
function sweep(devices: { w: number; l: number; vds: number; vsb: number }[], step: number): Curve[] {
  const lines = [CARD, 'vg g 0 0'];
  devices.forEach((d, k) => lines.push(`m${k} d${k} g 0 b${k} xn18 w=${d.w} l=${d.l}`, `vd${k} d${k} 0 ${d.vds}`, `vb${k} b${k} 0 ${-d.vsb}`));
  const columns = runDc(runFolder(), lines, `dc vg 0 1.8 ${step}`, ['v(g)', ...devices.map((_, k) => `i(vd${k})`)]);
  const vgs = columns.get('v(g)') as number[];
  return devices.map((_, k) => ({ vgs, id: (columns.get(`i(vd${k})`) as number[]).map((i) => -i) }));
}

/** VGS where gm/ID (central differences of ln ID) falls through the target, and ID there, by linear interpolation. */
function atGmId(curve: Curve, target: number): { vgs: number; id: number } {
  const { vgs, id } = curve;
  for (let k = 1; k < vgs.length - 2; k++) {
    const here = (Math.log(id[k + 1]) - Math.log(id[k - 1])) / (vgs[k + 1] - vgs[k - 1]);
    const next = (Math.log(id[k + 2]) - Math.log(id[k])) / (vgs[k + 2] - vgs[k]);
    if (id[k] > 1e-11 && here >= target && next < target) {
      const t = (here - target) / (here - next);
      return { vgs: vgs[k] + t * (vgs[k + 1] - vgs[k]), id: Math.exp(Math.log(id[k]) + t * (Math.log(id[k + 1]) - Math.log(id[k]))) };
    }
  }
  throw new Error(`gm/ID ${target} not reached`);
}

/** The width at which the BSIM4 device carries 10 µA at the gm/ID: from the current density, refined once at that width. */
function bsimWidth(l: number, gmId: number): number {
  const [reference] = sweep([{ w: W_FIT, l, vds: 0.9, vsb: 0 }], 0.002);
  const first = (TARGET_ID / atGmId(reference, gmId).id) * W_FIT;
  const [refined] = sweep([{ w: first, l, vds: 0.9, vsb: 0 }], 0.002);
  return (TARGET_ID / atGmId(refined, gmId).id) * first;
}

const base = { tnom: 27, vdd: 1.8, params: { ...BF180G.nmos, tox: 4e-9, lmin: 0.18e-6, lambda: 0, lRef: undefined, n: undefined } };

describe.runIf(ngspiceAvailable || onCi)('the all-region model fitted to an invented BSIM4 card (Debian ngspice 39)', () => {
  let result: ExtractionResult;
  let fittedProcess: Process;

  beforeAll(() => {
    const devices = [
      ...LENGTHS.flatMap((l) => DRAINS.flatMap((vds) => BODIES.map((vsb) => ({ w: W_FIT, l, vds, vsb })))),
      ...LENGTHS.map((l) => ({ w: W_NARROW, l, vds: 0.9, vsb: 0 })),
    ];
    const curves = sweep(devices, 0.02);
    const points: MeasuredPoint[] = [];
    curves.forEach((curve, k) => curve.vgs.forEach((vgs, p) => points.push({ vgs, ...devices[k], temperature: 27, id: curve.id[p] })));
    result = extractParameters({ polarity: 'nmos', points, base, model: 'all-region', noiseFloor: 1e-10 });
    fittedProcess = { ...BF180G, nmos: result.fitted };
  }, 600_000);

  it('converges, with the current density against gm/ID within 7 % RMS over the sizing range and the strong-inversion current within 10 % RMS', () => {
    expect(result.converged).toBe(true);
    if (process.env.SHOW_ERRORS) console.log(`density RMS ${result.densityRms}, strong ${result.rms.find((r) => r.region === 'strong')?.rms}`, result.parameters.map((p) => `${p.name} = ${p.value.toPrecision(4)}`).join(', '));
    expect(result.densityRms).toBeLessThan(0.07);
    expect(result.rms.find((r) => r.region === 'strong')?.rms).toBeLessThan(0.1);
  });

  // The target of docs/extraction.md, ±10 %; measured worst −8.0 % at L = 0.5 µm, gm/ID = 20 S/A. What is left is
  // the shape of moderate inversion: the EKV charge relation and this card differ by a bump of about ±6 % between
  // gm/ID = 15 and 20 S/A that no first-order term follows.
  it('sizes W for 10 µA at gm/ID = 5 … 20 S/A within ±10 % of the card, from L = 0.18 to 1.8 µm', () => {
    const errors: string[] = [];
    for (const l of [0.18e-6, 0.5e-6, 1e-6, 1.8e-6]) {
      for (const gmId of [5, 10, 15, 20]) {
        const expected = bsimWidth(l, gmId);
        const sized = computeSize({ processId: 'fit', polarity: 'nmos', id: TARGET_ID, l, vds: 0.9, vsb: 0, gmId }, fittedProcess).wRequired;
        const error = sized / expected - 1;
        if (process.env.SHOW_ERRORS) console.log(`W error L=${l} gmId=${gmId}: ${(error * 100).toFixed(1)} %`);
        if (Math.abs(error) > 0.1) errors.push(`L = ${l * 1e6} µm, gm/ID = ${gmId}: ${(error * 100).toFixed(1)} %`);
      }
    }
    expect(errors).toEqual([]);
  }, 120_000);

  it('gives the swing of the simulated curve within 3 %', () => {
    const [curve] = sweep([{ w: W_FIT, l: 1.8e-6, vds: 0.9, vsb: 0 }], 0.002);
    let steepest = 0;
    for (let k = 1; k < curve.vgs.length - 1; k++) {
      if (curve.id[k] < 1e-10 || curve.id[k] > 1e-7) continue;
      const perVolt = (Math.log10(curve.id[k + 1]) - Math.log10(curve.id[k - 1])) / (curve.vgs[k + 1] - curve.vgs[k - 1]);
      steepest = Math.max(steepest, perVolt);
    }
    const simulated = 1 / steepest;
    const n = result.fitted.n as number;
    const extracted = n * Math.LN10 * thermalVoltage(300.15);
    if (process.env.SHOW_ERRORS) console.log(`swing: extracted ${extracted}, simulated ${simulated}`);
    expect(Math.abs(extracted / simulated - 1)).toBeLessThan(0.03);
  }, 60_000);
});
