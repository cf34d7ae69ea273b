import type { DesignChartCurve } from '../schemas/design-chart.js';
import type { Warning } from '../schemas/warning.js';
import { vgsOfNode } from './lookup-table.js';
import { gmIdPeakOf } from './table-figures.js';
import { type PreparedTable, tableLine } from './table-lookup.js';
import { vgsForOverdrive } from './table-sizing.js';

/** Where the charts are read: corner, temperature (°C), VDS and VSB (V, polarity-normalised). */
export interface DesignChartConditions {
  corner: string;
  temperature: number;
  vds: number;
  vsb: number;
}

export interface DesignChartData {
  curves: DesignChartCurve[];
  vt: { l: number[]; vt: number[] };
  warnings: Warning[];
}

/**
 * The gm/ID design charts of a table (Silveira, Flandre & Jespers, IEEE JSSC 31(9), 1996; Jespers & Murmann,
 * Systematic Design of Analog CMOS Circuits, 2017): for every characterised length, at the table's VGS nodes from
 * the gm/ID maximum up (where gm/ID falls with VGS, so each figure is a function of gm/ID), the current density
 * ID/W, the intrinsic gain gm/gds, fT = gm/(2π·Cgg) and VDSsat; and VT against L (the simulator's VT at VGS = VT).
 * Columnar arrays, SI units. Conditions outside the grid throw the table's EngineError naming the field.
 */
export function designChart(prepared: PreparedTable, conditions: DesignChartConditions): DesignChartData {
  const { grid } = prepared;
  const curves: DesignChartCurve[] = [];
  const vt = { l: [] as number[], vt: [] as number[] };
  let warnings: Warning[] = [];
  for (const l of grid.lengths) {
    const line = tableLine(prepared, { ...conditions, l });
    warnings = line.warnings;
    const curve: DesignChartCurve = { l, vgs: [], gmId: [], idW: [], gain: [], ft: [], vdsat: [] };
    for (let g = gmIdPeakOf(line).node; g < line.count; g++) {
      const lnId = line.node('id', g);
      const lnGm = line.node('gm', g);
      curve.vgs.push(vgsOfNode(grid.vgs, g));
      curve.gmId.push(Math.exp(lnGm - lnId));
      curve.idW.push(Math.exp(lnId) / grid.referenceWidth);
      curve.gain.push(Math.exp(lnGm - line.node('gds', g)));
      curve.ft.push(Math.exp(lnGm - line.node('cgg', g)) / (2 * Math.PI));
      curve.vdsat.push(line.node('vdsat', g));
    }
    curves.push(curve);
    vt.l.push(l);
    vt.vt.push(line.valueAt('vt', Math.min(vgsOfNode(grid.vgs, line.count - 1), Math.max(grid.vgs.start, vgsForOverdrive(line, 0)))));
  }
  return { curves, vt, warnings };
}
