import type { ErrorCode } from '../schemas/error-codes.js';
import { EngineError } from './errors.js';
import { checkLookupTable, lineOffset, type LookupTable, TABLE_FIELDS, type TableField, type TableGrid, type TableWarning, vgsOfNode } from './lookup-table.js';
import { MonotoneCubic, monotoneCubicAt } from './monotone-cubic.js';
import { say } from './say.js';

/**
 * Interpolation in a characterised table (docs/model.md, "The table model"):
 * - ID, gm, gds, gmb and Cgg are interpolated as their logarithms (values at or below 1e-30 held there),
 *   VT, VDSsat, Cgs, Cgd and Cgb as they are;
 * - in VGS, in ln L and in VSB: monotone piecewise-cubic Hermite (monotone-cubic.ts) through up to four
 *   neighbouring grid values, so that ID never turns back between VGS nodes;
 * - in VDS: linear between the two neighbouring values;
 * - corners: only those characterised; temperatures: those characterised, linear between two with a warning.
 * Outside the grid the answer is an EngineError naming the field, never an extrapolation.
 */
const LOG_FIELDS: ReadonlySet<TableField> = new Set(['id', 'gm', 'gds', 'gmb', 'cgg']);
const LOG_FLOOR = 1e-30;
/** How close to a grid value counts as on it (only rounding): relative for L, absolute (V, °C) for the others. */
const ON_GRID = 1e-12;

/** A table ready for lookups: the logarithms taken once, and per stored line the VGS node of its highest gm/ID. */
export interface PreparedTable {
  grid: TableGrid;
  columns: Record<TableField, Float32Array | Float64Array>;
  lnLengths: Float64Array;
  gmIdPeaks: Int32Array;
}

/** Where on the grid: corner name, temperature (°C), L (m), VDS and VSB (V, polarity-normalised). */
export interface TableConditions {
  corner: string;
  temperature: number;
  l: number;
  vds: number;
  vsb: number;
}

export function prepareTable(table: LookupTable): PreparedTable {
  const steps = prepareTableInSteps(table);
  for (;;) {
    const step = steps.next();
    if (step.done) return step.value;
  }
}

/** Values worked per step of prepareTableInSteps. */
const PREPARE_STEP = 1 << 17;

/**
 * prepareTable in steps of about PREPARE_STEP values, so that a caller on an event loop can let other work run between
 * them (a full grid is some 10 million values: a few hundred milliseconds in one go). The result is prepareTable's.
 */
export function* prepareTableInSteps(table: LookupTable): Generator<void, PreparedTable, void> {
  checkLookupTable(table);
  const columns = {} as PreparedTable['columns'];
  for (const field of TABLE_FIELDS) {
    const stored = table.columns[field];
    if (!LOG_FIELDS.has(field)) {
      columns[field] = stored;
      continue;
    }
    const logs = stored instanceof Float64Array ? new Float64Array(stored.length) : new Float32Array(stored.length);
    for (let start = 0; start < stored.length; start += PREPARE_STEP) {
      const end = Math.min(stored.length, start + PREPARE_STEP);
      for (let i = start; i < end; i++) logs[i] = Math.log(Math.max(stored[i], LOG_FLOOR));
      yield;
    }
    columns[field] = logs;
  }
  const { count } = table.grid.vgs;
  const gmIdPeaks = new Int32Array(columns.id.length / count);
  for (let line = 0; line < gmIdPeaks.length; line++) {
    let best = 0;
    for (let g = 1; g < count; g++) {
      const at = line * count;
      if (columns.gm[at + g] - columns.id[at + g] > columns.gm[at + best] - columns.id[at + best]) best = g;
    }
    gmIdPeaks[line] = best;
    if ((line + 1) % Math.max(1, Math.floor(PREPARE_STEP / count)) === 0) yield;
  }
  return { grid: table.grid, columns, lnLengths: Float64Array.from(table.grid.lengths, Math.log), gmIdPeaks };
}

/** Index i and fraction t with axis[i] + t·(axis[i+1] − axis[i]) = value; t = 0 on a grid value; null outside. */
function bracket(axis: ArrayLike<number>, value: number, tolerance: number): { i: number; t: number } | null {
  const n = axis.length;
  if (!(value >= axis[0] - tolerance && value <= axis[n - 1] + tolerance)) return null;
  for (let i = 0; i < n; i++) if (Math.abs(value - axis[i]) <= tolerance) return { i, t: 0 };
  let i = 0;
  while (i < n - 2 && value > axis[i + 1]) i++;
  return { i, t: (value - axis[i]) / (axis[i + 1] - axis[i]) };
}

function outside(code: ErrorCode, field: string, value: number, axis: readonly number[], unit: string): EngineError {
  const name = field === 'l' ? 'L' : field === 'temperature' ? 'The temperature' : field.toUpperCase();
  return new EngineError(code, `${name} = ${say(value, unit)} is outside the table (${say(axis[0], unit)} … ${say(axis[axis.length - 1], unit)})`, field);
}

/** Linear weights over one axis: one entry on a grid value, two between. */
function linearWeights(found: { i: number; t: number }): { index: number; weight: number }[] {
  return found.t === 0 ? [{ index: found.i, weight: 1 }] : [{ index: found.i, weight: 1 - found.t }, { index: found.i + 1, weight: found.t }];
}

/** The grid values a monotone cubic needs around a bracket (up to two on each side) and its evaluator there. */
interface CubicStencil {
  first: number;
  size: number;
  cubic: MonotoneCubic;
}

function cubicStencil(axis: ArrayLike<number>, found: { i: number; t: number }): CubicStencil {
  const first = found.t === 0 ? found.i : Math.max(0, found.i - 1);
  const last = found.t === 0 ? found.i : Math.min(axis.length - 1, found.i + 2);
  const x = new Float64Array(last - first + 1);
  for (let k = first; k <= last; k++) x[k - first] = axis[k];
  return { first, size: x.length, cubic: new MonotoneCubic(x, x.length, found.i - first, found.t) };
}

/**
 * The table along VGS at fixed corner, temperature, L, VDS and VSB: the "effective line" every lookup and
 * sizing works on. A node's value is combined from the stored lines of the stencils (temperature × length ×
 * VSB × VDS, flattened) on demand; the ID and gm nodes, which the searches revisit, are remembered.
 */
export class TableLine {
  readonly grid: TableGrid;
  readonly conditions: TableConditions;
  readonly warnings: TableWarning[] = [];
  /** The lowest and highest VGS node of the highest gm/ID among the stored lines this line is made of. */
  readonly gmIdPeakRange: readonly [number, number];
  private readonly columns: PreparedTable['columns'];
  /** Line offsets, temperature-major then length, VSB, VDS. */
  private readonly offsets: Int32Array;
  private readonly temperatureWeights: Float64Array;
  private readonly vdsWeights: Float64Array;
  private readonly lengths: CubicStencil;
  private readonly vsb: CubicStencil;
  private idNodes: Float64Array | null = null;
  private gmNodes: Float64Array | null = null;
  private readonly lengthValues = new Float64Array(4);
  private readonly vsbValues = new Float64Array(4);
  /** Four VGS nodes relative to the first (only differences matter to the cubic). */
  private readonly vgsX: Float64Array;
  private readonly vgsY = new Float64Array(4);

  constructor(prepared: PreparedTable, conditions: TableConditions) {
    const { grid } = prepared;
    this.grid = grid;
    this.conditions = { corner: conditions.corner, temperature: conditions.temperature, l: conditions.l, vds: conditions.vds, vsb: conditions.vsb };
    this.columns = prepared.columns;
    const corner = grid.corners.findIndex((name) => name.toLowerCase() === conditions.corner.toLowerCase());
    if (corner < 0) throw new EngineError('CORNER_NOT_IN_TABLE', `Corner ${conditions.corner} is not in the table (characterised: ${grid.corners.join(', ')})`, 'corner');

    const temperature = bracket(grid.temperatures, conditions.temperature, ON_GRID);
    if (!temperature) throw outside('TEMPERATURE_OUTSIDE_TABLE', 'temperature', conditions.temperature, grid.temperatures, '°C');
    const temperatures = linearWeights(temperature);
    if (temperatures.length === 2) {
      const [a, b] = temperatures.map((term) => grid.temperatures[term.index]);
      this.warnings.push({
        code: 'TEMPERATURE_INTERPOLATED',
        message: `${say(conditions.temperature, '°C')} was not characterised: the table is interpolated linearly between ${say(a, '°C')} and ${say(b, '°C')}; in weak inversion ID at a given VGS can be tens of percent off (gm/ID about 2 %), so characterise this temperature for numbers you sign off`,
      });
    }
    const length = conditions.l > 0 ? bracket(prepared.lnLengths, Math.log(conditions.l), ON_GRID) : null;
    if (!length) throw outside('L_OUTSIDE_TABLE', 'l', conditions.l, grid.lengths, 'm');
    const vds = bracket(grid.vds, conditions.vds, ON_GRID);
    if (!vds) throw outside('VDS_OUTSIDE_TABLE', 'vds', conditions.vds, grid.vds, 'V');
    const vsb = bracket(grid.vsb, conditions.vsb, ON_GRID);
    if (!vsb) throw outside('VSB_OUTSIDE_TABLE', 'vsb', conditions.vsb, grid.vsb, 'V');

    this.lengths = cubicStencil(prepared.lnLengths, length);
    this.vsb = cubicStencil(grid.vsb, vsb);
    const vdsTerms = linearWeights(vds);
    this.temperatureWeights = Float64Array.from(temperatures, (t) => t.weight);
    this.vdsWeights = Float64Array.from(vdsTerms, (d) => d.weight);
    this.offsets = new Int32Array(temperatures.length * this.lengths.size * this.vsb.size * vdsTerms.length);
    let low = grid.vgs.count;
    let high = 0;
    let at = 0;
    for (const t of temperatures) {
      for (let k = 0; k < this.lengths.size; k++) {
        for (let s = 0; s < this.vsb.size; s++) {
          for (const d of vdsTerms) {
            const offset = lineOffset(grid, corner, t.index, this.lengths.first + k, this.vsb.first + s, d.index);
            const peak = prepared.gmIdPeaks[offset / grid.vgs.count];
            low = Math.min(low, peak);
            high = Math.max(high, peak);
            this.offsets[at++] = offset;
          }
        }
      }
    }
    this.gmIdPeakRange = [low, high];
    const { step } = grid.vgs;
    this.vgsX = Float64Array.of(0, step, 2 * step, 3 * step);
  }

  get count(): number {
    return this.grid.vgs.count;
  }

  /** The value of a field at VGS node g, in the interpolation domain (the logarithm for ID, gm, gds, gmb, Cgg). */
  node(field: TableField, g: number): number {
    if (field !== 'id' && field !== 'gm') return this.combine(this.columns[field], g);
    let nodes = field === 'id' ? this.idNodes : this.gmNodes;
    if (!nodes) {
      nodes = new Float64Array(this.count).fill(Number.NaN);
      if (field === 'id') this.idNodes = nodes;
      else this.gmNodes = nodes;
    }
    const known = nodes[g];
    if (known === known) return known;
    return (nodes[g] = this.combine(this.columns[field], g));
  }

  /** Node g of a column through the stencils: linear in VDS, monotone cubic in VSB then in ln L, linear in temperature. */
  private combine(column: Float32Array | Float64Array, g: number): number {
    const { offsets, vdsWeights, lengthValues, vsbValues, lengths, vsb } = this;
    const nK = lengths.size;
    const nS = vsb.size;
    const nD = vdsWeights.length;
    let at = 0;
    let total = 0;
    for (let t = 0; t < this.temperatureWeights.length; t++) {
      for (let k = 0; k < nK; k++) {
        for (let s = 0; s < nS; s++) {
          let value = 0;
          for (let d = 0; d < nD; d++) value += vdsWeights[d] * column[offsets[at++] + g];
          vsbValues[s] = value;
        }
        lengthValues[k] = vsb.cubic.at(vsbValues);
      }
      total += this.temperatureWeights[t] * lengths.cubic.at(lengthValues);
    }
    return total;
  }

  /** The field at any VGS on the axis, in the interpolation domain; VGS_OUTSIDE_TABLE beyond it. */
  domainAt(field: TableField, vgs: number): number {
    const { start, step, count } = this.grid.vgs;
    const position = (vgs - start) / step;
    if (!(position >= -ON_GRID / step && position <= count - 1 + ON_GRID / step)) this.checkVgs(vgs, 'vgs');
    const g = Math.min(count - 2, Math.max(0, Math.floor(position)));
    const t = position - g;
    if (Math.abs(t) <= ON_GRID / step) return this.node(field, g);
    if (Math.abs(t - 1) <= ON_GRID / step) return this.node(field, g + 1);
    const first = Math.max(0, g - 1);
    const last = Math.min(count - 1, g + 2);
    for (let k = first; k <= last; k++) this.vgsY[k - first] = this.node(field, k);
    return monotoneCubicAt(this.vgsX, this.vgsY, last - first + 1, g - first, t);
  }

  /** The field at any VGS on the axis, in its own units (for the reference width). */
  valueAt(field: TableField, vgs: number): number {
    const value = this.domainAt(field, vgs);
    return LOG_FIELDS.has(field) ? Math.exp(value) : value;
  }

  /** gm/ID at node g, 1/V. */
  gmIdAtNode(g: number): number {
    return Math.exp(this.node('gm', g) - this.node('id', g));
  }

  /** Throws VGS_OUTSIDE_TABLE unless vgs lies on the VGS axis; `field` names the input that led to it. */
  checkVgs(vgs: number, field: string): void {
    const { start, step, count } = this.grid.vgs;
    const end = vgsOfNode(this.grid.vgs, count - 1);
    if (!(vgs >= start - ON_GRID && vgs <= end + ON_GRID)) {
      throw new EngineError('VGS_OUTSIDE_TABLE', `This needs VGS = ${say(vgs, 'V')}, outside the table's ${say(start, 'V')} … ${say(end, 'V')} (step ${say(step, 'V')})`, field);
    }
  }
}

/** The table along VGS at these conditions (throws when they are outside the grid). */
export function tableLine(prepared: PreparedTable, conditions: TableConditions): TableLine {
  return new TableLine(prepared, conditions);
}
