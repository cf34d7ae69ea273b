// Benchmark of characterisation and of the table model (prints figures, asserts nothing; runs on the built server):
//  1. characterisation points per second on native ngspice and on its WebAssembly build, with 1 worker thread and
//     with one per core (a BF180-G NMOS grid of 4 lengths × 181 VGS × 8 VDS × 5 VSB × 2 corners = 57,920 points);
//  2. the full default grid of BF180-G (NMOS, PMOS and native NMOS; 5 corners; −40, 27, 125 °C) on each engine, with
//     the event loop's delay meanwhile and the stored size of the tables;
//  3. sizing from a table per device (gm/ID, random targets), and table lookups per second.
// Targets: sizing under 50 µs per device (issue 10); event-loop delay p99 under 50 ms while characterising (the
// /api/health target of issue 10, measured here without HTTP); the others are ours: ≥ 100,000 points/s native and
// ≥ 25,000 points/s WebAssembly with one worker per core, so that the demo's tables are ready within minutes of a first start.
import { readFileSync } from 'node:fs';
import { availableParallelism, loadavg } from 'node:os';
import { dirname, join } from 'node:path';
import { monitorEventLoopDelay, performance } from 'node:perf_hooks';
import { fileURLToPath } from 'node:url';
import { defaultTableGrid, prepareTable, sizeFromTable, tableOperatingPoint, tablePointCount } from '@channelwright/shared/device';
import { parseModelCard } from '@channelwright/shared/model-card';
import { characterise } from '../dist/characterisation/simulator/characterise.js';
import { findNativeNgspice } from '../dist/characterisation/simulator/native-ngspice.js';
import { SimulatorPool } from '../dist/characterisation/simulator/simulator-pool.js';
import { packTable } from '../dist/characterisation/table-storage.js';

const here = dirname(fileURLToPath(import.meta.url));
const card = parseModelCard(readFileSync(join(here, '../src/characterisation/demo-cards/bf180g.lib'), 'utf8'));
const CORNERS = ['tt', 'ff', 'ss', 'fs', 'sf'];
const sections = Object.fromEntries(CORNERS.map((c) => [c, c]));
const cores = availableParallelism();
const native = await findNativeNgspice();
const engines = native ? ['native', 'wasm'] : ['wasm'];
const print = (label, value, target) => process.stdout.write(`  ${label.padEnd(64)} ${value.padStart(16)}   ${target ? `target ${target}` : ''}\n`);
const round = (x, digits = 0) => x.toLocaleString('en-GB', { maximumFractionDigits: digits, minimumFractionDigits: digits });

process.stdout.write(`Characterisation and table model (${cores} cores; native ngspice ${native ? native.version : 'not installed'}; WebAssembly ngspice from eecircuit-engine)\n`);
process.stdout.write(`  load average before the run: ${loadavg().map((x) => x.toFixed(2)).join(' ')} (figures are wall-clock; other work on the machine slows them)\n`);
{
  const idle = monitorEventLoopDelay({ resolution: 5 });
  idle.enable();
  await new Promise((resolve) => setTimeout(resolve, 3000));
  idle.disable();
  print('event-loop delay with nothing running (baseline): p99 / max', `${round(idle.percentile(99) / 1e6, 1)} / ${round(idle.max / 1e6, 1)} ms`, '');
}

// 1. Points per second.
const small = { ...defaultTableGrid({ polarity: 'nmos', modelName: 'bfn18', vdd: 1.8, lmin: 0.18e-6, corners: ['tt', 'ss'], temperatures: [27] }) };
small.lengths = small.lengths.slice(0, 4);
const smallPoints = tablePointCount(small);
for (const engine of engines) {
  for (const threads of [...new Set([1, cores])]) {
    const pool = new SimulatorPool({ threads });
    // Warm-up: starts the workers (a WebAssembly simulator takes about 1.5 s to start, once per worker).
    await characterise({ card, grid: { ...small, lengths: small.lengths.slice(0, 1), corners: CORNERS.slice(0, threads) }, sections }, { pool, engine, instancesPerRun: 40 });
    const start = performance.now();
    await characterise({ card, grid: small, sections }, { pool, engine });
    const seconds = (performance.now() - start) / 1000;
    print(`${engine}, ${threads} worker${threads > 1 ? 's' : ''}: points per second (${round(smallPoints)} points)`, round(smallPoints / seconds), engine === 'native' ? (threads > 1 ? '≥ 100,000' : '') : threads > 1 ? '≥ 25,000' : '');
    await pool.destroy();
  }
}

// 2. The full default grid of BF180-G.
const devices = [
  { polarity: 'nmos', modelName: 'bfn18', lmin: 0.18e-6 },
  { polarity: 'pmos', modelName: 'bfp18', lmin: 0.18e-6 },
  { polarity: 'nmos', modelName: 'bfn18na', lmin: 0.5e-6 },
];
const grids = devices.map((d) => defaultTableGrid({ ...d, vdd: 1.8, corners: CORNERS, temperatures: [-40, 27, 125] }));
const totalPoints = grids.reduce((sum, grid) => sum + tablePointCount(grid), 0);
let nmosTable = null;
for (const engine of engines) {
  const pool = new SimulatorPool();
  const delay = monitorEventLoopDelay({ resolution: 5 });
  delay.enable();
  const start = performance.now();
  const tables = [];
  for (const grid of grids) tables.push(await characterise({ card, grid, sections }, { pool, engine }));
  const seconds = (performance.now() - start) / 1000;
  delay.disable();
  await pool.destroy();
  print(`full default BF180-G grid on ${engine}, ${cores} workers (${round(totalPoints)} points)`, `${round(seconds, 1)} s`, '');
  print(`  = points per second`, round(totalPoints / seconds), '');
  print(`  event-loop delay meanwhile: p99 / max`, `${round(delay.percentile(99) / 1e6, 1)} / ${round(delay.max / 1e6, 1)} ms`, 'p99 < 50 ms');
  if (!nmosTable) {
    let encoded = 0;
    let compressed = 0;
    const packStart = performance.now();
    for (const table of tables) {
      const packed = await packTable(table);
      encoded += packed.size;
      compressed += packed.compressed.length;
    }
    print('  stored size of the three tables (Float32, then gzip)', `${round(encoded / 1e6, 1)} → ${round(compressed / 1e6, 1)} MB`, '');
    print('  encoding, hashing and compressing them', `${round(performance.now() - packStart)} ms`, '');
    nmosTable = tables[0];
  }
}

// 3. Sizing and lookups on the BF180-G NMOS table.
const prepareStart = performance.now();
const prepared = prepareTable(nmosTable);
print('preparing the NMOS table for lookups (logarithms, gm/ID peaks)', `${round(performance.now() - prepareStart)} ms`, '');
let seed = 7;
const random = () => ((seed = (Math.imul(seed, 1664525) + 1013904223) >>> 0) / 2 ** 32);
const { lengths, vds, vsb } = nmosTable.grid;
const targets = Array.from({ length: 2000 }, () => ({
  corner: CORNERS[Math.floor(random() * 5)],
  temperature: [-40, 27, 125][Math.floor(random() * 3)],
  l: lengths[0] * (lengths[lengths.length - 1] / lengths[0]) ** random(),
  vds: vds[3] + (vds[vds.length - 1] - vds[3]) * random(),
  vsb: vsb[vsb.length - 1] * random(),
  id: 1e-5,
  gmId: 5 + 15 * random(),
}));
function perCall(work, count) {
  for (let i = 0; i < count; i++) work(i);
  const times = [];
  for (let round_ = 0; round_ < 5; round_++) {
    const start = performance.now();
    for (let i = 0; i < count; i++) work(i);
    times.push((performance.now() - start) / count);
  }
  return times.sort((a, b) => a - b)[2];
}
const sizing = perCall((i) => sizeFromTable(prepared, targets[i % targets.length]), targets.length);
print('sizing from the table by gm/ID, per device (between grid points)', `${round(sizing * 1000, 1)} µs`, '< 50 µs');
const lookup = perCall((i) => {
  const t = targets[i % targets.length];
  tableOperatingPoint(prepared, { ...t, w: 10e-6, vgs: 0.3 + (i % 100) * 0.012 });
}, targets.length);
print('table lookups (a full operating point between grid points) per second', round(1000 / lookup), '');
