import { lineOffset, type LookupTable, TABLE_FIELDS, type TableField, type TableGrid, vgsOfNode } from '@channelwright/shared/device';
import { CharacterisationError } from './characterisation-error.js';
import type { SimulationResult } from './simulator-pool.js';
import type { ModelFamily, SweepChunk, SweepNetlist } from './sweep-netlist.js';

/** The fields a family's runs read (BSIM3 has no cgb output), in the order of instanceVectors. */
export function fieldsRead(family: ModelFamily): readonly TableField[] {
  return family === 'bsim4' ? TABLE_FIELDS : TABLE_FIELDS.filter((field) => field !== 'cgb');
}

/**
 * Where each instance's vectors go: triples (vector index, column index in TABLE_FIELDS, offset of the line).
 * The worker writes them straight into the shared columns, already polarity-normalised (instanceScales), so
 * the main thread copies nothing; only the sweep vector itself comes back.
 */
export function sweepPlacements(grid: TableGrid, chunk: SweepChunk, sweep: SweepNetlist, family: ModelFamily): number[] {
  const fields = fieldsRead(family);
  const placements: number[] = [];
  sweep.instances.forEach((instance, k) => {
    const offset = lineOffset(grid, chunk.corner, chunk.temperature, instance.length, instance.vsb, instance.vds);
    fields.forEach((field, j) => placements.push(1 + k * fields.length + j, TABLE_FIELDS.indexOf(field), offset));
  });
  return placements;
}

/**
 * Checks a run that stored its lines: the sweep that came back (multiplied by the polarity sign, so
 * polarity-normalised) must be the grid's VGS axis. For BSIM3 fills in Cgb = Cgg − Cgs − Cgd.
 */
export function finishSweep(columns: LookupTable['columns'], grid: TableGrid, chunk: SweepChunk, sweep: SweepNetlist, family: ModelFamily, result: SimulationResult): void {
  const { count } = grid.vgs;
  if (result.points !== count) throw new CharacterisationError('SIMULATION_FAILED', `The simulator swept ${result.points} VGS points, the grid has ${count}`);
  for (let g = 0; g < count; g++) {
    const expected = vgsOfNode(grid.vgs, g);
    if (Math.abs(result.data[g] - expected) > 1e-9 * Math.max(1, Math.abs(expected))) {
      throw new CharacterisationError('SIMULATION_FAILED', `The simulator's sweep point ${g} is VGS = ${result.data[g]} V, not ${expected} V`);
    }
  }
  if (family !== 'bsim3') return;
  for (const instance of sweep.instances) {
    const offset = lineOffset(grid, chunk.corner, chunk.temperature, instance.length, instance.vsb, instance.vds);
    for (let g = offset; g < offset + count; g++) columns.cgb[g] = columns.cgg[g] - columns.cgs[g] - columns.cgd[g];
  }
}
