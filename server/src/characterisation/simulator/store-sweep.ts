import { lineOffset, type LookupTable, type TableGrid, vgsOfNode } from '@channelwright/shared/device';
import { CharacterisationError } from './characterisation-error.js';
import type { SimulationResult } from './simulator-pool.js';
import type { ModelFamily, SweepChunk, SweepNetlist } from './sweep-netlist.js';

/**
 * Stores one run's answers into the table's columns, polarity-normalised: ID = −type·i(vd) (the drain
 * source's current flows into the drain for a conducting NMOS, out of it for a PMOS); gm, gds, gmbs, vth
 * and vdsat as ngspice reports them (n-normalised for BSIM3/BSIM4, so positive for a PMOS); Cgg as
 * reported and Cgx = −(reported cgx) for x = s, d, b, because BSIM reports cgx = ∂Qg/∂Vx, which is negative
 * (BSIM3: Cgb = Cgg − Cgs − Cgd, it has no cgb output). Refuses a run whose sweep is not the grid's VGS axis.
 */
export function storeSweep(columns: LookupTable['columns'], grid: TableGrid, chunk: SweepChunk, sweep: SweepNetlist, family: ModelFamily, result: SimulationResult): void {
  const { count } = grid.vgs;
  const sign = grid.polarity === 'nmos' ? 1 : -1;
  if (result.points !== count) throw new CharacterisationError('SIMULATION_FAILED', `The simulator swept ${result.points} VGS points, the grid has ${count}`);
  const { data } = result;
  for (let g = 0; g < count; g++) {
    const expected = sign * vgsOfNode(grid.vgs, g);
    if (Math.abs(data[g] - expected) > 1e-9 * Math.max(1, Math.abs(expected))) {
      throw new CharacterisationError('SIMULATION_FAILED', `The simulator's sweep point ${g} is VGS = ${data[g]} V, not ${expected} V`);
    }
  }
  const perInstance = family === 'bsim4' ? 10 : 9;
  sweep.instances.forEach((instance, k) => {
    const offset = lineOffset(grid, chunk.corner, chunk.temperature, instance.length, instance.vsb, instance.vds);
    const vector = (j: number) => (1 + k * perInstance + j) * count;
    const [id, gm, gds, gmb, vt, vdsat, cgg, cgs, cgd, cgb] = Array.from({ length: perInstance }, (_, j) => vector(j));
    for (let g = 0; g < count; g++) {
      const at = offset + g;
      columns.id[at] = -sign * data[id + g];
      columns.gm[at] = data[gm + g];
      columns.gds[at] = data[gds + g];
      columns.gmb[at] = data[gmb + g];
      columns.vt[at] = data[vt + g];
      columns.vdsat[at] = data[vdsat + g];
      columns.cgg[at] = data[cgg + g];
      columns.cgs[at] = -data[cgs + g];
      columns.cgd[at] = -data[cgd + g];
      columns.cgb[at] = family === 'bsim4' ? -data[cgb + g] : data[cgg + g] + data[cgs + g] + data[cgd + g];
    }
  });
}
