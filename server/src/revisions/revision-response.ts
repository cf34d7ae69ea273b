import type { Revision, RevisionDevice, RevisionSummary, SignOff } from '@channelwright/shared/schemas';
import { toUserRef } from '../users/user-ref.js';
import type { UserCard } from '../users/users.service.js';
import { deviceContentOf, sheetSnapshotOf } from './revision-content.js';
import type { RevisionDeviceEntity } from './revision-device.entity.js';
import type { ReviewFacts } from './revision-reviews.js';
import { revisionStateOf } from './revision-state.js';
import type { RevisionEntity } from './revision.entity.js';

/** A revision with what its responses need: its review requests, and the accounts of its author and reviewers. */
export interface LoadedRevision {
  revision: RevisionEntity;
  deviceCount: number;
  requests: ReviewFacts[];
  users: ReadonlyMap<string, UserCard>;
}

export const revisionLabel = (number: number): string => `r${number}`;

export function toRevisionSummary({ revision, deviceCount, requests, users }: LoadedRevision): RevisionSummary {
  return {
    id: revision.id,
    sheetId: revision.sheetId,
    projectId: revision.projectId,
    number: revision.number,
    label: revisionLabel(revision.number),
    message: revision.message,
    author: toUserRef(users.get(revision.authorId)),
    createdAt: revision.createdAt.toISOString(),
    process: { profileId: revision.processProfileId, name: revision.processName, versionId: revision.processVersionId, version: revision.processVersionNumber },
    engineVersion: revision.engineVersion,
    deviceCount,
    hash: revision.hash,
    state: revisionStateOf(requests),
    signOff: signOffOf(requests, users),
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

function signOffOf(requests: readonly ReviewFacts[], users: ReadonlyMap<string, UserCard>): SignOff | null {
  const approved = requests.find((request) => request.state === 'approved');
  if (!approved || !approved.decidedAt || !approved.signedHash) return null;
  return { reviewRequestId: approved.id, by: toUserRef(users.get(approved.reviewerId)), at: approved.decidedAt.toISOString(), hash: approved.signedHash };
}
