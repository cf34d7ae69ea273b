import { ENGINE_VERSION } from '@channelwright/shared/device';
import {
  cornerNames,
  type Device,
  type DeviceComputeError,
  type DeviceResult,
  type DeviceTargets,
  type Sheet,
  type SheetProcess,
  type SheetSummary,
  type StaleReason,
} from '@channelwright/shared/schemas';
import type { ResolvedProcess } from '../processes/processes.service.js';
import type { DeviceEntity } from './device.entity.js';
import { constraintOf, sizeRequestOf } from './device-targets.js';
import type { SheetEntity } from './sheet.entity.js';
import { leakageBudgetOf, offsetBudgetsOf } from './sheet-budgets.js';
import { sheetTotals } from './sheet-totals.js';

/** A sheet with everything its response needs, read in one go (see SheetReader). */
export interface LoadedSheet {
  sheet: SheetEntity;
  process: ResolvedProcess;
  /** The newest version of the sheet's profile. */
  latestVersion: number;
  devices: DeviceEntity[];
  /** Version number and profile name of every process version id the devices were computed on. */
  versionNumbers: ReadonlyMap<string, { number: number; name: string }>;
  /** The SHA-256 of the current table of each device kind ("nmos/", "nmos/native") of the sheet's version. */
  tableHashes: ReadonlyMap<string, string>;
}

/** Codes of a device waiting for a table (stored as its error): it is computed again when the table comes. */
export const WAITING_FOR_TABLE: ReadonlySet<string> = new Set(['TABLE_NOT_READY', 'TABLE_NOT_CHARACTERISED']);

/**
 * Why a stored result is stale: another engine version, another process version than the sheet's, or (model table)
 * another table than the version's current one for the device, or a table that came while the device waited for it.
 */
export function staleReasonsOf(
  device: Pick<DeviceEntity, 'engineVersion' | 'processVersionId' | 'result' | 'error' | 'targets'>,
  sheet: Pick<SheetEntity, 'processVersionId'>,
  tableHashes: ReadonlyMap<string, string> = new Map(),
): StaleReason[] {
  const reasons: StaleReason[] = [];
  if (device.engineVersion !== ENGINE_VERSION) reasons.push('engine');
  if (device.processVersionId !== sheet.processVersionId) reasons.push('process');
  else if (tableStale(device, tableHashes)) reasons.push('table');
  return reasons;
}

function tableStale(device: Pick<DeviceEntity, 'result' | 'error' | 'targets'>, tableHashes: ReadonlyMap<string, string>): boolean {
  const result = resultOf(device);
  const targets = targetsOf(device);
  const current = tableHashes.get(`${targets.polarity}/${targets.flavour ?? ''}`);
  if (result?.table) return result.table.sha256 !== current;
  const error = errorOf(device);
  return error !== null && WAITING_FOR_TABLE.has(error.code) && current !== undefined;
}

export function targetsOf(device: Pick<DeviceEntity, 'targets'>): DeviceTargets {
  return JSON.parse(device.targets) as DeviceTargets;
}

export function resultOf(device: Pick<DeviceEntity, 'result'>): DeviceResult | null {
  return device.result === null ? null : (JSON.parse(device.result) as DeviceResult);
}

export function errorOf(device: Pick<DeviceEntity, 'error'>): DeviceComputeError | null {
  return device.error === null ? null : (JSON.parse(device.error) as DeviceComputeError);
}

export function toDevice(device: DeviceEntity, loaded: Pick<LoadedSheet, 'sheet' | 'process' | 'versionNumbers' | 'tableHashes'>): Device {
  const targets = targetsOf(device);
  const staleReasons = staleReasonsOf(device, loaded.sheet, loaded.tableHashes);
  const result = resultOf(device);
  return {
    id: device.id,
    sheetId: device.sheetId,
    position: device.position,
    version: device.version,
    targets,
    constraint: constraintOf(targets),
    sizeRequest: sizeRequestOf(targets, loaded.sheet, loaded.process),
    result,
    error: errorOf(device),
    computedWith: {
      engineVersion: device.engineVersion,
      processVersionId: device.processVersionId,
      processVersion: loaded.versionNumbers.get(device.processVersionId)?.number ?? 0,
      processName: loaded.versionNumbers.get(device.processVersionId)?.name ?? loaded.process.name,
      computedAt: device.computedAt.toISOString(),
      tableSha256: result?.table?.sha256 ?? null,
    },
    stale: staleReasons.length > 0,
    staleReasons,
    createdAt: device.createdAt.toISOString(),
    updatedAt: device.updatedAt.toISOString(),
  };
}

export function toSheetProcess(process: ResolvedProcess, latestVersion: number): SheetProcess {
  const { definition } = process;
  return {
    profileId: process.profileId,
    name: process.name,
    versionId: process.versionId,
    version: process.version,
    latestVersion,
    deprecated: process.deprecated,
    vdd: definition.vdd,
    tnom: definition.tnom,
    corners: cornerNames(definition),
    flavours: (definition.flavours ?? []).map((flavour) => ({ name: flavour.name, polarity: flavour.polarity })),
  };
}

export function toSheetSummary(loaded: LoadedSheet): SheetSummary {
  const { sheet } = loaded;
  const staleCount = loaded.devices.filter((device) => staleReasonsOf(device, sheet, loaded.tableHashes).length > 0).length;
  return {
    id: sheet.id,
    projectId: sheet.projectId,
    name: sheet.name,
    description: sheet.description,
    process: toSheetProcess(loaded.process, loaded.latestVersion),
    temperature: sheet.temperature,
    corner: sheet.corner,
    model: sheet.model,
    leakageBudget: leakageBudgetOf(sheet),
    offsetBudgets: offsetBudgetsOf(sheet),
    version: sheet.version,
    deviceCount: loaded.devices.length,
    staleCount,
    stale: staleCount > 0,
    createdAt: sheet.createdAt.toISOString(),
    updatedAt: sheet.updatedAt.toISOString(),
  };
}

export function toSheet(loaded: LoadedSheet): Sheet {
  const devices = loaded.devices.map((device) => toDevice(device, loaded));
  return {
    ...toSheetSummary(loaded),
    devices,
    totals: sheetTotals(devices, loaded.process.definition, offsetBudgetsOf(loaded.sheet)),
  };
}
