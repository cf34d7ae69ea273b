import { existsSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import { join, resolve } from 'node:path';
import { Piscina } from 'piscina';

/** native: Debian's ngspice binary (fastest, needs the package); wasm: ngspice compiled to WebAssembly from npm (always there). */
export type SimulatorEngine = 'native' | 'wasm';

/** One netlist to run; vectors are read back in this order. */
export interface SimulationRequest {
  engine: SimulatorEngine;
  netlist: string;
  nonce: string;
  vectors: string[];
  /** Factors the worker multiplies each vector by (default 1). */
  scales?: number[];
  /** Vectors the worker writes straight into shared columns (triples: vector index, column index, offset) instead of returning them. */
  store?: { columns: SharedArrayBuffer[]; type: 'float32' | 'float64'; placements: number[] };
  /** The run is stopped after this long, ms. */
  timeoutMs: number;
}

export interface SimulationResult {
  points: number;
  /** The vectors not stored into shared columns, vector-major: the j-th of them at point i is data[j·points + i]. */
  data: Float64Array;
  /** The simulator's warning and error lines. */
  messages: string;
}

/**
 * The worker file. It is plain JavaScript kept beside this module's source: a worker thread needs a real
 * file, and jest (which compiles TypeScript in memory) and the built server (dist/) must find the same one.
 * tsc does not copy .mjs files, so dist/ has none unless a build step puts it there; then that copy wins.
 */
export function simulationWorkerFile(): string {
  const beside = join(import.meta.dirname, 'simulation-worker.mjs');
  if (existsSync(beside)) return beside;
  return resolve(import.meta.dirname, '..', '..', '..', 'src', 'characterisation', 'simulator', 'simulation-worker.mjs');
}

/**
 * A pool of worker threads that run simulations (piscina), sized to the machine's cores by default, so
 * that characterisations never block the server's event loop. A WebAssembly worker keeps its simulator
 * started between runs; a native run is a fresh ngspice process in a fresh temporary folder.
 */
export class SimulatorPool {
  readonly threads: number;
  private readonly pool: Piscina;
  /** The native ngspice command (default "ngspice" on the PATH). */
  private readonly ngspice?: string;

  constructor(options: { threads?: number; ngspice?: string } = {}) {
    this.threads = Math.max(1, options.threads ?? availableParallelism());
    this.pool = new Piscina({
      filename: simulationWorkerFile(),
      minThreads: 0,
      maxThreads: this.threads,
      // Workers stay a while: a WebAssembly simulator takes about 1.5 s to start.
      idleTimeout: 60_000,
      // Simulations run at a lower priority than the server's own thread, so that requests keep being answered (needs the optional @napi-rs/nice; without it they run at normal priority).
      niceIncrement: 10,
    });
    this.ngspice = options.ngspice;
  }

  /** Runs one netlist; rejects with the simulator's message when it fails, or when signal aborts (the worker is then stopped). */
  run(request: SimulationRequest, signal?: AbortSignal): Promise<SimulationResult> {
    return this.pool.run({ ...request, ngspice: this.ngspice }, signal ? { signal } : undefined) as Promise<SimulationResult>;
  }

  /** Stops every worker; pending runs are rejected. */
  async destroy(): Promise<void> {
    await this.pool.destroy();
  }
}
