import { BF180G, computeSize, isEngineError } from '../../src/device/index.js';
import { deviceTargetsSchema, type Device, type DeviceTargetsInput, type Sheet } from '../../src/schemas/index.js';

// Invented demo data: a small sheet on the invented BF180-G process, built the way the server builds one
// (targets checked by the shared schema, results from computeSize), for the format tests.

const INPUTS: DeviceTargetsInput[] = [
  { name: 'M1', function: 'input, with a comma', polarity: 'nmos', id: 20e-6, l: 0.5e-6, vds: 0.6, vov: 0.2, notes: 'line one\nline two', nodes: { drain: 'out', gate: 'inp', source: 'tail', bulk: 'vss' } },
  { name: 'M2', polarity: 'pmos', id: 20e-6, l: 0.5e-6, vds: 0.6, vsb: 0.2, gmId: 18, multiplier: 3, matchGroup: 'pair', supplyBranch: true, corner: 'SS', temperature: 125 },
  { name: '=SUM(A1)', function: 'a name a spreadsheet would run', polarity: 'nmos', id: 1e-7, l: 0.5e-6, vds: 0.6, w: 1.23456789e-6, model: 'square-law' },
  { name: 'M1 copy', polarity: 'nmos', flavour: 'native', id: 1e-6, l: 2e-6, vds: 0.5, vgs: 0 },
  { name: 'MW', polarity: 'nmos', id: 20e-6, l: 0.5e-6, vds: 0.6, gmId: 40 },
];

export function demoDevices(inputs: readonly DeviceTargetsInput[] = INPUTS): Device[] {
  return inputs.map((input, position) => {
    const targets = deviceTargetsSchema.parse(input);
    const constraint = (['vov', 'gmId', 'w', 'vgs'] as const).find((c) => targets[c] !== undefined)!;
    const sizeRequest = {
      processId: 'bf180g',
      processVersion: 1,
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
    } as Device['sizeRequest'];
    let result: Device['result'] = null;
    let error: Device['error'] = null;
    try {
      result = { ...computeSize(sizeRequest, BF180G), processVersionId: 'v1', processVersion: 1 };
    } catch (caught) {
      if (!isEngineError(caught)) throw caught;
      error = { code: caught.code, message: caught.message, ...(caught.field ? { field: caught.field } : {}) };
    }
    return {
      id: `d${position}`,
      sheetId: 's1',
      position,
      version: 1,
      targets,
      constraint,
      sizeRequest,
      result,
      error,
      computedWith: { engineVersion: 'test', processVersionId: 'v1', processVersion: 1, processName: 'BF180-G', computedAt: '2030-01-01T00:00:00.000Z' },
      stale: false,
      staleReasons: [],
      createdAt: '2030-01-01T00:00:00.000Z',
      updatedAt: '2030-01-01T00:00:00.000Z',
    };
  });
}

export function demoSheet(devices: Device[] = demoDevices()): Sheet {
  const leakage = { corner: 'SS', temperature: 125, current: 1e-9 };
  return {
    id: 's1',
    projectId: 'p1',
    name: 'Export, "quoted" & odd',
    description: '',
    process: { profileId: 'bf180g', name: BF180G.name, versionId: 'v1', version: 1, latestVersion: 1, deprecated: false, vdd: 1.8, tnom: 27, corners: ['TT', 'FF', 'SS', 'FS', 'SF'], flavours: [{ name: 'native', polarity: 'nmos' }] },
    temperature: null,
    corner: 'TT',
    model: 'all-region',
    leakageBudget: null,
    offsetBudgets: [],
    version: 1,
    deviceCount: devices.length,
    staleCount: 0,
    stale: false,
    createdAt: '2030-01-01T00:00:00.000Z',
    updatedAt: '2030-01-01T00:00:00.000Z',
    devices,
    totals: {
      vdd: 1.8,
      supplyCurrent: 60e-6,
      supplyPower: 108e-6,
      gateArea: 1e-11,
      leakage: { slowest: leakage, fastest: { ...leakage, corner: 'FF' }, conductingDeviceIds: [] },
      warningDeviceIds: [],
      warningCount: 0,
      failedDeviceIds: [],
      matchGroups: [],
    },
  };
}
