import { EngineError } from '../device/errors.js';
import { type LookupTable, lineOffset, vgsOfNode } from '../device/lookup-table.js';
import { formatQuantity } from '../units/format-quantity.js';
import type { MeasuredPoint } from './measured-curves.js';

/** Which lines of a characterised table an extraction reads: one corner, and optionally fewer values of each axis. */
export interface TableSelection {
  /** A corner of the table ("TT"). */
  corner: string;
  /** Subsets of the grid's values (every value when absent); a value not on the grid is refused. */
  temperatures?: readonly number[];
  lengths?: readonly number[];
  vds?: readonly number[];
  vsb?: readonly number[];
}

/** How a refusal names each axis, in the words and units of a datasheet. */
const AXES = {
  temperatures: { name: 'temperature', unit: '°C' },
  lengths: { name: 'length L', unit: 'm' },
  vds: { name: 'VDS', unit: 'V' },
  vsb: { name: 'VSB', unit: 'V' },
} as const;

function indicesOf(axis: readonly number[], wanted: readonly number[] | undefined, field: keyof typeof AXES): number[] {
  if (wanted === undefined) return axis.map((_, k) => k);
  const { name, unit } = AXES[field];
  const show = (value: number) => formatQuantity(value, unit, { digits: 6 });
  return wanted.map((value) => {
    const k = axis.findIndex((v) => Math.abs(v - value) <= 1e-9 * Math.max(1, Math.abs(v)));
    if (k < 0) throw new EngineError('VALIDATION_FAILED', `${show(value)} is not a ${name} of the table (it has ${axis.map(show).join(', ')})`, field);
    return k;
  });
}

/**
 * The points of a characterised table (issue 10's lookup tables) as an extraction reads measured curves: each line
 * of the table is a VGS sweep at the table's reference width, already polarity-normalised. So a profile's analytic
 * parameters can be fitted to the designer's own model card, the same way as to curves from a test chip.
 */
export function pointsOfTable(table: LookupTable, selection: TableSelection): MeasuredPoint[] {
  const { grid, columns } = table;
  const corner = grid.corners.indexOf(selection.corner);
  if (corner < 0) throw new EngineError('CORNER_NOT_IN_TABLE', `The table has no corner ${selection.corner} (it has ${grid.corners.join(', ')})`, 'corner');
  const temperatures = indicesOf(grid.temperatures, selection.temperatures, 'temperatures');
  const lengths = indicesOf(grid.lengths, selection.lengths, 'lengths');
  const drains = indicesOf(grid.vds, selection.vds, 'vds');
  const bodies = indicesOf(grid.vsb, selection.vsb, 'vsb');
  const points: MeasuredPoint[] = [];
  for (const t of temperatures)
    for (const k of lengths)
      for (const s of bodies)
        for (const d of drains) {
          const offset = lineOffset(grid, corner, t, k, s, d);
          for (let g = 0; g < grid.vgs.count; g++) {
            points.push({ vgs: vgsOfNode(grid.vgs, g), vds: grid.vds[d], vsb: grid.vsb[s], temperature: grid.temperatures[t], id: columns.id[offset + g], w: grid.referenceWidth, l: grid.lengths[k] });
          }
        }
  return points;
}
