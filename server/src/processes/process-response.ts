import { cornerNames, type Process, type ProcessProfile, type ProcessProfileSummary, type ProcessVersionSummary, type UserRef } from '@channelwright/shared/schemas';
import type { UserEntity } from '../users/user.entity.js';
import type { ProcessProfileEntity } from './process-profile.entity.js';
import type { ProcessVersionEntity } from './process-version.entity.js';

/** The stored definition of a version. Never re-validated: a version stays readable even if the schema grows stricter. */
export function definitionOf(version: ProcessVersionEntity): Process {
  return JSON.parse(version.definition) as Process;
}

export function toUserRef(user: UserEntity | null | undefined): UserRef | null {
  return user ? { id: user.id, displayName: user.displayName } : null;
}

/** A row of the library; `latest` is the profile's latest version (its vdd, tnom and corners are shown). */
export function toProfileSummary(profile: ProcessProfileEntity, latest: ProcessVersionEntity): ProcessProfileSummary {
  const definition = definitionOf(latest);
  return {
    id: profile.id,
    name: profile.name,
    description: profile.description,
    nodeClass: profile.nodeClass,
    deprecated: profile.deprecated,
    demoData: profile.demoData,
    latestVersion: profile.latestVersion,
    vdd: definition.vdd,
    tnom: definition.tnom,
    corners: cornerNames(definition),
    createdAt: profile.createdAt.toISOString(),
    updatedAt: profile.updatedAt.toISOString(),
    updatedBy: toUserRef(profile.updatedBy),
  };
}

export function toVersionSummary(version: ProcessVersionEntity): ProcessVersionSummary {
  return {
    id: version.id,
    number: version.number,
    message: version.message,
    author: toUserRef(version.author),
    createdAt: version.createdAt.toISOString(),
  };
}

/** A profile with one version in full. */
export function toProfile(profile: ProcessProfileEntity, latest: ProcessVersionEntity, shown: ProcessVersionEntity): ProcessProfile {
  return { ...toProfileSummary(profile, latest), version: { ...toVersionSummary(shown), definition: definitionOf(shown) } };
}
