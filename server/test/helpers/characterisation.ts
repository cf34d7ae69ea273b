import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { BF180G } from '@channelwright/shared/device';
import { type CharacterisationJob, characterisationJobSchema, type CreateProcessRequestInput, type ModelCardMapping, type Process, processProfileSchema, type ProcessProfile } from '@channelwright/shared/schemas';
import { bearer, type TestApp } from './test-app.js';

/** The invented 250 nm-class test card (sections tt ff ss; tn25, tp25) as uploaded. */
export const TEST_CARD_250 = readFileSync(join(__dirname, '../fixtures/model-cards/test-250nm.lib'), 'utf8');

export const TEST_CARD_250_MAPPING: ModelCardMapping = {
  corners: { TT: 'tt', FF: 'ff', SS: 'ss' },
  devices: [
    { model: 'tn25', polarity: 'nmos' },
    { model: 'tp25', polarity: 'pmos' },
  ],
};

/** An invented 2.5 V profile for the 250 nm test card: BF180-G's analytic parameters with its supply, lmin and corners TT, FF, SS. */
export function test250Definition(name: string): Process {
  const device = (params: Process['nmos']) => ({ ...params, lmin: 0.25e-6, wmin: 0.3e-6 });
  return {
    ...structuredClone(BF180G),
    name,
    description: 'Invented test data for the 250 nm-class test card',
    vdd: 2.5,
    nmos: device(BF180G.nmos),
    pmos: device(BF180G.pmos),
    corners: BF180G.corners.filter((c) => ['TT', 'FF', 'SS'].includes(c.name)),
    flavours: [],
    // BF180-G's SPICE names include its native flavour, which this process does not have.
    spiceModels: undefined,
  };
}

/** Creates a profile with a model card (the 250 nm test card unless given) as `token`'s user (a maintainer). */
export async function createCardProfile(t: TestApp, token: string, name: string, card: { text: string; mapping?: ModelCardMapping } = { text: TEST_CARD_250, mapping: TEST_CARD_250_MAPPING }): Promise<ProcessProfile> {
  const request: CreateProcessRequestInput = { definition: test250Definition(name), modelCard: card };
  const response = await t.http().post('/api/processes').set(bearer(token)).send(request);
  if (response.status !== 201) throw new Error(`creating ${name} answered ${response.status}: ${JSON.stringify(response.body)}`);
  return processProfileSchema.parse(response.body);
}

/** A small grid for one NMOS of the 250 nm card: 2 lengths × 101 VGS × 2 VDS at TT, 27 °C (404 points, one simulator run). */
export const SMALL_GRID = { lengths: [0.25e-6, 0.5e-6], vgsStep: 0.025, vds: [1.25, 2.5], vsb: [0], corners: ['TT'], temperatures: [27] };

/** A grid of some seconds on two cores (NMOS and PMOS: 4 lengths × 101 VGS × 4 VDS × 2 VSB × 3 corners × 2 temperatures, 12 simulator runs). */
export const MEDIUM_GRID = { lengths: [0.25e-6, 0.4e-6, 0.8e-6, 2e-6], vgsStep: 0.025, vds: [0.3, 0.9, 1.6, 2.5], vsb: [0, 0.8], corners: ['TT', 'FF', 'SS'], temperatures: [27, 125] };

/** Polls GET /api/characterisations/:id until `done` holds (or fails after `timeoutMs`); every answer seen, in order. */
export async function followJob(t: TestApp, token: string, id: string, done: (job: CharacterisationJob) => boolean, timeoutMs = 60_000): Promise<CharacterisationJob[]> {
  const seen: CharacterisationJob[] = [];
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const response = await t.http().get(`/api/characterisations/${id}`).set(bearer(token));
    if (response.status !== 200) throw new Error(`GET job answered ${response.status}: ${JSON.stringify(response.body)}`);
    const job = characterisationJobSchema.parse(response.body);
    seen.push(job);
    if (done(job)) return seen;
    if (Date.now() > deadline) throw new Error(`job ${id} did not get there in ${timeoutMs} ms; last: ${JSON.stringify({ status: job.status, progress: job.progress, error: job.error })}`);
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
}

export const finished = (job: CharacterisationJob) => job.status === 'done' || job.status === 'failed' || job.status === 'cancelled';
