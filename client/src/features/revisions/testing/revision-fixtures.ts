import { BF180G, computeSize } from '@channelwright/shared/device';
import {
  deviceTargetsSchema,
  sizeRequestSchema,
  type DeviceTargetsInput,
  type Project,
  type ProjectRole,
  type ReviewRequest,
  type Revision,
  type RevisionDevice,
  type SheetReviewState,
} from '@channelwright/shared/schemas';
import { designer, reviewer } from '../../../test/fixtures';

// Invented demo data: the Wrenmoss amplifier of the invented Brackenfold Semiconductor.

/** A frozen device whose result the real engine computed on the invented BF180-G process. */
export function frozenDevice(id: string, input: DeviceTargetsInput): RevisionDevice {
  const targets = deviceTargetsSchema.parse(input);
  const { name: _name, function: _function, matchGroup: _group, multiplier: _m, supplyBranch: _s, notes: _notes, ...size } = targets;
  const result = computeSize(sizeRequestSchema.parse({ ...size, processId: 'p-bf180g' }), BF180G);
  return { id, position: 0, name: targets.name, targets, result: { ...result, processVersionId: 'v-2', processVersion: 2 }, error: null, engineVersion: '1.0.0', processVersionId: 'v-2', computedAt: '2026-03-01T09:00:00.000Z' };
}

export const M1 = frozenDevice('d-m1', { name: 'M1', function: 'input pair (+)', polarity: 'pmos', id: 10e-6, l: 0.5e-6, vds: 0.6, gmId: 16 });
export const M6 = { ...frozenDevice('d-m6', { name: 'M6', function: 'second stage', polarity: 'nmos', id: 200e-6, l: 0.18e-6, vds: 0.9, vov: 0.3 }), position: 1 };

const HASH = 'a3f1c0de'.repeat(8);

export function revision(change: Partial<Revision> = {}): Revision {
  return {
    id: 'rev-1',
    sheetId: 's-amp',
    projectId: 'p-wren',
    number: 1,
    label: 'r1',
    message: 'First complete sizing',
    author: { id: designer.id, displayName: designer.displayName },
    createdAt: '2026-03-01T10:00:00.000Z',
    process: { profileId: 'p-bf180g', name: 'BF180-G', versionId: 'v-2', version: 2 },
    engineVersion: '1.0.0',
    deviceCount: 2,
    hash: HASH,
    state: 'in-review',
    signOff: null,
    sheet: { id: 's-amp', projectId: 'p-wren', name: 'Two-stage amplifier', description: '', temperature: null, corner: 'TT', model: 'all-region' },
    devices: [M1, M6],
    ...change,
  };
}

export function reviewRequest(change: Partial<ReviewRequest> = {}): ReviewRequest {
  return {
    id: 'req-1',
    projectId: 'p-wren',
    projectName: 'Wrenmoss sensor front end',
    sheetId: 's-amp',
    sheetName: 'Two-stage amplifier',
    revision: { id: 'rev-1', number: 1, label: 'r1', message: 'First complete sizing', hash: HASH, state: 'in-review' },
    requestedBy: { id: designer.id, displayName: designer.displayName },
    reviewer: { id: reviewer.id, displayName: reviewer.displayName, email: reviewer.email },
    note: 'Please check the input pair offset',
    state: 'open',
    createdAt: '2026-03-01T10:05:00.000Z',
    decidedAt: null,
    decisionComment: null,
    signedHash: null,
    ...change,
  };
}

export function project(myRole: ProjectRole | null): Project {
  return {
    id: 'p-wren',
    name: 'Wrenmoss sensor front end',
    description: 'Invented demo data',
    version: 1,
    myRole,
    createdBy: null,
    memberCount: 3,
    sheetCount: 3,
    createdAt: '2026-02-01T09:00:00.000Z',
    updatedAt: '2026-02-01T09:00:00.000Z',
  };
}

export const HASH_OF_R1 = HASH;

/** The review state of a sheet never frozen: a draft that differs from its (absent) latest revision. */
export function draftReviewState(change: Partial<SheetReviewState> = {}): SheetReviewState {
  return {
    sheetId: 's-amp',
    projectId: 'p-wren',
    state: 'draft',
    latestRevision: null,
    lastSignedOff: null,
    changedSinceLatest: true,
    revisions: [],
    openRequests: [],
    ...change,
  };
}
