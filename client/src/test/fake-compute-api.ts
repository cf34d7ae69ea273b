import { BF180G, computeSize, computeSweep, isEngineError } from '@channelwright/shared/device';
import { PARAMETER_CONVENTION, type ProcessProfile, type ProcessProfileSummary } from '@channelwright/shared/schemas';
import type { FakeResponse, RecordedRequest } from './fake-api';

/** The invented BF180-G demo process as the library would list it. */
export const BF180G_SUMMARY: ProcessProfileSummary = {
  id: 'p-bf180g',
  name: BF180G.name,
  description: BF180G.description ?? '',
  nodeClass: '180 nm',
  deprecated: false,
  demoData: true,
  latestVersion: 2,
  vdd: BF180G.vdd,
  tnom: BF180G.tnom,
  corners: ['TT', 'FF', 'SS', 'FS', 'SF'],
  createdAt: '2025-03-01T09:00:00.000Z',
  updatedAt: '2025-03-02T09:00:00.000Z',
  updatedBy: null,
};

export const BF180G_PROFILE: ProcessProfile = {
  ...BF180G_SUMMARY,
  version: { id: 'v-bf180g-2', number: 2, message: 'invented demo data', author: null, createdAt: '2025-03-02T09:00:00.000Z', definition: BF180G, modelCardSha256: null, parameterConvention: PARAMETER_CONVENTION, modelCard: null },
};

/** Runs an engine call the way the server does: a stored process for processId, an EngineError as a 400 naming its field. */
function engine(run: () => unknown): FakeResponse {
  try {
    return { body: run() };
  } catch (error) {
    if (!isEngineError(error)) throw error;
    return { status: 400, body: { statusCode: 400, code: error.code, message: error.message, ...(error.field ? { field: error.field } : {}) } };
  }
}

/** The library and the compute API, answered by the real engine with the invented BF180-G. */
export const workbenchHandlers = {
  'GET /api/processes': { body: [BF180G_SUMMARY] },
  [`GET /api/processes/${BF180G_SUMMARY.id}`]: { body: BF180G_PROFILE },
  // Not characterised: the analytic models only.
  [`GET /api/processes/${BF180G_SUMMARY.id}/tables`]: { body: [] },
  'POST /api/compute/size': ({ body }: RecordedRequest) => engine(() => computeSize(body as never, BF180G)),
  'POST /api/compute/sweep': ({ body }: RecordedRequest) => engine(() => computeSweep(body as never, BF180G)),
};
