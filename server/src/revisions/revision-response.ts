import type { Revision, RevisionDevice, RevisionSummary, SignOff } from '@channelwright/shared/schemas';
import { toUserRef } from '../processes/process-response.js';
import type { ReviewRequestEntity } from '../reviews/review-request.entity.js';
import { deviceContentOf, sheetSnapshotOf } from './revision-content.js';
import type { RevisionDeviceEntity } from './revision-device.entity.js';
import { revisionStateOf } from './revision-state.js';
import type { RevisionEntity } from './revision.entity.js';

/** A revision with what its responses need: author loaded, its review requests with reviewers. */
export interface LoadedRevision {
  revision: RevisionEntity;
  deviceCount: number;
  requests: ReviewRequestEntity[];
}

export const revisionLabel = (number: number): string => `r${number}`;

export function toRevisionSummary({ revision, deviceCount, requests }: LoadedRevision): RevisionSummary {
  return {
    id: revision.id,
    sheetId: revision.sheetId,
    projectId: revision.projectId,
    number: revision.number,
    label: revisionLabel(revision.number),
    message: revision.message,
    author: toUserRef(revision.author),
    createdAt: revision.createdAt.toISOString(),
    process: { profileId: revision.processProfileId, name: revision.processName, versionId: revision.processVersionId, version: revision.processVersionNumber },
    engineVersion: revision.engineVersion,
    deviceCount,
    hash: revision.hash,
    state: revisionStateOf(requests),
    signOff: signOffOf(requests),
  };
}

export function toRevision(loaded: LoadedRevision, devices: readonly RevisionDeviceEntity[]): Revision {
  const { revision } = loaded;
  return {
    ...toRevisionSummary(loaded),
    sheet: { id: revision.sheetId, projectId: revision.projectId, ...sheetSnapshotOf(revision) },
    devices: devices.toSorted((a, b) => a.position - b.position).map(toRevisionDevice),
  };
}

function toRevisionDevice(device: RevisionDeviceEntity): RevisionDevice {
  const { deviceId, ...content } = deviceContentOf(device);
  return { id: deviceId, ...content };
}

function signOffOf(requests: readonly ReviewRequestEntity[]): SignOff | null {
  const approved = requests.find((request) => request.state === 'approved');
  if (!approved || !approved.decidedAt || !approved.signedHash) return null;
  return { reviewRequestId: approved.id, by: toUserRef(approved.reviewer), at: approved.decidedAt.toISOString(), hash: approved.signedHash };
}
