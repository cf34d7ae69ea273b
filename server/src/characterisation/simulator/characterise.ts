import { randomUUID } from 'node:crypto';
import { setMaxListeners } from 'node:events';
import { checkTableGrid, type LookupTable, TABLE_FIELDS, type TableGrid, tablePointCount } from '@channelwright/shared/device';
import type { ModelCard, ModelStatement } from '@channelwright/shared/model-card';
import { CharacterisationError } from './characterisation-error.js';
import type { SimulatorEngine, SimulatorPool } from './simulator-pool.js';
import { finishSweep, sweepPlacements } from './store-sweep.js';
import { buildSweepNetlist, type ModelFamily, modelFamily, type SweepChunk } from './sweep-netlist.js';

/** What to characterise: a parsed card, the grid of one model (grid.modelName) and where each corner's models are. */
export interface CharacterisationInput {
  card: ModelCard;
  grid: TableGrid;
  /** Corner name → the card section holding its models (null: the statements outside any section). */
  sections: Record<string, string | null>;
}

export interface CharacteriseOptions {
  pool: SimulatorPool;
  engine: SimulatorEngine;
  /** Float32 columns (compact, the default) or Float64 (to compare engines). */
  precision?: 'float32' | 'float64';
  /** Transistors per simulator run; about 160 is fastest with ngspice (fewer: start-up dominates, more: its vector bookkeeping). */
  instancesPerRun?: number;
  /** Each run is stopped after this long, ms. */
  timeoutMs?: number;
  signal?: AbortSignal;
  /** Called after each run with the points done so far and the total. */
  onProgress?: (progress: { done: number; total: number }) => void;
}

const DEFAULT_INSTANCES_PER_RUN = 160;
const DEFAULT_TIMEOUT_MS = 300_000;

/** The model of this name for a corner: in its section, else among the statements outside any section. */
export function modelForCorner(input: CharacterisationInput, corner: string): ModelStatement {
  const name = input.grid.modelName.toLowerCase();
  const sectionName = input.sections[corner];
  if (sectionName === undefined) throw new CharacterisationError('CORNER_WITHOUT_SECTION', `Corner ${corner} is not mapped to a section of the card`, 'sections');
  const section = input.card.sections.find((s) => s.name === sectionName);
  if (sectionName !== null && !section) throw new CharacterisationError('SECTION_NOT_IN_CARD', `The card has no section ${sectionName} (for corner ${corner})`, 'sections');
  const unnamed = input.card.sections.find((s) => s.name === null);
  const model = section?.models.find((m) => m.name === name) ?? unnamed?.models.find((m) => m.name === name);
  if (!model) throw new CharacterisationError('MODEL_NOT_IN_CARD', `Model ${name} is not in ${sectionName === null ? 'the card' : `section ${sectionName}`} (corner ${corner})`, 'modelName');
  if (model.polarity !== input.grid.polarity) throw new CharacterisationError('MODEL_POLARITY_MISMATCH', `Model ${name} is ${model.polarity}, the grid asks for ${input.grid.polarity}`, 'polarity');
  return model;
}

/** The runs of a grid: per corner and temperature, lengths grouped so that a run holds at most instancesPerRun transistors. */
export function planChunks(grid: TableGrid, instancesPerRun = DEFAULT_INSTANCES_PER_RUN): SweepChunk[] {
  const perLength = grid.vsb.length * grid.vds.length;
  const lengthsPerRun = Math.max(1, Math.floor(instancesPerRun / perLength));
  const chunks: SweepChunk[] = [];
  grid.corners.forEach((_, corner) =>
    grid.temperatures.forEach((_t, temperature) => {
      for (let first = 0; first < grid.lengths.length; first += lengthsPerRun) {
        const lengths = Array.from({ length: Math.min(lengthsPerRun, grid.lengths.length - first) }, (_l, i) => first + i);
        chunks.push({ corner, temperature, lengths });
      }
    }),
  );
  return chunks;
}

/**
 * Characterises one model over a grid: every chunk's netlist is written from the parsed statements (never
 * the uploaded text) and run on the pool; the answers are stored polarity-normalised into the table's
 * columns. Runs go in parallel up to the pool's size; the first failure or an abort stops the others and
 * rejects with the simulator's message, and no table is returned.
 */
export async function characterise(input: CharacterisationInput, options: CharacteriseOptions): Promise<LookupTable> {
  const { grid } = input;
  checkTableGrid(grid);
  const models = grid.corners.map((corner) => modelForCorner(input, corner));
  const families = models.map((model) => {
    const family = modelFamily(model);
    if (!family) throw new CharacterisationError('LEVEL_NOT_CHARACTERISED', `Model ${model.name} is level ${model.level}: tables are characterised from BSIM3 (level 8, 49) and BSIM4 (level 14, 54) models; levels 1–3 are the long-channel models the analytic engine covers`, 'modelName');
    return family;
  });
  const points = tablePointCount(grid);
  // Shared memory: the worker threads write their lines into the columns themselves (store-sweep.ts).
  const type = options.precision === 'float64' ? 'float64' : 'float32';
  const buffers = TABLE_FIELDS.map(() => new SharedArrayBuffer(points * (type === 'float64' ? 8 : 4)));
  const columns = Object.fromEntries(TABLE_FIELDS.map((field, i) => [field, type === 'float64' ? new Float64Array(buffers[i]) : new Float32Array(buffers[i])])) as LookupTable['columns'];
  const chunks = planChunks(grid, options.instancesPerRun);

  const stop = new AbortController();
  // Every run in flight listens to this signal (piscina adds one listener per task).
  setMaxListeners(options.pool.threads + 10, stop.signal);
  const abort = () => stop.abort(options.signal?.reason);
  if (options.signal?.aborted) throw new CharacterisationError('CHARACTERISATION_CANCELLED', 'The characterisation was cancelled');
  options.signal?.addEventListener('abort', abort, { once: true });
  let done = 0;
  // A few runs in flight (one per worker and one waiting), so that netlists are written as runs start
  // rather than all at once, which would hold the event loop for the whole grid's worth of text.
  let next = 0;
  const lane = async () => {
    while (next < chunks.length && !stop.signal.aborted) {
      const chunk = chunks[next++];
      const stored = await runChunk(input, models[chunk.corner], families[chunk.corner], chunk, { columns, buffers, type }, options, stop.signal);
      if (stop.signal.aborted) return;
      done += stored;
      options.onProgress?.({ done, total: points });
    }
  };
  try {
    await Promise.all(
      Array.from({ length: Math.min(chunks.length, options.pool.threads + 1) }, () =>
        lane().catch((error: unknown) => {
          stop.abort(error);
          throw error;
        }),
      ),
    );
    if (stop.signal.aborted) throw new CharacterisationError('CHARACTERISATION_CANCELLED', 'The characterisation was cancelled');
  } catch (error) {
    if (options.signal?.aborted) throw new CharacterisationError('CHARACTERISATION_CANCELLED', 'The characterisation was cancelled');
    throw error;
  } finally {
    options.signal?.removeEventListener('abort', abort);
  }
  return { grid, columns };
}

interface SharedColumns {
  columns: LookupTable['columns'];
  buffers: SharedArrayBuffer[];
  type: 'float32' | 'float64';
}

async function runChunk(input: CharacterisationInput, model: ModelStatement, family: ModelFamily, chunk: SweepChunk, shared: SharedColumns, options: CharacteriseOptions, signal: AbortSignal): Promise<number> {
  const { grid } = input;
  const sweep = buildSweepNetlist(model, family, grid, chunk, randomUUID());
  const where = `corner ${grid.corners[chunk.corner]}, ${grid.temperatures[chunk.temperature]} °C, L = ${chunk.lengths.map((k) => grid.lengths[k]).join(', ')} m`;
  let result;
  try {
    const store = { columns: shared.buffers, type: shared.type, placements: sweepPlacements(grid, chunk, sweep, family) };
    result = await options.pool.run({ engine: options.engine, netlist: sweep.netlist, nonce: sweep.nonce, vectors: sweep.vectors, scales: sweep.scales, store, timeoutMs: options.timeoutMs ?? DEFAULT_TIMEOUT_MS }, signal);
  } catch (error) {
    if (signal.aborted) throw signal.reason instanceof Error ? signal.reason : new CharacterisationError('CHARACTERISATION_CANCELLED', 'The characterisation was cancelled');
    throw new CharacterisationError('SIMULATION_FAILED', `The simulation of ${model.name} (${where}) failed: ${error instanceof Error ? error.message : String(error)}`);
  }
  finishSweep(shared.columns, grid, chunk, sweep, family, result);
  return sweep.instances.length * grid.vgs.count;
}
