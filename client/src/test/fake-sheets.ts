import { BF180G, computeSize, isEngineError } from '@channelwright/shared/device';
import type { Device, DeviceTargetsInput, Project, Sheet } from '@channelwright/shared/schemas';
import { deviceTargetsSchema, sizeRequestSchema } from '@channelwright/shared/schemas';
import { BF180G_SUMMARY } from './fake-compute-api';

// Invented demo data: a sheet of the invented Wrenmoss project on the invented BF180-G process.
export const wrenmoss: Project = {
  id: 'p-wrenmoss',
  name: 'Wrenmoss sensor front end',
  description: 'Invented demo data',
  version: 1,
  myRole: 'designer',
  createdBy: null,
  memberCount: 3,
  sheetCount: 1,
  createdAt: '2025-03-04T09:00:00.000Z',
  updatedAt: '2025-03-04T09:00:00.000Z',
};

const CONSTRAINTS = ['vov', 'gmId', 'w', 'vgs'] as const;

/** A stored device as the server answers it, its result computed by the real engine on BF180-G. */
export function storedDevice(id: string, position: number, input: DeviceTargetsInput, stale = false): Device {
  const targets = deviceTargetsSchema.parse(input);
  const constraint = CONSTRAINTS.find((c) => targets[c] !== undefined) ?? 'vov';
  const sizeRequest = sizeRequestSchema.parse({
    processId: BF180G_SUMMARY.id,
    processVersion: BF180G_SUMMARY.latestVersion,
    polarity: targets.polarity,
    ...(targets.flavour ? { flavour: targets.flavour } : {}),
    model: targets.model ?? 'all-region',
    corner: targets.corner ?? 'TT',
    ...(targets.temperature === undefined ? {} : { temperature: targets.temperature }),
    id: targets.id,
    l: targets.l,
    vds: targets.vds,
    vsb: targets.vsb,
    [constraint]: targets[constraint],
  });
  let result: Device['result'] = null;
  let error: Device['error'] = null;
  try {
    result = { ...computeSize(sizeRequest, BF180G), processVersionId: 'v-bf180g-2', processVersion: 2 };
  } catch (cause) {
    if (!isEngineError(cause)) throw cause;
    error = { code: cause.code, message: cause.message, ...(cause.field ? { field: cause.field } : {}) };
  }
  return {
    id,
    sheetId: 's-amp',
    position,
    version: 1,
    targets,
    constraint,
    sizeRequest,
    result,
    error,
    computedWith: { engineVersion: '1.0.0', processVersionId: 'v-bf180g-2', processVersion: 2, processName: 'BF180-G', computedAt: '2025-03-05T09:00:00.000Z' },
    stale,
    staleReasons: stale ? ['process'] : [],
    createdAt: '2025-03-05T09:00:00.000Z',
    updatedAt: '2025-03-05T09:00:00.000Z',
  };
}

/** The sheet around its devices, with totals as plain as a test needs them. */
export function storedSheet(devices: Device[]): Sheet {
  const staleCount = devices.filter((d) => d.stale).length;
  const warned = devices.filter((d) => (d.result?.warnings.length ?? 0) > 0);
  return {
    id: 's-amp',
    projectId: wrenmoss.id,
    name: 'Two-stage amplifier',
    description: 'Invented demo data',
    process: {
      profileId: BF180G_SUMMARY.id,
      name: BF180G.name,
      versionId: 'v-bf180g-2',
      version: 2,
      latestVersion: 2,
      deprecated: false,
      vdd: BF180G.vdd,
      tnom: BF180G.tnom,
      corners: BF180G_SUMMARY.corners,
      flavours: [{ name: 'native', polarity: 'nmos' }],
    },
    temperature: null,
    corner: 'TT',
    model: 'all-region',
    leakageBudget: null,
    offsetBudgets: [],
    version: 1,
    deviceCount: devices.length,
    staleCount,
    stale: staleCount > 0,
    createdAt: '2025-03-05T09:00:00.000Z',
    updatedAt: '2025-03-05T09:00:00.000Z',
    devices,
    totals: {
      vdd: BF180G.vdd,
      supplyCurrent: 0,
      supplyPower: 0,
      gateArea: devices.reduce((sum, d) => sum + (d.result ? d.result.w * d.result.l : 0), 0),
      leakage: {
        slowest: { corner: 'SS', temperature: 125, current: 1e-9 },
        fastest: { corner: 'FF', temperature: 125, current: 1e-8 },
        conductingDeviceIds: [],
      },
      warningDeviceIds: warned.map((d) => d.id),
      warningCount: warned.reduce((sum, d) => sum + (d.result?.warnings.length ?? 0), 0),
      failedDeviceIds: devices.filter((d) => !d.result).map((d) => d.id),
      matchGroups: [],
    },
  };
}
