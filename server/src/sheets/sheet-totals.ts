import { deviceParamsOf, extremeCorner, isEngineError, leakage, matchGroupMismatch, offsetArea, prepareDevice, type MismatchDevice } from '@channelwright/shared/device';
import type { DeviceResult, DeviceTargets, MatchGroupTotals, OffsetBudget, Process, SheetTotals } from '@channelwright/shared/schemas';

/** What the totals need of a device. */
export interface TotalsDevice {
  id: string;
  targets: DeviceTargets;
  result: DeviceResult | null;
}

/**
 * The sheet's totals from the stored results, on the sheet's process: supply current and power of the
 * supply branches, gate area, off-state leakage at the hottest temperature of the process range at its
 * slowest and fastest corner, devices with warnings or without a result, and the offset of each match group
 * against its budget.
 */
export function sheetTotals(devices: readonly TotalsDevice[], process: Process, offsetBudgets: readonly OffsetBudget[] = []): SheetTotals {
  const sized = devices.filter((device): device is TotalsDevice & { result: DeviceResult } => device.result !== null);
  const supplyCurrent = sum(sized.filter((d) => d.targets.supplyBranch).map((d) => d.result.id * d.targets.multiplier));
  const hottest = process.tempRange?.max ?? process.tnom;
  const [slowest, fastest] = [extremeCorner(process, 'slowest'), extremeCorner(process, 'fastest')];
  const conducting = new Set<string>();
  const leakageAt = (corner: string) => {
    let current = 0;
    for (const device of sized) {
      const off = offCurrent(process, device, corner, hottest);
      if (off === null) conducting.add(device.id);
      else if (off !== undefined) current += off * device.targets.multiplier;
    }
    return { corner, temperature: hottest, current };
  };
  const warningDeviceIds = sized.filter((d) => d.result.warnings.length > 0).map((d) => d.id);
  return {
    vdd: process.vdd,
    supplyCurrent,
    supplyPower: supplyCurrent * process.vdd,
    gateArea: sum(sized.map((d) => d.result.w * d.result.l * d.targets.multiplier)),
    leakage: { slowest: leakageAt(slowest), fastest: leakageAt(fastest), conductingDeviceIds: [...conducting] },
    warningDeviceIds,
    warningCount: sum(sized.map((d) => d.result.warnings.length)),
    failedDeviceIds: devices.filter((d) => d.result === null).map((d) => d.id),
    matchGroups: matchGroups(devices, process, offsetBudgets),
  };
}

function sum(values: readonly number[]): number {
  return values.reduce((total, value) => total + value, 0);
}

/**
 * One device's off current at a corner and temperature (the engine's leakage): null for a depletion-mode
 * device, undefined for one the process cannot place (a flavour it lacks: the device's stale result shows it).
 */
function offCurrent(process: Process, device: TotalsDevice & { result: DeviceResult }, corner: string, temperature: number): number | null | undefined {
  try {
    const prepared = prepareDevice(process, device.targets.polarity, { corner, temperature, flavour: device.targets.flavour });
    return leakage(prepared, device.result.w, device.result.l).ioff;
  } catch (error) {
    if (isEngineError(error)) return undefined;
    throw error;
  }
}

/**
 * Pelgrom offset of the worst pair of each match group (a device of multiplier m counts as m·W), and with a
 * budget the W·L per device of an equal pair that meets it at the pair's gm/ID (Kinget 2005).
 */
function matchGroups(devices: readonly TotalsDevice[], process: Process, budgets: readonly OffsetBudget[]): MatchGroupTotals[] {
  const groups = new Map<string, TotalsDevice[]>();
  for (const device of devices) {
    const name = device.targets.matchGroup;
    if (name !== undefined) groups.set(name, [...(groups.get(name) ?? []), device]);
  }
  return [...groups.entries()]
    .toSorted(([a], [b]) => a.localeCompare(b))
    .map(([name, members]) => {
      const matched = members.flatMap((device) => {
        const mismatch = mismatchDevice(process, device);
        return mismatch ? [{ id: device.id, mismatch }] : [];
      });
      const worst = matchGroupMismatch(matched.map((m) => m.mismatch));
      const budget = budgets.find((b) => b.group === name)?.sigmaVos ?? null;
      const pair = worst ? [matched[worst.a].mismatch, matched[worst.b].mismatch] : null;
      const gmId = pair ? (pair[0].gmId + pair[1].gmId) / 2 : null;
      return {
        name,
        deviceIds: members.map((d) => d.id),
        sigmaVos: worst?.sigmaVos ?? null,
        sigmaVt: worst?.sigmaVt ?? null,
        sigmaId: worst?.sigmaId ?? null,
        worstPair: worst ? ([matched[worst.a].id, matched[worst.b].id] as [string, string]) : null,
        sigmaBeta: worst?.sigmaBeta ?? null,
        gmId,
        budget,
        meetsBudget: budget === null || worst === null ? null : worst.sigmaVos <= budget,
        requiredArea: budget === null || pair === null || gmId === null ? null : offsetArea(pair[0].avt, pair[0].abeta, gmId, budget),
      };
    });
}

function mismatchDevice(process: Process, device: TotalsDevice): MismatchDevice | null {
  if (device.result === null) return null;
  try {
    const { avt, abeta } = deviceParamsOf(process, device.targets.polarity, device.targets.flavour);
    return { avt, abeta, w: device.result.w * device.targets.multiplier, l: device.result.l, gmId: device.result.gmId };
  } catch (error) {
    if (isEngineError(error)) return null;
    throw error;
  }
}
