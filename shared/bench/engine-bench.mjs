// Engine benchmark: prints figures, asserts nothing. Runs on the built package (npm run bench -w shared builds first).
//
//  1. all-region operating points per second through the public sweep function (one core, one series of
//     10,000 VGS points, fields id, gm, gds, gmId), against
//  2. a bare inline loop over Float64Arrays computing the same formula for the same device (the practical limit), and
//  3. ngspice's per-point cost on a DC sweep of the same device (MOS level 1), start-up subtracted, in the same run;
//  4. ngspice's wall time for 30,000 device points in one batch run (a 2,000-point VGS sweep × 5 corners × 3 temperatures),
//     to compare the compute API's answer time with (issue 3), and the engine's own time for that request.
//
// Targets (issue 3): the engine at ≥ 50 % of the bare loop; ≥ 20× ngspice's per-point rate.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { BF180G, computeSweep, cornerShiftOf, lambdaAtLength, prepareDevice, slopeFactor, sweep } from '../dist/device/index.js';
import { sweepRequestSchema } from '../dist/schemas/index.js';

const POINTS = 10_000;
const ROUNDS = 7;
const ROUND_MS = 300;
const process_ = BF180G;

const request = sweepRequestSchema.parse({
  process: process_,
  polarity: 'nmos',
  l: 0.5e-6,
  vds: 0.9,
  id: 20e-6,
  vov: 0.2,
  sweep: { param: 'vgs', from: 0, to: process_.vdd, points: POINTS },
  hold: 'w',
  fields: ['id', 'gm', 'gds', 'gmId'],
});

// The device the sweep holds: its width and, at TT and tnom, everything the formula needs.
const base = sweep(request, process_).base;
const device = prepareDevice(process_, 'nmos');
const constants = {
  beta: (device.kp * base.w) / request.l,
  n: slopeFactor(device.params, 0),
  ut: device.ut,
  lambda: lambdaAtLength(device.params, request.l),
  vt: device.vtZeroBias,
  vds: request.vds,
};

/** Points per second of `work` (which computes `points` points), the median of several timed rounds after a warm-up. */
function rate(work, points) {
  for (let i = 0; i < 20; i++) work();
  const rates = [];
  for (let round = 0; round < ROUNDS; round++) {
    let calls = 0;
    const start = performance.now();
    let elapsed = 0;
    while (elapsed < ROUND_MS) {
      work();
      calls++;
      elapsed = performance.now() - start;
    }
    rates.push((calls * points) / (elapsed / 1000));
  }
  rates.sort((a, b) => a - b);
  return rates[Math.floor(rates.length / 2)];
}

// 2. The bare loop: the all-region formula of docs/model.md inline, four outputs, no checks, no allocation per call.
const vgs = new Float64Array(POINTS);
for (let i = 0; i < POINTS; i++) vgs[i] = (process_.vdd * i) / (POINTS - 1);
const id = new Float64Array(POINTS);
const gm = new Float64Array(POINTS);
const gds = new Float64Array(POINTS);
const gmId = new Float64Array(POINTS);
function bareLoop() {
  const { beta, n, ut, lambda, vt, vds } = constants;
  const a = 2 * n * ut;
  const m = 1 + lambda * vds;
  const p = (0.5 * beta * a * a) / n;
  for (let i = 0; i < POINTS; i++) {
    const xf = (vgs[i] - vt) / a;
    const xr = xf - (n * vds) / a;
    let lf, sf, lr, sr;
    if (xf > 0) {
      const t = Math.exp(-xf);
      lf = xf + Math.log1p(t);
      sf = 1 / (1 + t);
    } else {
      const t = Math.exp(xf);
      lf = Math.log1p(t);
      sf = t / (1 + t);
    }
    if (xr > 0) {
      const t = Math.exp(-xr);
      lr = xr + Math.log1p(t);
      sr = 1 / (1 + t);
    } else {
      const t = Math.exp(xr);
      lr = Math.log1p(t);
      sr = t / (1 + t);
    }
    const d = (lf - lr) * (lf + lr);
    const slope = lf * sf - lr * sr;
    id[i] = p * m * d;
    gm[i] = (p * m * 2 * slope) / a;
    gds[i] = p * ((m * lr * sr) / ut + lambda * d);
    gmId[i] = (2 * slope) / (a * d);
  }
}

// Same numbers from both, or the comparison means nothing.
bareLoop();
const check = sweep(request, process_).series[0].columns;
let worst = 0;
for (let i = 0; i < POINTS; i++) worst = Math.max(worst, Math.abs(check.id[i] - id[i]) / id[i], Math.abs(check.gmId[i] - gmId[i]) / gmId[i]);

// 1 and 2, interleaved so that both see the same machine.
const engineRates = [];
const bareRates = [];
for (let pass = 0; pass < 3; pass++) {
  engineRates.push(rate(() => sweep(request, process_), POINTS));
  bareRates.push(rate(bareLoop, POINTS));
}
const engineRate = Math.max(...engineRates);
const bareRate = Math.max(...bareRates);
const apiShapeRate = rate(() => computeSweep(request, process_), POINTS);

// 3 and 4: ngspice, level 1, the same device (its square law has no subthreshold tail, but the cost per point is what counts).
const ngspice = spawnSync('ngspice', ['-v'], { encoding: 'utf8' });
const haveNgspice = !ngspice.error;
const folder = mkdtempSync(join(tmpdir(), 'channelwright-bench-'));
writeFileSync(join(folder, '.spiceinit'), 'set num_threads=1\n');

function modelCard(name, corner) {
  const params = process_.nmos;
  const shift = cornerShiftOf(process_, 'nmos', corner);
  return `.model ${name} nmos level=1 vto=${params.vt0 + shift.dvt} kp=${params.kp * shift.kpScale} gamma=${params.gamma} phi=${params.twoPhiF} lambda=${lambdaAtLength(params, request.l)} tnom=${process_.tnom} is=0`;
}

/** Wall time in ms of one `ngspice -b` run of a DC sweep of `points` points over `devices` (corner, temperature). */
function ngspiceSweep(points, devices) {
  const lines = ['* Channelwright bench', '.options abstol=1e-12 reltol=1e-6'];
  const saves = [];
  devices.forEach(({ corner, temperature }, i) => {
    lines.push(modelCard(`mn${i}`, corner));
    lines.push(`m${i} d${i} g 0 0 mn${i} w=${base.w} l=${request.l} temp=${temperature}`);
    lines.push(`vd${i} d${i} 0 ${request.vds}`);
    saves.push(`@m${i}[id] @m${i}[gm] @m${i}[gds] @m${i}[gmbs]`);
  });
  lines.push('vg g 0 0', `.save ${saves.join(' ')}`, '.control', `dc vg 0 ${process_.vdd} ${process_.vdd / (points - 1)}`, 'write out.raw', '.endc', '.end');
  writeFileSync(join(folder, 'sweep.cir'), `${lines.join('\n')}\n`);
  const start = performance.now();
  spawnSync('ngspice', ['-b', 'sweep.cir'], { cwd: folder, encoding: 'utf8' });
  return performance.now() - start;
}

let ngspicePerPointNs = Number.NaN;
let ngspiceStartupMs = Number.NaN;
let ngspice30kMs = Number.NaN;
if (haveNgspice) {
  const one = [{ corner: 'TT', temperature: process_.tnom }];
  const small = [];
  const large = [];
  const LARGE = 100_000;
  for (let i = 0; i < 5; i++) {
    small.push(ngspiceSweep(2, one));
    large.push(ngspiceSweep(LARGE, one));
  }
  ngspiceStartupMs = Math.min(...small);
  ngspicePerPointNs = ((Math.min(...large) - ngspiceStartupMs) / (LARGE - 2)) * 1e6;
  const devices = ['TT', 'FF', 'SS', 'FS', 'SF'].flatMap((corner) => [-40, 27, 125].map((temperature) => ({ corner, temperature })));
  const runs = [];
  for (let i = 0; i < 5; i++) runs.push(ngspiceSweep(2000, devices));
  runs.sort((a, b) => a - b);
  ngspice30kMs = runs[Math.floor(runs.length / 2)];
}
rmSync(folder, { recursive: true, force: true });

// 4b. The engine on the same 30,000-point request, in the API's answer shape and serialised (no HTTP).
const request30k = {
  ...request,
  process: process_,
  sweep: { param: 'vgs', from: 0, to: process_.vdd, points: 2000, scale: 'lin' },
  corners: ['TT', 'FF', 'SS', 'FS', 'SF'],
  temperatures: [-40, 27, 125],
};
const times30k = [];
for (let i = 0; i < 30; i++) {
  const start = performance.now();
  JSON.stringify(computeSweep(request30k, process_));
  times30k.push(performance.now() - start);
}
times30k.sort((a, b) => a - b);
const engine30kMs = times30k[Math.floor(times30k.length / 2)];

const perPoint = (r) => `${(1e9 / r).toFixed(1)} ns/point`;
const million = (r) => `${(r / 1e6).toFixed(2)} M points/s`;
const verdict = (ok) => (ok ? 'meets the target' : 'BELOW THE TARGET');
const ngspiceRate = 1e9 / ngspicePerPointNs;

console.log('Channelwright engine benchmark (all-region model, BF180-G NMOS, one series of 10,000 VGS points, fields id gm gds gmId)');
console.log(`  Node ${process.version}, one core`);
console.log(`  engine and bare loop agree to ${worst.toExponential(1)} (relative, id and gm/ID)`);
console.log('');
console.log(`  engine, public sweep function  ${million(engineRate).padStart(16)}   ${perPoint(engineRate)}`);
console.log(`  bare Float64Array loop         ${million(bareRate).padStart(16)}   ${perPoint(bareRate)}`);
console.log(`  engine, computeSweep (API shape, points as objects) ${million(apiShapeRate)}   ${perPoint(apiShapeRate)}`);
if (haveNgspice) {
  console.log(`  ngspice level 1, DC sweep      ${(ngspiceRate / 1e6).toFixed(3).padStart(7)} M points/s   ${ngspicePerPointNs.toFixed(0)} ns/point (start-up ${ngspiceStartupMs.toFixed(1)} ms subtracted)`);
} else {
  console.log('  ngspice: not installed, its figures are missing');
}
console.log('');
const ofBare = engineRate / bareRate;
console.log(`  engine / bare loop   = ${(ofBare * 100).toFixed(0)} %   (target ≥ 50 %: ${verdict(ofBare >= 0.5)})`);
if (haveNgspice) {
  const overNgspice = engineRate / ngspiceRate;
  console.log(`  engine / ngspice     = ${overNgspice.toFixed(0)}×   (target ≥ 20×: ${verdict(overNgspice >= 20)})`);
  console.log('');
  console.log(`  30,000 device points (2,000-point VGS sweep × 5 corners × 3 temperatures, 4 fields):`);
  console.log(`    ngspice, one batch run, wall time incl. start-up: ${ngspice30kMs.toFixed(1)} ms   <- the API must answer this request faster`);
  console.log(`    engine, computeSweep + JSON.stringify (no HTTP):  ${engine30kMs.toFixed(1)} ms`);
}
