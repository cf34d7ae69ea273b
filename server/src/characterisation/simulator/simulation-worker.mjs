// The worker-thread side of the simulator pool (piscina): runs one netlist that Channelwright wrote on
// Debian's native ngspice or on ngspice compiled to WebAssembly (npm eecircuit-engine) and returns the
// asked-for vectors. Plain JavaScript, because a worker thread needs a real file both under jest (which
// compiles TypeScript in memory) and in the built server; simulator-pool.ts explains where it is found.
import { spawn } from 'node:child_process';
import { mkdtemp, readFile, rm, writeFile } from 'node:fs/promises';
import { setPriority, tmpdir } from 'node:os';
import { join } from 'node:path';
import { canonicalVectorName, readRawFile } from './read-raw-file.mjs';

/** A WebAssembly simulator is started once per worker and replaced after this many runs, so its heap cannot creep. */
const WASM_RUNS_PER_START = 200;
/** How much of the simulator's own messages an error carries. */
const MESSAGE_LIMIT = 2000;

/**
 * Each vector is multiplied by scales[j] when given. A vector named in `store.placements` (triples: vector
 * index, column index, offset) is written straight into that shared column at that offset, so that the main
 * thread neither receives nor copies it; the others come back in `data`, vector-major, in their order.
 * @param {{ engine: 'native' | 'wasm', netlist: string, nonce: string, vectors: string[], scales?: number[], timeoutMs: number, ngspice?: string,
 *   store?: { columns: SharedArrayBuffer[], type: 'float32' | 'float64', placements: number[] } }} task
 * @returns {Promise<{ points: number, data: Float64Array, messages: string }>}
 */
export default async function runSimulation(task) {
  return task.engine === 'native' ? runNative(task) : runWasm(task);
}

async function runNative(task) {
  const folder = await mkdtemp(join(tmpdir(), 'channelwright-ngspice-'));
  try {
    // Debian's ngspice evaluates BSIM3/BSIM4 on two OpenMP threads unless told otherwise; one thread per run is faster when runs go in parallel.
    await writeFile(join(folder, '.spiceinit'), 'set num_threads=1\n');
    await writeFile(join(folder, 'sweep.cir'), task.netlist);
    const output = await runProcess(task.ngspice ?? 'ngspice', ['-b', '-r', 'sweep.raw', 'sweep.cir'], folder, task.timeoutMs);
    let bytes;
    try {
      bytes = await readFile(join(folder, 'sweep.raw'));
    } catch {
      throw new Error(`ngspice wrote no results. ${simulatorMessages(output) || output.slice(-MESSAGE_LIMIT)}`);
    }
    const raw = readRawFile(bytes);
    if (!raw.title.includes(task.nonce)) throw new Error('ngspice returned the results of another netlist');
    const columns = raw.names.map(canonicalVectorName);
    return extract(task, raw.points, (name) => {
      const j = columns.indexOf(name);
      if (j < 0) return null;
      const column = new Float64Array(raw.points);
      for (let i = 0; i < raw.points; i++) column[i] = raw.values[i * raw.names.length + j];
      return column;
    }, simulatorMessages(output));
  } finally {
    await rm(folder, { recursive: true, force: true });
  }
}

/** Runs a program without a shell, with a minimal environment; resolves with its output (stdout and stderr together). */
function runProcess(command, args, cwd, timeoutMs) {
  return new Promise((resolve, reject) => {
    const child = spawn(command, args, { cwd, env: { PATH: process.env.PATH ?? '/usr/bin:/bin', HOME: cwd, LANG: 'C' }, timeout: timeoutMs, killSignal: 'SIGKILL', stdio: ['ignore', 'pipe', 'pipe'] });
    // Below the server in priority, like the worker threads (simulator-pool.ts).
    if (child.pid !== undefined) {
      try {
        setPriority(child.pid, 10);
      } catch {
        // Not allowed here: it runs at normal priority.
      }
    }
    const chunks = [];
    child.stdout.on('data', (chunk) => chunks.push(chunk));
    child.stderr.on('data', (chunk) => chunks.push(chunk));
    child.on('error', (error) => reject(new Error(`ngspice could not be started: ${error.message}`)));
    child.on('close', (code, signal) => {
      const output = Buffer.concat(chunks).toString('utf8');
      if (signal) reject(new Error(`ngspice was stopped (${signal}) after ${timeoutMs} ms. ${simulatorMessages(output)}`));
      else resolve(output);
    });
  });
}

let wasm = null;

async function runWasm(task) {
  if (!wasm || wasm.runs >= WASM_RUNS_PER_START) {
    const { Simulation } = await import('eecircuit-engine');
    const simulation = new Simulation();
    await simulation.start();
    wasm = { simulation, runs: 0 };
  }
  wasm.runs += 1;
  const { simulation } = wasm;
  simulation.setNetList(task.netlist);
  const result = await simulation.runSim();
  const messages = simulatorMessages(simulation.getError().join('\n'));
  // A failed run leaves the previous results in place: the title with this run's nonce tells them apart.
  if (!result || typeof result.header !== 'string' || !result.header.includes(task.nonce)) {
    wasm = null;
    throw new Error(`The WebAssembly ngspice gave no results for this netlist. ${messages}`);
  }
  if (result.dataType !== 'real') throw new Error('The WebAssembly ngspice returned complex data for a DC sweep');
  const byName = new Map(result.data.map((vector) => [canonicalVectorName(vector.name), vector.values]));
  return extract(task, result.numPoints, (name) => {
    const values = byName.get(name);
    return values ? Float64Array.from(values) : null;
  }, messages);
}

function extract(task, points, column, messages) {
  const placed = new Map();
  const store = task.store;
  if (store) for (let p = 0; p < store.placements.length; p += 3) placed.set(store.placements[p], p);
  const views = store ? store.columns.map((buffer) => (store.type === 'float64' ? new Float64Array(buffer) : new Float32Array(buffer))) : [];
  const data = new Float64Array((task.vectors.length - placed.size) * points);
  let returned = 0;
  task.vectors.forEach((name, j) => {
    const values = column(canonicalVectorName(name));
    if (!values) throw new Error(`The simulator returned no vector ${name}. ${messages}`);
    const scale = task.scales?.[j] ?? 1;
    if (scale !== 1) for (let i = 0; i < points; i++) values[i] *= scale;
    const p = placed.get(j);
    if (p === undefined) data.set(values, points * returned++);
    else views[store.placements[p + 1]].set(values, store.placements[p + 2]);
  });
  return { points, data, messages };
}

/** The simulator's warning and error lines, shortened. */
function simulatorMessages(output) {
  return output
    .split('\n')
    .filter((line) => /error|warning|fatal|cannot|unknown|not found|singular|failed/i.test(line))
    .join('\n')
    .slice(0, MESSAGE_LIMIT);
}
