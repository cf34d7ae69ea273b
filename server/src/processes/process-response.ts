import { cornerNames, type ModelCardMapping, type Process, type ProcessProfile, type ProcessProfileSummary, type ProcessVersionSummary } from '@channelwright/shared/schemas';
import { toUserRef } from '../users/user-ref.js';
import type { UserCard } from '../users/users.service.js';
import { cardSummary, type StoredCard } from './model-card/stored-card.js';
import type { ProcessProfileEntity } from './process-profile.entity.js';
import type { ProcessVersionEntity } from './process-version.entity.js';

/** Accounts by id, as UsersService.cards gives them (for updatedBy and authors). */
export type UserCards = ReadonlyMap<string, UserCard>;

/** The stored definition of a version. Never re-validated: a version stays readable even if the schema grows stricter. */
export function definitionOf(version: ProcessVersionEntity): Process {
  return JSON.parse(version.definition) as Process;
}

/** The model card of a version, or null when it has none. */
export function storedCardOf(version: ProcessVersionEntity): StoredCard | null {
  if (version.modelCard === null || version.modelCardSha256 === null || version.modelCardMapping === null) return null;
  return { text: version.modelCard, sha256: version.modelCardSha256, mapping: JSON.parse(version.modelCardMapping) as ModelCardMapping };
}

/** A row of the library; `latest` is the profile's latest version (its vdd, tnom and corners are shown). */
export function toProfileSummary(profile: ProcessProfileEntity, latest: ProcessVersionEntity, users: UserCards): ProcessProfileSummary {
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
    updatedBy: toUserRef(profile.updatedById === null ? null : users.get(profile.updatedById)),
  };
}

export function toVersionSummary(version: ProcessVersionEntity, users: UserCards): ProcessVersionSummary {
  return {
    id: version.id,
    number: version.number,
    message: version.message,
    author: toUserRef(version.authorId === null ? null : users.get(version.authorId)),
    createdAt: version.createdAt.toISOString(),
    modelCardSha256: version.modelCardSha256,
  };
}

/** A profile with one version in full. */
export function toProfile(profile: ProcessProfileEntity, latest: ProcessVersionEntity, shown: ProcessVersionEntity, users: UserCards): ProcessProfile {
  return { ...toProfileSummary(profile, latest, users), version: { ...toVersionSummary(shown, users), definition: definitionOf(shown), modelCard: cardOrNull(shown) } };
}

function cardOrNull(version: ProcessVersionEntity) {
  const card = storedCardOf(version);
  return card === null ? null : cardSummary(card);
}
