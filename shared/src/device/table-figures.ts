import { junctionCapacitance } from './capacitance.js';
import { isEngineError } from './errors.js';
import { type Leakage, leakage } from './leakage.js';
import { vgsOfNode, widthScale } from './lookup-table.js';
import { pairMismatch } from './mismatch.js';
import type { OperatingPoint } from './operating-point.js';
import type { PreparedDevice } from './resolve-device.js';
import { regionOf } from './small-signal.js';
import { type PreparedTable, type TableConditions, type TableLine, tableLine } from './table-lookup.js';
import type { TableOperatingPoint } from './table-operating-point.js';

/**
 * Figures of a table result that the tables do not hold, computed with the process parameters and the all-region
 * long-channel model: β = kp·W/L, the junction capacitances, Pelgrom mismatch (with the table's gm/ID) and the gate and
 * junction leakage. A result lists them in `analyticFigures` (docs/model.md, section 22.2).
 */
export const TABLE_ANALYTIC_FIGURES = ['beta', 'cdb', 'csb', 'sigmaVt', 'sigmaVtSingle', 'sigmaBeta', 'sigmaId', 'sigmaVos', 'leakage.gate', 'leakage.junction'] as const;
/** Added to the list when the table cannot give the off and on currents (its VGS axis does not reach 0 or VDD, or its VDS axis VDD). */
const OFF_STATE_FIGURES = ['ioff', 'ion', 'ionIoff', 'leakage.idAtZeroVgs', 'leakage.subthreshold'];

export interface TableFigures {
  point: OperatingPoint;
  analyticFigures: string[];
}

/** The highest gm/ID of a table line and its VGS node (searched around the peaks of the stored lines it is made of). */
export function gmIdPeakOf(line: TableLine): { gmId: number; node: number } {
  const [low, high] = line.gmIdPeakRange;
  let node = Math.max(0, low - 2);
  let gmId = line.gmIdAtNode(node);
  for (let g = node + 1; g <= Math.min(line.count - 1, high + 2); g++) {
    const value = line.gmIdAtNode(g);
    if (value > gmId) {
      gmId = value;
      node = g;
    }
  }
  return { gmId, node };
}

/**
 * The full operating point of a table result, in the shape every model answers:
 * - from the table: VT, VOV, ID, gm, gmb, gds, ro, gm/ID, gm/gds, VDSsat, Cgs, Cgd, fT = gm/(2π·Cgg), and (when its
 *   axes reach them) the off current at VGS = 0 and the on current at VGS = VDD, both at VDS = VDD and VSB = 0;
 * - derived from the table: n = 1/(UT·(gm/ID)max) at this L, VDS and VSB (weak inversion: gm/ID → 1/(n·UT)), λ = gds/ID,
 *   and the inversion coefficient from gm/ID = 1/(n·UT·(0.5 + √(0.25 + IC))) (Binkley, Tradeoffs and Optimization in
 *   Analog CMOS Design, Wiley, 2008, ch. 3; from memory): IC = r·(r − 1) with r = (gm/ID)max / (gm/ID) on the
 *   strong-inversion side of the peak, 0 below it;
 * - analytic (TABLE_ANALYTIC_FIGURES): the rest.
 */
export function tableFigures(op: TableOperatingPoint, line: TableLine, device: PreparedDevice, prepared: PreparedTable, options: { extras?: boolean } = {}): TableFigures {
  const { params, ut } = device;
  const { w, l, vgs, vds, gm, gds, id, gmId } = op;
  const peak = gmIdPeakOf(line);
  const ratio = peak.gmId / gmId;
  const ic = vgs > vgsOfNode(line.grid.vgs, peak.node) ? ratio * (ratio - 1) : 0;
  const junction = junctionCapacitance(w, params.ldiff, params.cj, params.cjsw);
  // A sweep that does not ask for them skips the lookups of the off state and of DIBL.
  const extras = options.extras !== false;
  const off = extras ? offState(prepared, op, device) : { leakage: leakage(device, w, l), fromTable: false };
  const point: OperatingPoint = {
    w,
    l,
    weff: w - op.fingers * (line.grid.widthOffset ?? 0),
    leff: l - (line.grid.lengthOffset ?? 0),
    eta: extras ? diblOf(prepared, op) : Number.NaN,
    wOverL: w / l,
    vgs,
    vds,
    vsb: op.vsb,
    vt: op.vt,
    vov: op.vov,
    n: 1 / (ut * peak.gmId),
    ut,
    beta: (device.kp * w) / l,
    lambda: gds / id,
    id,
    gm,
    gmb: op.gmb,
    gds,
    ro: gds > 0 ? 1 / gds : null,
    gmId,
    intrinsicGain: gds > 0 ? gm / gds : null,
    ic,
    region: regionOf(ic),
    vdsat: op.vdsat,
    saturated: vds >= op.vdsat,
    cgs: op.cgs,
    cgd: op.cgd,
    cgb: op.cgb,
    cgg: op.cgg,
    cdb: junction,
    csb: junction,
    ft: op.ft,
    ...pairMismatch({ avt: params.avt, abeta: params.abeta, w, l, gmId }),
    ioff: off.leakage.ioff,
    ion: off.leakage.ion,
    ionIoff: off.leakage.ionIoff,
    leakage: off.leakage,
  };
  return { point, analyticFigures: off.fromTable ? [...TABLE_ANALYTIC_FIGURES] : [...TABLE_ANALYTIC_FIGURES, ...OFF_STATE_FIGURES] };
}

/**
 * The DIBL coefficient η = −ΔVT/ΔVDS between the table's lowest and highest VDS at the device's L, VSB, corner and
 * temperature (the simulator's VT does not depend on VGS, so it is read at the device's VGS); 0 with one VDS value.
 */
function diblOf(prepared: PreparedTable, op: TableOperatingPoint): number {
  const { vds } = prepared.grid;
  if (vds.length < 2) return 0;
  const at = (value: number) => tableLine(prepared, { corner: op.corner, temperature: op.temperature, l: op.l, vds: value, vsb: op.vsb }).valueAt('vt', op.vgs);
  return (at(vds[0]) - at(vds[vds.length - 1])) / (vds[vds.length - 1] - vds[0]);
}

/** Off and on current from the table at VDS = VDD, VSB = 0 (gate and junction leakage analytic); the analytic ones when the table does not reach there. */
function offState(prepared: PreparedTable, op: TableOperatingPoint, device: PreparedDevice): { leakage: Leakage; fromTable: boolean } {
  const analytic = leakage(device, op.w, op.l);
  try {
    const line = tableLine(prepared, { corner: op.corner, temperature: op.temperature, l: op.l, vds: device.vdd, vsb: 0 });
    line.checkVgs(0, 'vgs');
    line.checkVgs(device.vdd, 'vgs');
    const scale = widthScale(prepared.grid, op.w, op.fingers);
    const idAtZeroVgs = line.valueAt('id', 0) * scale;
    const ion = line.valueAt('id', device.vdd) * scale;
    const conductsAtZeroVgs = line.valueAt('vt', 0) < 0;
    const ioff = conductsAtZeroVgs ? null : idAtZeroVgs + analytic.gate + analytic.junction;
    return {
      fromTable: true,
      leakage: { ...analytic, conductsAtZeroVgs, idAtZeroVgs, subthreshold: conductsAtZeroVgs ? null : idAtZeroVgs, ioff, ion, ionIoff: ioff !== null && ioff > 0 ? ion / ioff : null, gidl: 0, estimates: ['gate', 'junction'] },
    };
  } catch (error) {
    if (!isEngineError(error)) throw error;
    return { leakage: analytic, fromTable: false };
  }
}

/**
 * The zero-temperature-coefficient VGS from the table: where ID at the lowest and at the highest characterised
 * temperature cross (weak inversion: the hotter device conducts more; strong: less, as mobility falls), at these
 * L, VDS and VSB. null when the table has one temperature or the curves do not cross on the VGS axis.
 */
export function tableZtcVgs(prepared: PreparedTable, conditions: TableConditions): number | null {
  const { temperatures } = prepared.grid;
  if (temperatures.length < 2) return null;
  const cold = tableLine(prepared, { ...conditions, temperature: temperatures[0] });
  const hot = tableLine(prepared, { ...conditions, temperature: temperatures[temperatures.length - 1] });
  const difference = (g: number) => hot.node('id', g) - cold.node('id', g);
  for (let g = 0; g < cold.count - 1; g++) {
    if (difference(g) > 0 && difference(g + 1) <= 0) {
      let low = vgsOfNode(cold.grid.vgs, g);
      let high = vgsOfNode(cold.grid.vgs, g + 1);
      while (high - low > 1e-9) {
        const middle = (low + high) / 2;
        if (hot.domainAt('id', middle) - cold.domainAt('id', middle) > 0) low = middle;
        else high = middle;
      }
      return (low + high) / 2;
    }
  }
  return null;
}
