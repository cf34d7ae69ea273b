import { createHash } from 'node:crypto';
import type { DeviceComputeError, DeviceResult, DeviceTargets, RevisionSheet } from '@channelwright/shared/schemas';
import { canonicalJson } from './canonical-json.js';
import type { RevisionDeviceEntity } from './revision-device.entity.js';
import type { RevisionEntity } from './revision.entity.js';

/** Bumped only if what the hash covers ever changes; old revisions keep verifying under their own. */
export const REVISION_CONTENT_FORMAT = { format: 'channelwright.revision', formatVersion: 1 } as const;

/** A frozen device, parsed from its stored JSON text. */
export interface RevisionDeviceContent {
  deviceId: string;
  position: number;
  name: string;
  targets: DeviceTargets;
  result: DeviceResult | null;
  error: DeviceComputeError | null;
  engineVersion: string;
  processVersionId: string;
  computedAt: string;
}

/** Everything a revision's hash covers, read from its stored rows. */
export function revisionContent(revision: RevisionEntity, devices: readonly RevisionDeviceEntity[]) {
  return {
    ...REVISION_CONTENT_FORMAT,
    id: revision.id,
    sheetId: revision.sheetId,
    projectId: revision.projectId,
    number: revision.number,
    message: revision.message,
    authorId: revision.authorId,
    createdAt: revision.createdAt.toISOString(),
    sheet: sheetSnapshotOf(revision),
    process: { profileId: revision.processProfileId, name: revision.processName, versionId: revision.processVersionId, version: revision.processVersionNumber },
    engineVersion: revision.engineVersion,
    devices: devices.toSorted((a, b) => a.position - b.position).map(deviceContentOf),
  };
}

/** SHA-256 (FIPS 180-4, 2015) in hex of the canonical JSON (RFC 8785, 2020) of the revision's content. */
export function revisionHash(revision: RevisionEntity, devices: readonly RevisionDeviceEntity[]): string {
  return createHash('sha256').update(canonicalJson(revisionContent(revision, devices)), 'utf8').digest('hex');
}

export function sheetSnapshotOf(revision: RevisionEntity): Omit<RevisionSheet, 'id' | 'projectId'> {
  return JSON.parse(revision.sheetSnapshot) as Omit<RevisionSheet, 'id' | 'projectId'>;
}

export function deviceContentOf(device: RevisionDeviceEntity): RevisionDeviceContent {
  return {
    deviceId: device.deviceId,
    position: device.position,
    name: device.name,
    targets: JSON.parse(device.targets) as DeviceTargets,
    result: device.result === null ? null : (JSON.parse(device.result) as DeviceResult),
    error: device.error === null ? null : (JSON.parse(device.error) as DeviceComputeError),
    engineVersion: device.engineVersion,
    processVersionId: device.processVersionId,
    computedAt: device.computedAt,
  };
}
