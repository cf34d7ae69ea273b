import { BF180G, defaultTableGrid } from '@channelwright/shared/device';
import type { CharacterisationJob, CharacterisationTable, DesignChart, ModelCardSummary, ProcessProfile } from '@channelwright/shared/schemas';
import { BF180G_PROFILE } from './fake-compute-api';
import { admin } from './fixtures';

// Invented demo data, not any foundry's process or model: the BF180-G card's mapping and made-up job states.

export const BF180G_CARD: ModelCardSummary = {
  sha256: '433c153eeb3704e849bf51d5a1d37eff3cdaa8d8ad414c4f8282428e34ead572',
  bytes: 18_300,
  sections: ['tt', 'ff', 'ss', 'fs', 'sf'].map((name) => ({
    name,
    models: [
      { name: 'bfn18', polarity: 'nmos' as const, level: 54, version: '4.8.2', parameterCount: 80 },
      { name: 'bfp18', polarity: 'pmos' as const, level: 54, version: '4.8.2', parameterCount: 80 },
    ],
  })),
  mapping: {
    corners: { TT: 'tt', FF: 'ff', SS: 'ss', FS: 'fs', SF: 'sf' },
    devices: [
      { model: 'bfn18', polarity: 'nmos' },
      { model: 'bfp18', polarity: 'pmos' },
    ],
  },
};

/** BF180-G v2 with its card. */
export const BF180G_WITH_CARD: ProcessProfile = { ...BF180G_PROFILE, version: { ...BF180G_PROFILE.version, modelCard: BF180G_CARD, modelCardSha256: BF180G_CARD.sha256 } };

const nmosGrid = defaultTableGrid({ polarity: 'nmos', modelName: 'bfn18', vdd: BF180G.vdd, lmin: BF180G.nmos.lmin, corners: ['TT', 'FF', 'SS', 'FS', 'SF'], temperatures: [-40, 27, 125] });

export function jobOf(fields: Partial<CharacterisationJob> = {}): CharacterisationJob {
  return {
    id: 'job-1',
    processId: BF180G_PROFILE.id,
    processName: BF180G_PROFILE.name,
    version: 2,
    processVersionId: BF180G_PROFILE.version.id,
    status: 'running',
    progress: { done: 0, total: 2_172_000 },
    etaSeconds: null,
    error: null,
    cancelRequested: false,
    engine: 'native',
    gridHash: 'f'.repeat(64),
    devices: [],
    attempts: 1,
    requestedBy: { id: admin.id, displayName: admin.displayName },
    createdAt: '2026-11-30T08:00:00.000Z',
    startedAt: '2026-11-30T08:00:01.000Z',
    finishedAt: null,
    ...fields,
  };
}

export const NMOS_TABLE: CharacterisationTable = {
  id: 'table-n',
  sha256: 'a1b2c3d4e5f6'.padEnd(64, '0'),
  characterisationId: 'job-1',
  model: 'bfn18',
  processId: BF180G_PROFILE.id,
  version: 2,
  polarity: 'nmos',
  flavour: null,
  points: 1_086_000,
  size: 43_440_000,
  storedBytes: 23_000_000,
  grid: nmosGrid,
  current: true,
  createdAt: '2026-11-30T08:01:10.000Z',
};

/**
 * A design chart of two lengths with a few made-up points each (gm/ID falling along the curve, as the server sends it).
 * Round numbers, so a test can work out what lies between two points by hand.
 */
export const NMOS_CHART: DesignChart = {
  processId: BF180G_PROFILE.id,
  version: 2,
  polarity: 'nmos',
  flavour: null,
  table: { id: NMOS_TABLE.id, sha256: NMOS_TABLE.sha256, characterisationId: 'job-1', model: 'bfn18' },
  corner: 'TT',
  temperature: 27,
  vds: 0.9,
  vsb: 0,
  curves: [
    { l: 0.18e-6, vgs: [0.4, 0.5, 0.6], gmId: [20, 10, 5], idW: [1, 10, 40], gain: [30, 20, 10], ft: [2e9, 10e9, 20e9], vdsat: [0.1, 0.2, 0.3] },
    { l: 1e-6, vgs: [0.4, 0.5, 0.6], gmId: [22, 12, 6], idW: [0.2, 2, 8], gain: [120, 80, 40], ft: [0.2e9, 1e9, 2e9], vdsat: [0.09, 0.18, 0.27] },
  ],
  vt: { l: [0.18e-6, 1e-6], vt: [0.4, 0.45] },
  axes: { corners: ['TT', 'SS'], temperatures: [-40, 27, 125], vds: [0.5, 0.9, 1.8], vsb: [0, 0.45], lengths: [0.18e-6, 1e-6] },
  warnings: [],
};
