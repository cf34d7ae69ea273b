import type { CornersResponse } from '../schemas/corners.js';
import { cornerNames, type Process } from '../schemas/process.js';
import type { DeviceLeakage, LeakageTerms, SheetLeakage } from '../schemas/sheet-leakage.js';
import type { LeakageBudget } from '../schemas/sheets.js';
import { computeCorners } from './compute.js';
import { isEngineError } from './errors.js';
import { extremeCorner } from './extreme-corner.js';
import { cornersRequestOf, type CornersCall, type SizedDevice } from './sized-device.js';

/** A sized device of a sheet as the leakage budget reads it. */
export interface LeakageDevice extends SizedDevice {
  key: string;
  name: string;
  /** Any VGS the device can be put at (its stored one): the off-state figures do not depend on it. */
  vgs: number;
  multiplier: number;
}

/** At most this many temperatures in the chart (the corners API takes 20). */
const MAX_TEMPERATURES = 20;
const NICE_STEPS = [1, 2, 5, 10, 20, 25, 50, 100, 200];

/**
 * The temperatures of the leakage chart: the process range from its minimum to its maximum in a round step
 * (10 °C for −40 … 125 °C), with the nominal and the budget's temperature, each once, sorted.
 */
export function leakageTemperatures(process: Pick<Process, 'tnom' | 'tempRange'>, budgetTemperature?: number): number[] {
  const extra = [process.tnom, ...(budgetTemperature === undefined ? [] : [budgetTemperature])];
  const range = process.tempRange;
  if (!range) return [...new Set(extra)].toSorted((a, b) => a - b);
  for (const step of NICE_STEPS) {
    const grid = [range.min];
    for (let t = Math.ceil(range.min / step + 1e-9) * step; t < range.max - 1e-9; t += step) grid.push(t);
    grid.push(range.max);
    const all = [...new Set([...grid, ...extra])];
    if (all.length <= MAX_TEMPERATURES) return all.toSorted((a, b) => a - b);
  }
  return [...new Set([range.min, ...extra, range.max])].toSorted((a, b) => a - b);
}

type Point = CornersResponse['points'][number];

function termsOf(point: Point | undefined, multiplier: number): LeakageTerms | null {
  const leak = point?.op?.leakage;
  if (!leak || leak.ioff === null) return null;
  const gidl = (leak as { gidl?: number }).gidl;
  return {
    subthreshold: (leak.subthreshold ?? 0) * multiplier,
    gate: leak.gate * multiplier,
    junction: leak.junction * multiplier,
    gidl: gidl === undefined ? null : gidl * multiplier,
    total: leak.ioff * multiplier,
  };
}

/**
 * The sheet's leakage budget: each device's off-state leakage (VGS = 0, VDS = VDD, VSB = 0) as its model gives
 * it through computeCorners, at every temperature of `leakageTemperatures` at the fast corner and at every
 * corner at the budget's temperature (the hottest of the range without a budget), × multiplier; the sheet's
 * total per temperature and per corner; the worst corner against the budget. A depletion-mode device (it
 * conducts at VGS = 0) is listed apart with its channel current, not counted; one the process cannot compute
 * (a flavour it lacks …) is skipped with the engine's reason.
 */
export function sheetLeakage(
  process: Process,
  processId: string,
  devices: readonly LeakageDevice[],
  budget: LeakageBudget | null,
  engineVersion: string,
  corners: CornersCall = computeCorners,
): SheetLeakage {
  const budgetTemperature = budget?.temperature ?? process.tempRange?.max ?? process.tnom;
  const temperatures = leakageTemperatures(process, budgetTemperature);
  const fastCorner = extremeCorner(process, 'fastest');
  const cornerList = cornerNames(process);
  const rows: DeviceLeakage[] = [];
  const conducting: SheetLeakage['conducting'] = [];
  const skipped: SheetLeakage['skipped'] = [];
  for (const device of devices) {
    const request = cornersRequestOf(processId, device, { bias: 'voltage', vgs: device.vgs });
    let hot: Point[];
    let atBudgetPoints: Point[];
    try {
      hot = corners({ ...request, corners: [fastCorner], temperatures }, process).points;
      atBudgetPoints = corners({ ...request, corners: cornerList, temperatures: [budgetTemperature] }, process).points;
    } catch (error) {
      if (!isEngineError(error)) throw error;
      skipped.push({ deviceId: device.key, name: device.name, reason: error.message });
      continue;
    }
    const conductsAt = [...hot, ...atBudgetPoints].find((p) => p.op?.leakage.conductsAtZeroVgs);
    if (conductsAt?.op) {
      const hottest = hot.findLast((p) => p.op !== null) ?? conductsAt;
      conducting.push({ deviceId: device.key, name: device.name, current: (hottest.op?.leakage.idAtZeroVgs ?? 0) * device.multiplier });
      continue;
    }
    const estimates = new Set<string>();
    for (const point of hot) for (const term of (point.op?.leakage as { estimates?: string[] } | undefined)?.estimates ?? []) estimates.add(term);
    rows.push({
      deviceId: device.key,
      name: device.name,
      multiplier: device.multiplier,
      atFastCorner: temperatures.map((t) => termsOf(hot.find((p) => p.temperature === t), device.multiplier)),
      atBudget: cornerList.map((corner) => ({ corner, total: termsOf(atBudgetPoints.find((p) => p.corner === corner), device.multiplier)?.total ?? null })),
      estimates: [...estimates],
    });
  }
  const totals = temperatures.map((_, i) => rows.reduce((sum, row) => sum + (row.atFastCorner[i]?.total ?? 0), 0));
  const byCorner = cornerList.map((corner, i) => ({ corner, total: rows.reduce((sum, row) => sum + (row.atBudget[i].total ?? 0), 0) }));
  const worst = byCorner.reduce((a, b) => (b.total > a.total ? b : a));
  return {
    engineVersion,
    fastCorner,
    temperatures,
    devices: rows,
    totals,
    budget,
    budgetTemperature,
    byCorner,
    worst,
    withinBudget: budget ? worst.total <= budget.current : null,
    conducting,
    skipped,
  };
}
