import type { TableGrid } from '@channelwright/shared/device';
import { emitModel, type ModelStatement, spiceNumber } from '@channelwright/shared/model-card';

/**
 * One simulator run of a characterisation: one corner and temperature, a group of lengths, and for each
 * length one instance per (VSB, VDS) pair, all sharing one gate source that the `.dc` sweep steps through
 * the VGS axis. One run thus yields whole VGS lines, which is how the table stores them.
 */
export interface SweepChunk {
  corner: number;
  temperature: number;
  lengths: number[];
}

/** One transistor of a run and where its line goes in the table (indices into the grid's axes). */
export interface SweepInstance {
  length: number;
  vsb: number;
  vds: number;
}

export interface SweepNetlist {
  netlist: string;
  /** Written into the title line, so that results can be told to belong to this run. */
  nonce: string;
  instances: SweepInstance[];
  /** The vectors to read back: the sweep itself, then per instance the ones of instanceVectors. */
  vectors: string[];
  /** What the worker multiplies each vector by to make it polarity-normalised (see instanceScales). */
  scales: number[];
}

/** The simulator options of every run: tolerances tightened so that sub-nA currents converge (shared/reference: default abstol 1e-12 A stops after one Newton step there). */
export const SWEEP_OPTIONS = '.options abstol=1e-20 reltol=1e-6 vntol=1e-12 gmin=1e-20';

/** The model families a characterisation reads: their operating-point outputs differ. */
export type ModelFamily = 'bsim3' | 'bsim4';

export function modelFamily(model: ModelStatement): ModelFamily | null {
  if (model.level === 14 || model.level === 54) return 'bsim4';
  if (model.level === 8 || model.level === 49) return 'bsim3';
  return null;
}

/** The vectors read per instance, in this order: BSIM3 has no cgb output (it follows from Cgg = −(cgs + cgd + cgb)). */
export function instanceVectors(family: ModelFamily, k: number): string[] {
  const outputs = ['gm', 'gds', 'gmbs', 'vth', 'vdsat', 'cgg', 'cgs', 'cgd', ...(family === 'bsim4' ? ['cgb'] : [])];
  return [`i(vd${k})`, ...outputs.map((name) => `@m${k}[${name}]`)];
}

/**
 * Factors that make an instance's vectors polarity-normalised: ID = −type·i(vd) (the drain source's current
 * flows into the drain of a conducting NMOS, out of that of a PMOS); gm, gds, gmbs, vth, vdsat and cgg as
 * ngspice reports them (n-normalised for BSIM3/BSIM4, so positive for a PMOS); Cgx = −(reported cgx) for
 * x = s, d, b, because BSIM reports cgx = ∂Qg/∂Vx, which is negative, so that Cgs + Cgd + Cgb = Cgg.
 */
export function instanceScales(family: ModelFamily, sign: number): number[] {
  return [-sign, 1, 1, 1, 1, 1, 1, -1, -1, ...(family === 'bsim4' ? [-1] : [])];
}

/** The sweep vector as both ngspice builds name it. */
export const SWEEP_VECTOR = 'v(v-sweep)';

/**
 * The netlist of one chunk, written entirely by us: the model re-emitted from its parsed statement, the
 * sources and instances, the `.dc` sweep of VGS and the `.save` list. Voltages are polarity-normalised
 * in the grid and turned into node voltages here (PMOS: negative gate and drain, positive body).
 */
export function buildSweepNetlist(model: ModelStatement, family: ModelFamily, grid: TableGrid, chunk: SweepChunk, nonce: string): SweepNetlist {
  const sign = grid.polarity === 'nmos' ? 1 : -1;
  const { start, step, count } = grid.vgs;
  const stop = start + (count - 1) * step;
  const lines = [`* channelwright sweep ${nonce}`, emitModel(model), SWEEP_OPTIONS, `.temp ${spiceNumber(grid.temperatures[chunk.temperature])}`, 'vg g 0 0'];
  grid.vsb.forEach((vsb, s) => lines.push(`vb${s} b${s} 0 ${spiceNumber(-sign * vsb)}`));
  const instances: SweepInstance[] = [];
  const vectors = [SWEEP_VECTOR];
  const scales = [sign];
  for (const length of chunk.lengths) {
    for (let s = 0; s < grid.vsb.length; s++) {
      for (let d = 0; d < grid.vds.length; d++) {
        const k = instances.length;
        instances.push({ length, vsb: s, vds: d });
        lines.push(`vd${k} d${k} 0 ${spiceNumber(sign * grid.vds[d])}`, `m${k} d${k} g 0 b${s} ${model.name} w=${spiceNumber(grid.referenceWidth)} l=${spiceNumber(grid.lengths[length])}`);
        vectors.push(...instanceVectors(family, k));
        scales.push(...instanceScales(family, sign));
      }
    }
  }
  lines.push(`.dc vg ${spiceNumber(sign * start)} ${spiceNumber(sign * stop)} ${spiceNumber(sign * step)}`);
  // ngspice reads long lines fine; one .save per instance keeps them readable.
  for (let k = 0; k < instances.length; k++) lines.push(`.save ${instanceVectors(family, k).join(' ')}`);
  lines.push('.end', '');
  return { netlist: lines.join('\n'), nonce, instances, vectors, scales };
}
