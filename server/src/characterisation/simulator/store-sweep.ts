import { lineOffset, type LookupTable, TABLE_FIELDS, type TableGrid, vgsOfNode } from '@channelwright/shared/device';
import { CharacterisationError } from './characterisation-error.js';
import type { SimulationResult } from './simulator-pool.js';
import type { ModelFamily, SweepChunk, SweepNetlist } from './sweep-netlist.js';

/**
 * Stores one run's answers into the table's columns. The worker has already made them polarity-normalised
 * (sweep-netlist.ts, instanceScales), so each instance's vectors are whole VGS lines copied as they are;
 * BSIM3 has no cgb output: Cgb = Cgg − Cgs − Cgd. Refuses a run whose sweep is not the grid's VGS axis.
 */
export function storeSweep(columns: LookupTable['columns'], grid: TableGrid, chunk: SweepChunk, sweep: SweepNetlist, family: ModelFamily, result: SimulationResult): void {
  const { count } = grid.vgs;
  if (result.points !== count) throw new CharacterisationError('SIMULATION_FAILED', `The simulator swept ${result.points} VGS points, the grid has ${count}`);
  const { data } = result;
  // The sweep came back multiplied by the polarity sign: polarity-normalised VGS.
  for (let g = 0; g < count; g++) {
    const expected = vgsOfNode(grid.vgs, g);
    if (Math.abs(data[g] - expected) > 1e-9 * Math.max(1, Math.abs(expected))) {
      throw new CharacterisationError('SIMULATION_FAILED', `The simulator's sweep point ${g} is VGS = ${data[g]} V, not ${expected} V`);
    }
  }
  const fields = family === 'bsim4' ? TABLE_FIELDS : TABLE_FIELDS.filter((field) => field !== 'cgb');
  sweep.instances.forEach((instance, k) => {
    const offset = lineOffset(grid, chunk.corner, chunk.temperature, instance.length, instance.vsb, instance.vds);
    const first = 1 + k * fields.length;
    fields.forEach((field, j) => columns[field].set(data.subarray((first + j) * count, (first + j + 1) * count), offset));
    if (family === 'bsim3') {
      for (let g = 0; g < count; g++) columns.cgb[offset + g] = columns.cgg[offset + g] - columns.cgs[offset + g] - columns.cgd[offset + g];
    }
  });
}
