import { EngineError } from './errors.js';
import { vgsOfNode, widthForScale, widthScale } from './lookup-table.js';
import { say, sayGmId } from './say.js';
import { type Constraint, constraintOf, MAX_WIDTH } from './solve.js';
import { type PreparedTable, type TableConditions, type TableLine, tableLine } from './table-lookup.js';
import { operatingPointOnLine, type TableOperatingPoint } from './table-operating-point.js';

/** What to size for from a table: ID (A) under the conditions, and exactly one of vov, gmId, w, vgs. */
export interface TableSizeTarget extends TableConditions {
  id: number;
  /** Fingers of the width (each loses the table's width offset); 1 when absent. */
  fingers?: number;
  vov?: number;
  gmId?: number;
  w?: number;
  vgs?: number;
}

export interface TableSizing extends TableOperatingPoint {
  constraint: Constraint;
}

/** Bisection stops when the VGS interval is this narrow, V. */
const VGS_TOLERANCE = 1e-10;

/**
 * Sizes from current density (the gm/ID method: Silveira, Flandre & Jespers, IEEE JSSC 31(9), 1996):
 * gm/ID → the VGS where the table's gm/ID reaches the target, W = ID / (ID/W there); vov → VGS = VT + VOV,
 * then the same; vgs → W = ID / (ID/W at VGS); w → the VGS where ID/W = ID / W. The width is not snapped.
 */
export function sizeFromTable(prepared: PreparedTable, target: TableSizeTarget): TableSizing {
  const constraint = constraintOf(target);
  const { id } = target;
  if (!(id > 0) || !Number.isFinite(id)) throw new EngineError('VALIDATION_FAILED', 'ID must be a positive current', 'id');
  const value = target[constraint] as number;
  if (!Number.isFinite(value) || (constraint !== 'vov' && constraint !== 'vgs' && !(value > 0))) {
    throw new EngineError('VALIDATION_FAILED', `${constraint} must be a positive number`, constraint);
  }
  const line = tableLine(prepared, target);
  const fingers = target.fingers ?? 1;
  let vgs: number;
  let w: number;
  if (constraint === 'w') {
    w = value;
    vgs = vgsForCurrentDensity(line, id / widthScale(line.grid, w, fingers), 'w');
  } else {
    vgs = constraint === 'gmId' ? vgsForGmId(line, value) : constraint === 'vov' ? vgsForOverdrive(line, value) : value;
    line.checkVgs(vgs, constraint);
    w = widthForScale(line.grid, id / line.valueAt('id', vgs), fingers);
  }
  if (!(w <= MAX_WIDTH)) {
    throw new EngineError('W_TOO_LARGE', `This target needs W = ${say(w, 'm')}, more than ${say(MAX_WIDTH, 'm')}; raise the overdrive or lower gm/ID`, constraint);
  }
  const sizing = operatingPointOnLine(line, w, vgs, fingers) as TableSizing;
  sizing.constraint = constraint;
  return sizing;
}

/** VGS with VGS − VT(VGS) = vov (VT hardly depends on VGS: three fixed-point steps settle it). */
export function vgsForOverdrive(line: TableLine, vov: number): number {
  const { start, count } = line.grid.vgs;
  const end = vgsOfNode(line.grid.vgs, count - 1);
  let vgs = (start + end) / 2;
  for (let step = 0; step < 3; step++) vgs = line.valueAt('vt', Math.min(end, Math.max(start, vgs))) + vov;
  return vgs;
}

/**
 * The VGS at which gm/ID equals the target, on the strong-inversion side of the gm/ID maximum. To the
 * right of the highest-gm/ID node of every stored line it is made of, gm/ID falls with VGS: a binary
 * search over nodes there (else a scan down to the lowest such node), then bisection between two nodes.
 */
export function vgsForGmId(line: TableLine, gmId: number): number {
  const top = line.count - 1;
  const vgsOf = (g: number) => vgsOfNode(line.grid.vgs, g);
  if (line.gmIdAtNode(top) > gmId) {
    throw new EngineError('GM_ID_BELOW_TABLE', `gm/ID = ${sayGmId(gmId)} needs VGS above the table's ${say(vgsOf(top), 'V')}, where gm/ID is ${sayGmId(line.gmIdAtNode(top))}`, 'gmId');
  }
  if (line.gmIdAtNode(top) === gmId) return vgsOf(top);
  const [lowest, highest] = line.gmIdPeakRange;
  let below: number;
  if (line.gmIdAtNode(highest) >= gmId) {
    // gm/ID(below) ≥ target > gm/ID(above), narrowed down to neighbours.
    below = highest;
    let above = top;
    while (above - below > 1) {
      const middle = (below + above) >> 1;
      if (line.gmIdAtNode(middle) >= gmId) below = middle;
      else above = middle;
    }
  } else {
    below = highest - 1;
    while (below >= lowest && line.gmIdAtNode(below) < gmId) below -= 1;
    if (below < lowest) {
      let best = 0;
      for (let g = 0; g <= top; g++) best = Math.max(best, line.gmIdAtNode(g));
      throw new EngineError('GM_ID_ABOVE_TABLE', `gm/ID = ${sayGmId(gmId)} is above the highest gm/ID in the table at this L, VDS and VSB (${sayGmId(best)})`, 'gmId');
    }
  }
  if (line.gmIdAtNode(below) === gmId) return vgsOf(below);
  const lnTarget = Math.log(gmId);
  return bisect(vgsOf(below), vgsOf(below + 1), (vgs) => line.domainAt('gm', vgs) - line.domainAt('id', vgs) - lnTarget);
}

/** The VGS at which the reference-width current equals idRef (ID rises with VGS): binary search over nodes, then bisection. */
export function vgsForCurrentDensity(line: TableLine, idRef: number, field: string): number {
  const lnTarget = Math.log(idRef);
  const top = line.count - 1;
  if (line.node('id', top) < lnTarget) {
    throw new EngineError('ID_OUTSIDE_TABLE', `This width cannot carry the current with VGS ≤ ${say(vgsOfNode(line.grid.vgs, top), 'V')}, the top of the table`, field);
  }
  if (line.node('id', 0) > lnTarget) {
    throw new EngineError('VGS_OUTSIDE_TABLE', `This width carries more than the current already at VGS = ${say(line.grid.vgs.start, 'V')}, the bottom of the table`, field);
  }
  let low = 0;
  let high = top;
  while (high - low > 1) {
    const middle = (low + high) >> 1;
    if (line.node('id', middle) < lnTarget) low = middle;
    else high = middle;
  }
  return bisect(vgsOfNode(line.grid.vgs, low), vgsOfNode(line.grid.vgs, high), (vgs) => lnTarget - line.domainAt('id', vgs));
}

/** The root of f between a (f ≥ 0) and b (f < 0). */
function bisect(a: number, b: number, f: (x: number) => number): number {
  let low = a;
  let high = b;
  while (Math.abs(high - low) > VGS_TOLERANCE) {
    const middle = (low + high) / 2;
    if (f(middle) >= 0) low = middle;
    else high = middle;
  }
  return (low + high) / 2;
}
