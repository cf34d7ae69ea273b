import { EngineError } from './errors.js';
import { type TableWarning, widthScale } from './lookup-table.js';
import { type PreparedTable, type TableConditions, type TableLine, tableLine } from './table-lookup.js';

/** A device's operating point from a table, SI units, polarity-normalised voltages and positive currents. */
export interface TableOperatingPoint extends TableConditions {
  /** Drawn width, all fingers, m. */
  w: number;
  fingers: number;
  vgs: number;
  id: number;
  gm: number;
  gmb: number;
  gds: number;
  /** 1 / gds, Ω. */
  ro: number;
  /** Intrinsic gain gm / gds. */
  gain: number;
  gmId: number;
  /** Current density ID / W, A/m. */
  idW: number;
  /** The simulator's threshold at this L, VDS, VSB and temperature, V. */
  vt: number;
  vov: number;
  vdsat: number;
  cgg: number;
  cgs: number;
  cgd: number;
  cgb: number;
  /** Transit frequency gm / (2π·Cgg), Hz. */
  ft: number;
  warnings: TableWarning[];
}

/** The operating point of a device of width w (in `fingers` fingers) at vgs on a table line: currents, conductances and capacitances scale with the effective width (widthScale). */
export function operatingPointOnLine(line: TableLine, w: number, vgs: number, fingers = 1): TableOperatingPoint {
  if (!(w > 0) || !Number.isFinite(w)) throw new EngineError('VALIDATION_FAILED', 'W must be a positive width', 'w');
  line.checkVgs(vgs, 'vgs');
  const scale = widthScale(line.grid, w, fingers);
  const id = line.valueAt('id', vgs) * scale;
  const gm = line.valueAt('gm', vgs) * scale;
  const gds = line.valueAt('gds', vgs) * scale;
  const cgg = line.valueAt('cgg', vgs) * scale;
  const vt = line.valueAt('vt', vgs);
  const { corner, temperature, l, vds, vsb } = line.conditions;
  // Properties written out, not spread: an object spread here costs more than all the interpolation.
  return {
    corner,
    temperature,
    l,
    vds,
    vsb,
    w,
    fingers,
    vgs,
    id,
    gm,
    gmb: line.valueAt('gmb', vgs) * scale,
    gds,
    ro: 1 / gds,
    gain: gm / gds,
    gmId: gm / id,
    idW: id / w,
    vt,
    vov: vgs - vt,
    vdsat: line.valueAt('vdsat', vgs),
    cgg,
    cgs: line.valueAt('cgs', vgs) * scale,
    cgd: line.valueAt('cgd', vgs) * scale,
    cgb: line.valueAt('cgb', vgs) * scale,
    ft: gm / (2 * Math.PI * cgg),
    warnings: line.warnings.slice(),
  };
}

/** The operating point of a device of width w (m; in `fingers` fingers, default 1) at vgs (V) under these conditions, from the table. */
export function tableOperatingPoint(prepared: PreparedTable, device: TableConditions & { w: number; vgs: number; fingers?: number }): TableOperatingPoint {
  return operatingPointOnLine(tableLine(prepared, device), device.w, device.vgs, device.fingers);
}
