// Benchmark (prints figures; never asserted in tests): a 2,000-point VGS sweep over 5 corners and
// 3 temperatures (30,000 operating points, four fields each: VGS, ID, gm, VT) answered by the real API over HTTP, from
// the start of the request to its last byte, against ngspice running the same 30,000 level-1 device
// points in one batch run (start-up included) on the same machine.
import { execFileSync, spawn } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { freePort, waitForHealth } from './bench-server.mjs';
import { performance } from 'node:perf_hooks';
import { BF180G } from '@channelwright/shared/device';

const here = dirname(fileURLToPath(import.meta.url));
const RUNS = 25;
const corners = ['TT', 'FF', 'SS', 'FS', 'SF'];
const temperatures = [-40, 27, 125];
const sweep = { param: 'vgs', from: 0, to: 1.8, points: 2000, scale: 'lin' };
const device = { polarity: 'nmos', model: 'all-region', id: 20e-6, w: 10e-6, l: 0.5e-6, vds: 0.9, vsb: 0, hold: 'w' };


const median = (values) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)];


async function benchApi() {
  const dataDir = mkdtempSync(join(tmpdir(), 'channelwright-bench-'));
  const port = await freePort();
  const server = spawn(process.execPath, [join(here, '../dist/main.js')], {
    env: { ...process.env, PORT: String(port), DATA_DIR: dataDir, SEED_DEMO: 'true', NODE_ENV: 'development' },
    stdio: 'ignore',
  });
  const base = `http://127.0.0.1:${port}`;
  try {
    await waitForHealth(base);
    const login = await fetch(`${base}/api/auth/login`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ email: 'designer@brackenfold.example', password: 'wrenmoss-demo' }),
    });
    const { accessToken } = await login.json();
    const body = JSON.stringify({ ...device, process: BF180G, sweep, corners, temperatures, fields: ['id', 'gm', 'vt'] });
    const headers = { 'content-type': 'application/json', authorization: `Bearer ${accessToken}` };
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
      bytes = text.length;
      points = JSON.parse(text).series.reduce((n, s) => n + s.points.length, 0);
    }
    return { median: median(times), best: Math.min(...times), bytes, points };
  } finally {
    server.kill('SIGTERM');
    rmSync(dataDir, { recursive: true, force: true });
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
process.stdout.write(`\nAPI sweep: ${api.points.toLocaleString('en')} operating points, 4 fields each (VGS, ID, gm, VT), ${(api.bytes / 1e6).toFixed(2)} MB of JSON\n`);
process.stdout.write(`  request start to last byte: median ${api.median.toFixed(1)} ms, best ${api.best.toFixed(1)} ms over ${RUNS} runs\n`);
if (ngspiceAvailable()) {
  const spice = benchNgspice();
  process.stdout.write(`ngspice level 1, the same 30,000 device points in one batch run (start-up included): median ${spice.median.toFixed(1)} ms, best ${spice.best.toFixed(1)} ms\n`);
  const ratio = spice.median / api.median;
  process.stdout.write(`  target: the API faster than ngspice → ${ratio >= 1 ? 'MET' : 'NOT MET'} (ngspice/API = ${ratio.toFixed(2)})\n`);
} else {
  process.stdout.write('ngspice not found: install it (apt-get install ngspice) to compare.\n');
}
