import { BF180G } from '@channelwright/shared/device';
import { type CharacterisationTable, PARAMETER_CONVENTION, type Extraction, type ExtractionCurves, type ExtractionResultResponse, type ProcessProfile, type ProcessProfileSummary } from '@channelwright/shared/schemas';
import { admin } from '../../../test/fixtures';

// Invented demo data: the invented Brackenfold BF180-G profile, and a fit of invented level-1-like curves to it.

const by = { id: admin.id, displayName: admin.displayName };

export const bf180Summary: ProcessProfileSummary = {
  id: 'p-bf180',
  name: 'BF180-G',
  description: BF180G.description ?? '',
  nodeClass: '180 nm',
  deprecated: false,
  demoData: true,
  latestVersion: 1,
  vdd: BF180G.vdd,
  tnom: BF180G.tnom,
  corners: ['TT'],
  createdAt: '2026-11-02T08:00:00.000Z',
  updatedAt: '2026-11-20T09:30:00.000Z',
  updatedBy: by,
};

export function savedProfile(version: number): ProcessProfile {
  return {
    ...bf180Summary,
    latestVersion: version,
    version: { id: `p-bf180-v${version}`, number: version, message: 'Fitted', author: by, createdAt: '2026-12-02T08:00:00.000Z', modelCardSha256: null, parameterConvention: PARAMETER_CONVENTION, definition: structuredClone(BF180G), modelCard: null },
  };
}

export const fittedResult: ExtractionResultResponse = {
  model: 'square-law',
  parameters: [
    { name: 'vt0', value: 0.6002, unit: 'V', initial: 0.59, standardError: 0.00017 },
    { name: 'kp', value: 120.01e-6, unit: 'A/V²', initial: 110e-6, standardError: 4.8e-8 },
  ],
  held: [{ name: 'vtTc', value: -1e-3, reason: 'needs curves at several temperatures' }],
  fitted: { ...structuredClone(BF180G.nmos), vt0: 0.6002, kp: 120.01e-6 },
  rms: [
    { region: 'strong', points: 2271, rms: 0.0101 },
    { region: 'all', points: 2304, rms: 0.0100 },
  ],
  densityRms: null,
  excluded: [
    { index: 0, row: 3, reason: 'below threshold, where the square law does not hold' },
    { index: 1, row: 4, reason: 'below threshold, where the square law does not hold' },
  ],
  iterations: 30,
  converged: true,
  seconds: 1.6,
};

export function extractionOf(overrides: Partial<Extraction> = {}): Extraction {
  return {
    id: 'x-1',
    status: 'done',
    progress: { iterations: 30, maxIterations: 300 },
    cancelRequested: false,
    process: { id: 'p-bf180', name: 'BF180-G', version: 1, latestVersion: 1 },
    polarity: 'nmos',
    options: { model: 'square-law', fixed: [], noiseFloor: null, maxIterations: 300, minGmId: null },
    source: {
      kind: 'upload',
      table: null,
      uploadId: 'u-1',
      fileName: 'level1.csv',
      sha256: 'ab'.repeat(32),
      bytes: 120_000,
      points: 3320,
      convention: 'positive',
      notes: ['The file has no W column: W from the form'],
      curves: [{ w: 10e-6, l: 2e-6, fingers: 1, vds: 1, vsb: 0, temperature: 27, points: 3, vgsMin: 0, vgsMax: 2, firstRow: 3, lastRow: 5 }],
    },
    result: fittedResult,
    error: null,
    savedAs: null,
    rerunOf: null,
    attempts: 1,
    createdBy: by,
    createdAt: '2026-12-02T07:00:00.000Z',
    startedAt: '2026-12-02T07:00:01.000Z',
    finishedAt: '2026-12-02T07:00:03.000Z',
    ...overrides,
  };
}

export const fittedCurves: ExtractionCurves = {
  curves: [
    {
      w: 10e-6,
      l: 2e-6,
      fingers: 1,
      vds: 1,
      vsb: 0,
      temperature: 27,
      points: [
        { vgs: 0, id: 1e-13, modelled: null, residual: null, row: 3, excluded: 'below threshold, where the square law does not hold' },
        { vgs: 1, id: 9.6e-5, modelled: 9.61e-5, residual: 0.001, row: 4, excluded: null },
        { vgs: 2, id: 1.18e-3, modelled: 1.17e-3, residual: -0.0085, row: 5, excluded: null },
      ],
    },
  ],
};

/** An invented NMOS table of BF180-G version 1 (corners TT and FF, three lengths). */
export const bf180NmosTable: CharacterisationTable = {
  id: 't-nmos',
  sha256: 'cd'.repeat(32),
  characterisationId: 'c-1',
  model: 'bfn18',
  processId: 'p-bf180',
  version: 1,
  polarity: 'nmos',
  flavour: null,
  points: 3 * 3 * 2 * 2 * 101,
  size: 1_000_000,
  storedBytes: 400_000,
  grid: { polarity: 'nmos', modelName: 'bfn18', referenceWidth: 10e-6, lengths: [0.18e-6, 0.5e-6, 1e-6], vgs: { start: 0, step: 0.018, count: 101 }, vds: [0.1, 0.9, 1.8], vsb: [0, 0.9], corners: ['TT', 'FF'], temperatures: [27, 85] },
  current: true,
  createdAt: '2026-12-01T08:00:00.000Z',
};

/** A fit of that table's TT lines, as the server answers it. */
export const tableExtraction = (): Extraction =>
  extractionOf({
    source: {
      ...extractionOf().source,
      fileName: 'BF180-G-v1-nmos-TT-table.csv',
      notes: [],
      table: { processId: 'p-bf180', processName: 'BF180-G', version: 1, polarity: 'nmos', flavour: null, tableId: 't-nmos', sha256: 'cd'.repeat(32), characterisationId: 'c-1', model: 'bfn18', corner: 'TT' },
    },
  });
