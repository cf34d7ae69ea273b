import type { Problem } from '../schemas/api-error.js';
import type { SignConvention } from '../schemas/extraction.js';
import type { Polarity } from '../schemas/process.js';
import type { ColumnRole, CurveColumn } from './curve-columns.js';

/** Names that count from the drain, gate or body to the source the other way round: VSG = −VGS, VSD, VBS, ISD. */
const REVERSED = new Set(['VSG', 'VSD', 'VBS', 'ISD']);
const SIGNED_ROLES: readonly ColumnRole[] = ['vgs', 'vds', 'vsb', 'id'];

export interface SignReading {
  convention: SignConvention;
  /** Per role, the factor that turns a file's value into the engine's polarity-normalised one. */
  factors: Partial<Record<ColumnRole, number>>;
  notes: string[];
  problems: Problem[];
}

interface Signs {
  positive: number;
  negative: number;
  firstPositive: number;
  firstNegative: number;
}

function signsOf(values: readonly number[], lines: readonly number[]): Signs {
  const signs = { positive: 0, negative: 0, firstPositive: 0, firstNegative: 0 };
  values.forEach((v, k) => {
    if (v > 0) {
      if (signs.positive++ === 0) signs.firstPositive = lines[k];
    } else if (v < 0) {
      if (signs.negative++ === 0) signs.firstNegative = lines[k];
    }
  });
  return signs;
}

/**
 * How the signs of a file are read (docs/extraction.md, "The upload"). The engine takes every device NMOS-like:
 * VGS, VDS, VSB and the drain current positive for a conducting NMOS, VSG, VSD, VBS and the source-to-drain current
 * for a PMOS. A PMOS file may give either those (the positive convention) or its terminal voltages as a simulator
 * writes them, VGS, VDS ≤ 0 and ID < 0 (the negative convention): the drain column decides, and every column named
 * from the source's side the other way (VGS, VDS, VSB, ID) is turned. A current measured into the other terminal (its
 * largest values negative after that) is turned too, and said.
 */
export function readSigns(polarity: Polarity, columns: readonly CurveColumn[], values: Partial<Record<ColumnRole, number[]>>, lines: readonly number[]): SignReading {
  const notes: string[] = [];
  const problems: Problem[] = [];
  const drain = columns.find((c) => c.role === 'vds') as CurveColumn;
  const drainSigns = signsOf(values.vds ?? [], lines);
  if (drainSigns.positive > 0 && drainSigns.negative > 0) {
    const [minority, first, other] =
      drainSigns.negative <= drainSigns.positive ? ['negative', drainSigns.firstNegative, 'positive'] : ['positive', drainSigns.firstPositive, 'negative'];
    problems.push({
      row: first,
      field: drain.header,
      message: `Row ${first}, column "${drain.header}": ${drain.name} is ${minority} here but ${other} elsewhere; one file holds one sign convention (measure each polarity in a file of its own)`,
    });
  }
  if (drainSigns.positive === 0 && drainSigns.negative === 0) {
    problems.push({ row: lines[0], field: drain.header, message: `Column "${drain.header}": every ${drain.name} is zero; the curves need a drain voltage` });
  }
  const drainReversed = REVERSED.has(drain.name);
  const drainNegative = drainSigns.negative > drainSigns.positive;
  let convention: SignConvention = 'positive';
  const factors: Partial<Record<ColumnRole, number>> = {};
  if (polarity === 'nmos') {
    for (const column of columns) if (SIGNED_ROLES.includes(column.role)) factors[column.role] = REVERSED.has(column.name) ? -1 : 1;
    if (drainNegative !== drainReversed && problems.length === 0) {
      problems.push({ row: drainSigns.firstNegative || drainSigns.firstPositive, field: drain.header, message: `Column "${drain.header}": the drain voltage is below the source on every row, as for a PMOS; choose the polarity PMOS, or give the NMOS's curves` });
    }
  } else {
    if (drainReversed && drainNegative && problems.length === 0) {
      problems.push({ row: drainSigns.firstNegative, field: drain.header, message: `Column "${drain.header}": VSD is negative, so the drain is above the source, as for an NMOS; choose the polarity NMOS, or give the PMOS's curves` });
    }
    convention = !drainReversed && drainNegative ? 'negative' : 'positive';
    for (const column of columns) {
      if (SIGNED_ROLES.includes(column.role)) factors[column.role] = convention === 'negative' && !REVERSED.has(column.name) ? -1 : 1;
    }
    notes.push(
      convention === 'negative'
        ? 'A PMOS in the negative sign convention (VGS, VDS ≤ 0, ID < 0, as a simulator writes its terminals): every voltage and the current were turned into the positive one the engine uses (VSG, VSD, VBS, source-to-drain current)'
        : 'A PMOS in the positive sign convention (VSG, VSD, VBS and the source-to-drain current positive for a conducting device), as the engine uses it',
    );
  }
  const current = columns.find((c) => c.role === 'id');
  if (current && values.id) {
    const scaled = values.id.map((v) => v * (factors.id ?? 1));
    const largest = scaled.reduce((best, v) => (Math.abs(v) > Math.abs(best) ? v : best), 0);
    if (largest < 0) {
      factors.id = -(factors.id ?? 1);
      notes.push(`The largest currents of "${current.header}" are negative: read as the current measured into the source side (its sign turned)`);
    }
  }
  const body = columns.find((c) => c.role === 'vsb');
  if (body && values.vsb) {
    const engine = signsOf(values.vsb.map((v) => v * (factors.vsb ?? 1)), lines);
    if (engine.negative > 0 && engine.positive === 0) {
      notes.push(`Every non-zero body voltage of "${body.header}" is a forward bias of the source–body junction as read (${polarity === 'nmos' ? 'VSB' : 'VBS'} < 0): check the column's sign`);
    }
  }
  return { convention, factors, notes, problems };
}
