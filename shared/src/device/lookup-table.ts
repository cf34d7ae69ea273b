import type { ErrorCode } from '../schemas/error-codes.js';
import type { WarningCode } from '../schemas/warning.js';
import { EngineError } from './errors.js';

/**
 * What a characterisation stores per grid point, all for the reference width and polarity-normalised
 * (PMOS: VSG, VSD, VBS and positive currents): ID (A), gm, gds, gmb (S), VT and VDSsat (V, from the
 * simulator's operating-point output) and the gate capacitances Cgg, Cgs, Cgd, Cgb (F) with
 * Cgx = −∂Qg/∂Vx, so that Cgs + Cgd + Cgb = Cgg (Cgb may be slightly negative in strong inversion).
 */
export const TABLE_FIELDS = ['id', 'gm', 'gds', 'gmb', 'vt', 'vdsat', 'cgg', 'cgs', 'cgd', 'cgb'] as const;
export type TableField = (typeof TABLE_FIELDS)[number];

/** Codes of the table model's errors and cautions: members of the one list (schemas/error-codes.ts, schemas/warning.ts). */
export const TABLE_ERROR_CODES = [
  'TABLE_INVALID',
  'CORNER_NOT_IN_TABLE',
  'TEMPERATURE_OUTSIDE_TABLE',
  'L_OUTSIDE_TABLE',
  'VDS_OUTSIDE_TABLE',
  'VSB_OUTSIDE_TABLE',
  'VGS_OUTSIDE_TABLE',
  'GM_ID_ABOVE_TABLE',
  'GM_ID_BELOW_TABLE',
  'ID_OUTSIDE_TABLE',
] as const satisfies readonly ErrorCode[];
export const TABLE_WARNING_CODES = ['TEMPERATURE_INTERPOLATED'] as const satisfies readonly WarningCode[];

/** A caution attached to a table result, with a plain sentence. */
export interface TableWarning {
  code: (typeof TABLE_WARNING_CODES)[number];
  message: string;
}

/** VGS values start, start + step, … (count values), V, polarity-normalised. */
export interface VgsAxis {
  start: number;
  step: number;
  count: number;
}

/** The grid of one device (one model of one polarity): every list ascending, SI units, temperatures in °C. */
export interface TableGrid {
  polarity: 'nmos' | 'pmos';
  /** The model's name in the card (lower case). */
  modelName: string;
  /** The width every point was simulated at, m; currents, conductances and capacitances scale with the effective width (widthScale). */
  referenceWidth: number;
  /**
   * The card's width reduction, m: BSIM's effective width is W − 2·wint (BSIM4.8 manual, Weff; the bias- and
   * geometry-dependent terms of dW left out), so a device of drawn width W has (W − widthOffset)/(referenceWidth −
   * widthOffset) times the table's current. Absent: 0 (scaling with W itself).
   */
  widthOffset?: number;
  /** The card's length reduction 2·lint, m (Leff = L − lengthOffset), for the effective length a result shows. Absent: 0. */
  lengthOffset?: number;
  lengths: number[];
  vgs: VgsAxis;
  vds: number[];
  vsb: number[];
  corners: string[];
  temperatures: number[];
}

/**
 * A characterised table: one column per field, each grid.point count long, ordered corner, temperature,
 * length, VSB, VDS, VGS (VGS fastest, so that one VGS sweep is one contiguous run: a "line").
 */
export interface LookupTable {
  grid: TableGrid;
  columns: Record<TableField, Float32Array | Float64Array>;
}

/**
 * How many times the reference device's current a device of drawn width w (all fingers) carries: each finger loses the
 * width offset, so (w − fingers·widthOffset)/(referenceWidth − widthOffset).
 */
export function widthScale(grid: Pick<TableGrid, 'referenceWidth' | 'widthOffset'>, w: number, fingers = 1): number {
  const offset = grid.widthOffset ?? 0;
  if (!(w > fingers * offset)) throw new EngineError('VALIDATION_FAILED', `W must be wider than the card's width reduction ${offset} m per finger`, 'w');
  return (w - fingers * offset) / (grid.referenceWidth - offset);
}

/** The drawn width (all fingers) that carries `ratio` times the reference device's current (the inverse of widthScale). */
export function widthForScale(grid: Pick<TableGrid, 'referenceWidth' | 'widthOffset'>, ratio: number, fingers = 1): number {
  const offset = grid.widthOffset ?? 0;
  return fingers * offset + ratio * (grid.referenceWidth - offset);
}

/** How many points a grid holds. */
export function tablePointCount(grid: TableGrid): number {
  return grid.corners.length * grid.temperatures.length * grid.lengths.length * grid.vsb.length * grid.vds.length * grid.vgs.count;
}

/** Index of the first VGS point of the line at these axis indices. */
export function lineOffset(grid: TableGrid, corner: number, temperature: number, length: number, vsb: number, vds: number): number {
  const line = (((corner * grid.temperatures.length + temperature) * grid.lengths.length + length) * grid.vsb.length + vsb) * grid.vds.length + vds;
  return line * grid.vgs.count;
}

/** The VGS of a node, V. */
export function vgsOfNode(axis: VgsAxis, index: number): number {
  return axis.start + index * axis.step;
}

function ascending(values: readonly number[], field: string, positive: boolean): void {
  if (values.length === 0) throw new EngineError('TABLE_INVALID', `The table's ${field} list is empty`, field);
  values.forEach((value, index) => {
    if (!Number.isFinite(value) || (positive && value <= 0)) throw new EngineError('TABLE_INVALID', `The table's ${field} list holds ${value}, not a ${positive ? 'positive ' : ''}number`, field);
    if (index > 0 && !(value > values[index - 1])) throw new EngineError('TABLE_INVALID', `The table's ${field} list is not strictly ascending`, field);
  });
}

/** Throws TABLE_INVALID unless the grid is usable: ascending finite axes, a VGS axis of at least 4 points, distinct corners. */
export function checkTableGrid(grid: TableGrid): void {
  if (grid.polarity !== 'nmos' && grid.polarity !== 'pmos') throw new EngineError('TABLE_INVALID', 'The table polarity must be nmos or pmos', 'polarity');
  if (!(grid.referenceWidth > 0) || !Number.isFinite(grid.referenceWidth)) throw new EngineError('TABLE_INVALID', 'The reference width must be a positive number', 'referenceWidth');
  if (grid.widthOffset !== undefined && !(grid.widthOffset >= 0 && grid.widthOffset < grid.referenceWidth / 2)) {
    throw new EngineError('TABLE_INVALID', 'The width offset must be at least 0 and well below the reference width', 'widthOffset');
  }
  ascending(grid.lengths, 'lengths', true);
  ascending(grid.vds, 'vds', false);
  ascending(grid.vsb, 'vsb', false);
  ascending(grid.temperatures, 'temperatures', false);
  const { start, step, count } = grid.vgs;
  if (!Number.isFinite(start) || !(step > 0) || !Number.isInteger(count) || count < 4) {
    throw new EngineError('TABLE_INVALID', 'The VGS axis needs a finite start, a positive step and at least 4 points', 'vgs');
  }
  if (grid.corners.length === 0 || new Set(grid.corners).size !== grid.corners.length) throw new EngineError('TABLE_INVALID', 'The table needs distinct corner names', 'corners');
}

/** Throws TABLE_INVALID unless the grid is usable and every column holds one value per point. */
export function checkLookupTable(table: LookupTable): void {
  checkTableGrid(table.grid);
  const points = tablePointCount(table.grid);
  for (const field of TABLE_FIELDS) {
    const column = table.columns[field];
    if (!column || column.length !== points) throw new EngineError('TABLE_INVALID', `The table's ${field} column holds ${column?.length ?? 0} values, not ${points}`, field);
  }
}
