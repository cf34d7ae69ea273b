// Benchmark of characterisation through the job system and of the table model behind the API (prints figures,
// asserts nothing; runs the built server):
//  1. per engine (native ngspice when installed, and its WebAssembly build): a job of the BF180-G NMOS and PMOS over
//     4 lengths × 181 VGS × 8 VDS × 5 VSB × 2 corners (115,840 points) through POST /api/characterisations, its points
//     per second from start to done, and GET /api/health over HTTP meanwhile (one request every 10 ms): p50, p99, max;
//  2. the table model on the NMOS table the job stored: POST /api/compute/size with model "table" over HTTP, the same
//     call in-process (the engine's whole answer: snapping, re-solving, every figure), sizing alone, and lookups.
// Targets (issue 10): /api/health p99 under 50 ms while a characterisation runs; sizing from tables under 50 µs per
// device. Usage: node bench/characterisation-jobs-bench.mjs [path/to/main.js]
import { spawn } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { availableParallelism, loadavg, tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import Database from 'better-sqlite3';
import { BF180G, computeSize, prepareTable, sizeFromTable, tableOperatingPoint } from '@channelwright/shared/device';
import { findNativeNgspice } from '../dist/characterisation/simulator/native-ngspice.js';
import { unpackTable } from '../dist/characterisation/table-storage.js';
import { freePort, waitForHealth } from './bench-server.mjs';

const here = dirname(fileURLToPath(import.meta.url));
const mainJs = resolve(process.argv[2] ?? join(here, '../dist/main.js'));
const print = (label, value, target) => process.stdout.write(`  ${label.padEnd(72)} ${value.padStart(16)}   ${target ? `target ${target}` : ''}\n`);
const round = (x, digits = 0) => x.toLocaleString('en-GB', { maximumFractionDigits: digits, minimumFractionDigits: digits });
const percentile = (sorted, p) => sorted[Math.min(sorted.length - 1, Math.floor(p * sorted.length))];
const GRID = { lengths: [0.18e-6, 0.36e-6, 0.9e-6, 2.16e-6], vgsStep: 0.01, corners: ['TT', 'SS'], temperatures: [27] };

async function startServer(engine) {
  const dataDir = mkdtempSync(join(tmpdir(), 'channelwright-bench-'));
  const port = await freePort();
  const base = `http://127.0.0.1:${port}`;
  const env = { ...process.env, PORT: String(port), DATA_DIR: dataDir, SEED_DEMO: 'true', NODE_ENV: 'development', DEMO_CHARACTERISATION: 'false', CHARACTERISATION_ENGINE: engine };
  const child = spawn(process.execPath, [mainJs], { env, stdio: 'ignore' });
  await waitForHealth(base);
  const login = await (await fetch(`${base}/api/auth/login`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ email: 'admin@brackenfold.example', password: 'wrenmoss-demo' }) })).json();
  const headers = { authorization: `Bearer ${login.accessToken}`, 'content-type': 'application/json' };
  const api = async (method, path, body) => {
    const response = await fetch(`${base}${path}`, { method, headers, body: body === undefined ? undefined : JSON.stringify(body) });
    return response.json();
  };
  const stop = async () => {
    child.kill('SIGTERM');
    await new Promise((r) => child.once('exit', r));
    rmSync(dataDir, { recursive: true, force: true });
  };
  return { base, api, dataDir, stop };
}

/** GET /api/health one after the other, 10 ms apart, until `done` resolves: the answer times in ms. */
async function probeHealth(base, done) {
  const times = [];
  let finished = false;
  done.then(() => (finished = true));
  while (!finished) {
    const start = performance.now();
    await (await fetch(`${base}/api/health`)).text();
    times.push(performance.now() - start);
    await new Promise((r) => setTimeout(r, 10));
  }
  return times.sort((a, b) => a - b);
}

process.stdout.write(`Characterisation through the job system (${availableParallelism()} cores, load average ${loadavg().map((x) => x.toFixed(2)).join(' ')}; figures are wall-clock)\n`);
const native = await findNativeNgspice();
const engines = native ? ['native', 'wasm'] : ['wasm'];
let tableServer = null;
for (const engine of engines) {
  const server = await startServer(engine);
  const [process_] = await server.api('GET', '/api/processes?search=BF180-G');
  const idle = await probeHealth(server.base, new Promise((r) => setTimeout(r, 3000)));
  const job = await server.api('POST', '/api/characterisations', { processId: process_.id, devices: [{ polarity: 'nmos' }, { polarity: 'pmos' }], grid: GRID });
  let last = job;
  const done = (async () => {
    while (!['done', 'failed', 'cancelled'].includes(last.status)) {
      await new Promise((r) => setTimeout(r, 250));
      last = await server.api('GET', `/api/characterisations/${job.id}`);
    }
  })();
  const busy = await probeHealth(server.base, done);
  if (last.status !== 'done') throw new Error(`the ${engine} job ended ${last.status}: ${JSON.stringify(last.error)}`);
  const seconds = (Date.parse(last.finishedAt) - Date.parse(last.startedAt)) / 1000;
  print(`${engine}: ${round(last.progress.total)} points through a job, start to done`, `${round(seconds, 1)} s`, '');
  print(`  = points per second (simulation, storing the tables, reporting)`, round(last.progress.total / seconds), engine === 'native' ? '≥ 100,000 (ours)' : '≥ 25,000 (ours)');
  print(`  GET /api/health with nothing running: p50 / p99 / max`, `${round(percentile(idle, 0.5), 1)} / ${round(percentile(idle, 0.99), 1)} / ${round(idle.at(-1), 1)} ms`, '');
  print(`  GET /api/health while it ran (${busy.length} requests): p50 / p99 / max`, `${round(percentile(busy, 0.5), 1)} / ${round(percentile(busy, 0.99), 1)} / ${round(busy.at(-1), 1)} ms`, 'p99 < 50 ms');
  if (!tableServer) tableServer = { server, processId: process_.id };
  else await server.stop();
}

// 2. The table model on the stored NMOS table.
const { server, processId } = tableServer;
const request = { processId, polarity: 'nmos', model: 'table', corner: 'TT', temperature: 27, id: 20e-6, l: 0.5e-6, vds: 0.9, vsb: 0.225, gmId: 14 };
for (let i = 0; i < 20; i++) await server.api('POST', '/api/compute/size', request);
const httpTimes = [];
for (let i = 0; i < 200; i++) {
  const start = performance.now();
  await server.api('POST', '/api/compute/size', { ...request, gmId: 8 + (i % 12) });
  httpTimes.push(performance.now() - start);
}
httpTimes.sort((a, b) => a - b);
print('POST /api/compute/size, model "table", over HTTP: p50 / p99', `${round(percentile(httpTimes, 0.5), 1)} / ${round(percentile(httpTimes, 0.99), 1)} ms`, '');

const db = new Database(join(server.dataDir, 'channelwright.sqlite'), { readonly: true });
const row = db.prepare(`SELECT "id", "sha256", "modelName" FROM "characterisation_tables" WHERE "polarity" = 'nmos'`).get();
const bytes = Buffer.concat(db.prepare('SELECT "data" FROM "characterisation_table_chunks" WHERE "tableId" = ? ORDER BY "seq"').all(row.id).map((chunk) => chunk.data));
db.close();
const prepared = prepareTable(await unpackTable(bytes, row.sha256));
await server.stop();
const source = () => ({ prepared, ref: { id: row.id, sha256: row.sha256, characterisationId: 'bench', model: row.modelName } });
const { lengths, vds } = prepared.grid;
let seed = 11;
const random = () => ((seed = (Math.imul(seed, 1664525) + 1013904223) >>> 0) / 2 ** 32);
const targets = Array.from({ length: 1000 }, () => ({
  corner: random() < 0.5 ? 'TT' : 'SS',
  temperature: 27,
  l: lengths[0] * (lengths[lengths.length - 1] / lengths[0]) ** random(),
  vds: vds[3] + (vds[vds.length - 1] - vds[3]) * random(),
  vsb: 0.45 * random(),
  id: 1e-5,
  gmId: 5 + 15 * random(),
}));
function perCall(work, count) {
  for (let i = 0; i < count; i++) work(i);
  const times = [];
  for (let pass = 0; pass < 5; pass++) {
    const start = performance.now();
    for (let i = 0; i < count; i++) work(i);
    times.push((performance.now() - start) / count);
  }
  return times.sort((a, b) => a - b)[2];
}
const whole = perCall((i) => computeSize({ processId: 'bench', polarity: 'nmos', model: 'table', ...targets[i] }, BF180G, source), targets.length);
print('computeSize with model "table" in-process (snap, re-solve, every figure, ZTC)', `${round(whole * 1000, 1)} µs`, '');
const sizing = perCall((i) => sizeFromTable(prepared, targets[i]), targets.length);
print('sizing from the table by gm/ID, per device (between grid points)', `${round(sizing * 1000, 1)} µs`, '< 50 µs');
const lookup = perCall((i) => tableOperatingPoint(prepared, { ...targets[i], w: 10e-6, vgs: 0.3 + (i % 100) * 0.012 }), targets.length);
print('table lookups (a full operating point between grid points) per second', round(1000 / lookup), '');
