// Benchmark (prints figures; never asserted in tests): a 2,000-point VGS sweep over 5 corners and
// 3 temperatures (30,000 operating points, four fields each: VGS, ID, gm, VT) answered by the real API over HTTP, from
// the start of the request to its last byte, against ngspice running the same 30,000 level-1 device
// points in one batch run (start-up included) on the same machine.
import { execFileSync, fork } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { demoDesignerToken, startDemoServer } from './bench-server.mjs';
import { performance } from 'node:perf_hooks';
import { BF180G } from '@channelwright/shared/device';

const here = dirname(fileURLToPath(import.meta.url));
const RUNS = 25;
const corners = ['TT', 'FF', 'SS', 'FS', 'SF'];
const temperatures = [-40, 27, 125];
const sweep = { param: 'vgs', from: 0, to: 1.8, points: 2000, scale: 'lin' };
const device = { polarity: 'nmos', model: 'all-region', id: 20e-6, w: 10e-6, l: 0.5e-6, vds: 0.9, vsb: 0, hold: 'w' };


const median = (values) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)];


const mainJs = join(here, '../dist/main.js');

/** Start-to-last-byte times of the 30,000-point sweep in one layout. */
async function timeSweep(base, headers, layout) {
  const body = JSON.stringify({ ...device, process: BF180G, sweep, corners, temperatures, fields: ['id', 'gm', 'vt'], layout });
  const times = [];
  let bytes = 0;
  let points = 0;
  for (let run = 0; run < RUNS + 3; run++) {
    const start = performance.now();
    const response = await fetch(`${base}/api/compute/sweep`, { method: 'POST', headers, body });
    const received = await response.arrayBuffer(); // the last byte has arrived
    const elapsed = performance.now() - start;
    const text = Buffer.from(received).toString('utf8');
    if (response.status !== 200) throw new Error(`sweep answered ${response.status}: ${text.slice(0, 300)}`);
    if (run >= 3) times.push(elapsed); // the first runs warm the JIT
    bytes = received.byteLength;
    const answer = JSON.parse(text);
    points = answer.series.reduce((n, s) => n + (s.points ? s.points.length : s.length), 0);
  }
  return { median: median(times), best: Math.min(...times), bytes, points };
}

/** The largest sweep the API allows: 10,000 points × 5 corners × 2 temperatures = 100,000 points, every field. */
const largest = { ...device, process: BF180G, sweep: { ...sweep, points: 10_000 }, corners, temperatures: [27, 125] };

/** Health latencies (ms) sampled by one caller at a time, in a process of its own, while `work` runs. */
async function healthDuring(base, work) {
  const sampler = fork(join(here, 'health-sampler.mjs'), [base], { stdio: ['ignore', 'ignore', 'inherit', 'ipc'] });
  const latenciesOf = new Promise((resolve) => sampler.once('message', resolve));
  await new Promise((r) => setTimeout(r, 300)); // the sampler is calling
  const started = performance.now();
  const result = await work();
  const elapsed = performance.now() - started;
  sampler.send('stop');
  const sorted = [...(await latenciesOf)].sort((a, b) => a - b);
  return { result, elapsed, samples: sorted.length, p50: sorted[Math.floor(sorted.length * 0.5)], p99: sorted[Math.min(sorted.length - 1, Math.floor(sorted.length * 0.99))], max: sorted.at(-1) };
}

async function largestSweep(base, headers, layout) {
  const response = await fetch(`${base}/api/compute/sweep`, { method: 'POST', headers, body: JSON.stringify({ ...largest, layout }) });
  const received = await response.arrayBuffer();
  if (response.status !== 200) throw new Error(`the largest sweep answered ${response.status}`);
  return received.byteLength;
}

/** Peak resident memory of a process so far (VmHWM), in MB. */
function peakMemoryMb(pid) {
  const status = readFileSync(`/proc/${pid}/status`, 'utf8');
  const kb = Number(/VmHWM:\s+(\d+)/.exec(status)?.[1] ?? NaN);
  return kb / 1024;
}

async function benchApi() {
  const { base, stop, pid } = await startDemoServer(mainJs);
  try {
    const token = await demoDesignerToken(base, mainJs);
    const headers = { 'content-type': 'application/json', authorization: `Bearer ${token}` };
    const points = await timeSweep(base, headers, 'points');
    const columns = await timeSweep(base, headers, 'columns');
    const idle = await healthDuring(base, () => new Promise((r) => setTimeout(r, 2000)));
    const during = {};
    for (const layout of ['points', 'columns']) {
      await largestSweep(base, headers, layout); // warm-up
      during[layout] = await healthDuring(base, () => largestSweep(base, headers, layout));
    }
    const before = peakMemoryMb(pid);
    const three = await healthDuring(base, () => Promise.all([0, 1, 2].map(() => largestSweep(base, headers, 'points'))));
    return { points, columns, idle, during, three, memory: { before, after: peakMemoryMb(pid) } };
  } finally {
    stop();
  }
}

function ngspiceAvailable() {
  try {
    execFileSync('ngspice', ['--version'], { stdio: 'ignore', timeout: 10_000, input: '' });
    return true;
  } catch {
    return false;
  }
}

/** The same 30,000 device points in one ngspice batch run: 15 level-1 devices, one per corner × temperature. */
function benchNgspice() {
  const dir = mkdtempSync(join(tmpdir(), 'channelwright-ngspice-'));
  const p = BF180G.nmos;
  const lambda = p.lRef === undefined ? p.lambda : (p.lambda * p.lRef) / device.l;
  const lines = ['* 30,000 device points: 2000-point VGS sweep x 5 corners x 3 temperatures', 'vg g 0 0', `vd d 0 ${device.vds}`];
  const cornerShift = (name) => BF180G.corners.find((c) => c.name === name)?.nmos ?? { dvt: 0, kpScale: 1 };
  const saved = [];
  corners.forEach((name, i) => {
    const shift = cornerShift(name);
    lines.push(`.model n_${name} nmos level=1 vto=${p.vt0 + shift.dvt} kp=${p.kp * shift.kpScale} gamma=${p.gamma} phi=${p.twoPhiF} lambda=${lambda} is=0`);
    temperatures.forEach((t, k) => {
      const m = `m${i * temperatures.length + k}`;
      lines.push(`${m} d g 0 0 n_${name} w=${device.w} l=${device.l} temp=${t}`);
      saved.push(`@${m}[id]`, `@${m}[gm]`, `@${m}[von]`);
    });
  });
  // The same output the API gives: ID, gm and VT of every device at every point of the VGS sweep, as text.
  lines.push(`.save ${saved.join(' ')}`, '.options gmin=1e-20', `.dc vg ${sweep.from} ${sweep.to} ${(sweep.to - sweep.from) / (sweep.points - 1)}`);
  lines.push('.control', 'set filetype=ascii', 'run', 'write sweep.raw', '.endc', '.end');
  const netlist = join(dir, 'bench.cir');
  writeFileSync(netlist, lines.join('\n'));
  writeFileSync(join(dir, '.spiceinit'), 'set num_threads=1\n');
  const times = [];
  for (let run = 0; run < 12; run++) {
    const start = performance.now();
    try {
      execFileSync('ngspice', ['-b', netlist], { cwd: dir, stdio: 'ignore', timeout: 60_000 });
    } catch {
      // ngspice -b may exit 1 after a successful run; the time is what we want here.
    }
    if (run >= 2) times.push(performance.now() - start);
  }
  rmSync(dir, { recursive: true, force: true });
  return { median: median(times), best: Math.min(...times) };
}

const api = await benchApi();
const mb = (bytes) => (bytes / 1e6).toFixed(2);
process.stdout.write(`\nAPI sweep: ${api.points.points.toLocaleString('en')} operating points, 4 fields each (VGS, ID, gm, VT)\n`);
process.stdout.write(`  layout "points":  ${mb(api.points.bytes)} MB of JSON, request start to last byte: median ${api.points.median.toFixed(1)} ms, best ${api.points.best.toFixed(1)} ms over ${RUNS} runs\n`);
process.stdout.write(`  layout "columns": ${mb(api.columns.bytes)} MB of JSON, request start to last byte: median ${api.columns.median.toFixed(1)} ms, best ${api.columns.best.toFixed(1)} ms over ${RUNS} runs\n`);
const health = (label, h, target) => process.stdout.write(`  /api/health ${label}: p50 ${h.p50.toFixed(1)} ms, p99 ${h.p99.toFixed(1)} ms, max ${h.max.toFixed(1)} ms over ${h.samples} calls${target ? `; target p99 < ${target} ms → ${h.p99 < target ? 'MET' : 'NOT MET'}` : ''}\n`);
process.stdout.write('\nThe largest sweep the API allows (10,000 points × 5 corners × 2 temperatures = 100,000 points, all 27 fields):\n');
health('idle', api.idle);
for (const layout of ['points', 'columns']) health(`during it, layout "${layout}" (${mb(api.during[layout].result)} MB, answered in ${api.during[layout].elapsed.toFixed(0)} ms)`, api.during[layout], 50);
health(`during three at once (layout "points", answered in ${api.three.elapsed.toFixed(0)} ms)`, api.three, 50);
process.stdout.write(`  server peak resident memory: ${api.memory.before.toFixed(0)} MB before the three, ${api.memory.after.toFixed(0)} MB after; target < 2,048 MB → ${api.memory.after < 2048 ? 'MET' : 'NOT MET'}\n`);
if (ngspiceAvailable()) {
  const spice = benchNgspice();
  process.stdout.write(`\nngspice level 1, the same 30,000 device points in one batch run (start-up included): median ${spice.median.toFixed(1)} ms, best ${spice.best.toFixed(1)} ms\n`);
  for (const layout of ['points', 'columns']) {
    const ratio = spice.median / api[layout].median;
    process.stdout.write(`  target: the API (layout "${layout}") faster than ngspice → ${ratio >= 1 ? 'MET' : 'NOT MET'} (ngspice/API = ${ratio.toFixed(2)})\n`);
  }
} else {
  process.stdout.write('ngspice not found: install it (apt-get install ngspice) to compare.\n');
}
