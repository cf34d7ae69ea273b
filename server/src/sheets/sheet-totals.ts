import { deviceParamsOf, isEngineError, leakage, matchGroupMismatch, prepareDevice, type MismatchDevice } from '@channelwright/shared/device';
import { cornerNames, type DeviceResult, type DeviceTargets, type MatchGroupTotals, type Process, type SheetTotals } from '@channelwright/shared/schemas';

/** What the totals need of a device. */
export interface TotalsDevice {
  id: string;
  targets: DeviceTargets;
  result: DeviceResult | null;
}

/**
 * The sheet's totals from the stored results, on the sheet's process: supply current and power of the
 * supply branches, gate area, off-state leakage at the hottest temperature of the process range at its
 * slowest and fastest corner, devices with warnings or without a result, and the offset of each match group.
 */
export function sheetTotals(devices: readonly TotalsDevice[], process: Process): SheetTotals {
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
    matchGroups: matchGroups(devices, process),
  };
}

function sum(values: readonly number[]): number {
  return values.reduce((total, value) => total + value, 0);
}

/**
 * The slowest corner raises the threshold of both polarities most (then lowers kp most); the fastest
 * the opposite. TT counts as a corner with no shift.
 */
export function extremeCorner(process: Process, which: 'slowest' | 'fastest'): string {
  const sign = which === 'slowest' ? 1 : -1;
  const score = (name: string) => {
    const corner = process.corners.find((c) => c.name === name);
    const dvt = corner ? corner.nmos.dvt + corner.pmos.dvt : 0;
    const kp = corner ? corner.nmos.kpScale + corner.pmos.kpScale : 2;
    return { dvt: sign * dvt, kp: -sign * kp };
  };
  return cornerNames(process).reduce((best, name) => {
    const [a, b] = [score(name), score(best)];
    return a.dvt > b.dvt || (a.dvt === b.dvt && a.kp > b.kp) ? name : best;
  });
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

/** Pelgrom offset of the worst pair of each match group; a device of multiplier m counts as m·W. */
function matchGroups(devices: readonly TotalsDevice[], process: Process): MatchGroupTotals[] {
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
      return {
        name,
        deviceIds: members.map((d) => d.id),
        sigmaVos: worst?.sigmaVos ?? null,
        sigmaVt: worst?.sigmaVt ?? null,
        sigmaId: worst?.sigmaId ?? null,
        worstPair: worst ? ([matched[worst.a].id, matched[worst.b].id] as [string, string]) : null,
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
