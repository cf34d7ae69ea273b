import { MATRIX_FIGURE_INFO, MATRIX_FIGURES, type DeviceLimit, type MatrixCell, type MatrixColumn, type MatrixFigure, type WorstCell } from '../schemas/sheet-corners.js';
import type { CornersResponse } from '../schemas/corners.js';
import { cornerNames, type Process } from '../schemas/process.js';
import { computeCorners } from './compute.js';
import { isEngineError } from './errors.js';
import { temperaturesOf } from './corners.js';
import { limitMargin, limitStatus } from './limit-status.js';
import { cornersRequestOf, type CornersCall, type SizedDevice } from './sized-device.js';

type CornerPoint = CornersResponse['points'][number];

/** A sized device as the matrix checks it: its drawn size, its bias, and the result it was sized to. */
export interface MatrixDevice extends SizedDevice {
  /** The stored result: ID held when current-biased, VGS held when voltage-biased, and the ID changes are counted from. */
  reference: { id: number; vgs: number };
  limits: readonly DeviceLimit[];
}

/**
 * The columns of a matrix: every corner asked for (TT and the process's by default) × the process range's
 * minimum, nominal and maximum plus the temperatures added (sorted, each once) × the supply at VDD, and at
 * VDD·(1 ± tolerance) when a tolerance is given. Corner-major, then temperature, then supply.
 */
export function matrixColumns(process: Process, options: { corners?: readonly string[]; temperatures?: readonly number[]; vddTolerance?: number }): MatrixColumn[] {
  const corners = options.corners ?? cornerNames(process);
  const temperatures = [...new Set([...temperaturesOf({}, process), ...(options.temperatures ?? [])])].toSorted((a, b) => a - b);
  const tolerance = options.vddTolerance ?? 0;
  const supplies = tolerance > 0 ? [process.vdd * (1 - tolerance), process.vdd, process.vdd * (1 + tolerance)] : [process.vdd];
  return corners.flatMap((corner) => temperatures.flatMap((temperature) => supplies.map((vdd) => ({ corner, temperature, vdd }))));
}

/**
 * One row of the corner matrix: the device (W and L fixed) at every column, each cell exactly what
 * computeCorners answers for that device, corner and temperature on the process at the column's supply (so
 * it follows whatever model the device uses; `corners` binds what that model needs beyond the process), read
 * into the matrix figures and checked against its limits;
 * and the worst cell of the row for each figure. `processId` names the process for the request (the
 * definition given is what is computed with).
 */
export function cornerMatrixRow(
  process: Process,
  processId: string,
  device: MatrixDevice,
  bias: 'current' | 'voltage',
  columns: readonly MatrixColumn[],
  corners: CornersCall = computeCorners,
): MatrixRowCells {
  const cells: MatrixCell[] = new Array(columns.length);
  for (const vdd of new Set(columns.map((c) => c.vdd))) {
    const indices = columns.flatMap((column, index) => (column.vdd === vdd ? [index] : []));
    const names = [...new Set(indices.map((i) => columns[i].corner))];
    const temperatures = [...new Set(indices.map((i) => columns[i].temperature))];
    const held = bias === 'current' ? { bias, id: device.reference.id } : { bias, vgs: device.reference.vgs };
    const answer = corners(
      { ...cornersRequestOf(processId, device, held), corners: names, temperatures },
      vdd === process.vdd ? process : { ...process, vdd },
    );
    const byPlace = new Map(answer.points.map((point) => [`${point.corner}\n${point.temperature}`, point]));
    for (const index of indices) cells[index] = cellOf(byPlace.get(`${columns[index].corner}\n${columns[index].temperature}`), device);
  }
  return { cells, worst: worstCells(cells, device.limits) };
}

function cellOf(point: CornerPoint | undefined, device: MatrixDevice, refusal?: { code: string; message: string }): MatrixCell {
  const op = point?.op ?? null;
  const values = Object.fromEntries(MATRIX_FIGURES.map((figure) => [figure, op ? figureOf(op, figure, device) : null])) as Record<MatrixFigure, number | null>;
  const status = Object.fromEntries(MATRIX_FIGURES.map((figure) => [figure, limitStatus(values[figure], device.limits.find((l) => l.figure === figure))])) as MatrixCell['status'];
  const error = op ? undefined : (refusal ?? point?.error ?? { code: 'INTERNAL_ERROR', message: 'No answer at this point' });
  return { values, status, warnings: (point?.warnings ?? []).map((w) => w.code), ...(error ? { error } : {}) };
}

function figureOf(op: NonNullable<CornerPoint['op']>, figure: MatrixFigure, device: MatrixDevice): number | null {
  switch (figure) {
    case 'headroom':
      return op.vds - op.vdsat;
    case 'idChange':
      return op.id / device.reference.id - 1;
    case 'intrinsicGain':
      return op.intrinsicGain;
    default:
      return op[figure];
  }
}

/**
 * The worst cell of a row for each figure: a cell without an answer first; then, with a limit on the figure,
 * the least margin to it; without one, the figure's worse direction (highest VGS, lowest gm, largest ID change …).
 */
export function worstCells(cells: readonly MatrixCell[], limits: readonly DeviceLimit[]): Record<MatrixFigure, WorstCell | null> {
  const worst = {} as Record<MatrixFigure, WorstCell | null>;
  for (const figure of MATRIX_FIGURES) {
    const limit = limits.find((l) => l.figure === figure);
    const badness = (cell: MatrixCell): number => {
      const value = cell.values[figure];
      if (cell.error || value === null) return Number.POSITIVE_INFINITY;
      if (limit) return -limitMargin(value, limit);
      const direction = MATRIX_FIGURE_INFO[figure].worse;
      return direction === 'max' ? value : direction === 'min' ? -value : Math.abs(value);
    };
    let chosen = -1;
    let chosenBadness = Number.NEGATIVE_INFINITY;
    cells.forEach((cell, index) => {
      const b = badness(cell);
      if (b > chosenBadness) {
        chosen = index;
        chosenBadness = b;
      }
    });
    worst[figure] = chosen < 0 ? null : { column: chosen, value: cells[chosen].values[figure], status: cells[chosen].error ? 'fail' : limitStatus(cells[chosen].values[figure], limit) };
  }
  return worst;
}

export interface MatrixRowCells {
  cells: MatrixCell[];
  worst: Record<MatrixFigure, WorstCell | null>;
}

/**
 * cornerMatrixRow for each device; a device the process cannot compute at all (a flavour it lacks, L below
 * its lmin after a move to another version) gets a row whose every cell carries the engine's reason.
 */
export function cornerMatrixRows(
  process: Process,
  processId: string,
  devices: readonly MatrixDevice[],
  bias: 'current' | 'voltage',
  columns: readonly MatrixColumn[],
  corners: CornersCall = computeCorners,
): MatrixRowCells[] {
  return devices.map((device) => {
    try {
      return cornerMatrixRow(process, processId, device, bias, columns, corners);
    } catch (error) {
      if (!isEngineError(error)) throw error;
      const cells: MatrixCell[] = columns.map(() => cellOf(undefined, device, { code: error.code, message: error.message }));
      return { cells, worst: worstCells(cells, device.limits) };
    }
  });
}
