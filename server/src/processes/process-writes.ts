import { PROCESS_FILE_SCHEMA_VERSION, type Process } from '@channelwright/shared/schemas';
import { Injectable } from '@nestjs/common';
import type { EntityManager } from 'typeorm';
import { processVersionAudit } from '../audit/process-audit.js';
import { AuditService } from '../audit/audit.service.js';
import { conflict, DomainError, notFound } from '../common/errors/domain-error.js';
import { UsersService } from '../users/users.service.js';
import { assertMappingFits, parsedStoredCard, type StoredCard } from './model-card/stored-card.js';
import { diffVersions } from './process-diff.js';
import { ProcessProfileEntity, processNameKey } from './process-profile.entity.js';
import { definitionOf, storedCardOf } from './process-response.js';
import { ProcessVersionEntity } from './process-version.entity.js';

// The writes of the library, on the EntityManager of a transaction the caller opened (the service's
// unit of work, or the demo seed's), so that a profile and its version are stored together or not at all.

/** Who saves: an account id, or null for the system. */
type Author = { id: string } | null;

export interface NewProfile {
  definition: Process;
  nodeClass: string;
  message: string;
  demoData?: boolean;
  /** Its model card, ready to store (readModelCard). */
  card?: StoredCard | null;
}

export interface NewVersion {
  /** The version the edit started from. */
  baseVersion: number;
  definition: Process;
  /** Unchanged when absent. */
  nodeClass?: string;
  message: string;
  /** The new version's model card: undefined keeps the base version's (its mapping checked against the new definition), null removes it. */
  card?: StoredCard | null;
}

/** The field a name clash is reported on: "definition.name" for the JSON API, "name" for an imported file. */
export type NameField = 'definition.name' | 'name';

@Injectable()
export class ProcessWriter {
  constructor(
    private readonly audit: AuditService,
    private readonly users: UsersService,
  ) {}

  /** Stores a new profile with its version 1. */
  async insertProfile(manager: EntityManager, input: NewProfile, author: Author, nameField: NameField): Promise<ProcessProfileEntity> {
    await assertNameFree(manager, input.definition.name, undefined, nameField);
    const profiles = manager.getRepository(ProcessProfileEntity);
    const profile = await profiles.save(
      profiles.create({
        ...namesOf(input.definition),
        nodeClass: input.nodeClass,
        demoData: input.demoData ?? false,
        deprecated: false,
        latestVersion: 1,
        updatedById: author?.id ?? null,
      }),
    );
    await this.insertVersion(manager, profile.id, 1, input.definition, input.card ?? null, input.message, author);
    return profile;
  }

  /**
   * Saves an edit: a new version when the definition changed (the node class is updated either way).
   * 409 STALE_EDIT when a version newer than baseVersion exists; 400 NO_CHANGES when nothing differs.
   */
  async appendVersion(manager: EntityManager, profileId: string, input: NewVersion, author: Author, nameField: NameField): Promise<ProcessProfileEntity> {
    const profiles = manager.getRepository(ProcessProfileEntity);
    const profile = await profiles.findOneBy({ id: profileId });
    if (!profile) throw notFound('PROCESS_NOT_FOUND', 'There is no process profile with this id');
    const latest = await manager.getRepository(ProcessVersionEntity).findOneByOrFail({ profileId, number: profile.latestVersion });
    if (input.baseVersion > profile.latestVersion) {
      throw new DomainError('PROCESS_VERSION_NOT_FOUND', `There is no version ${input.baseVersion}; the latest is ${profile.latestVersion}`, 400, 'baseVersion');
    }
    if (input.baseVersion !== profile.latestVersion) {
      const who = latest.authorId === null ? undefined : (await this.users.findById(latest.authorId, manager))?.displayName;
      throw staleEdit(input.baseVersion, latest, who);
    }

    const baseCard = storedCardOf(latest);
    const card = input.card === undefined ? baseCard : input.card;
    // A kept card must still fit the edited definition (a corner or flavour it maps may be gone).
    if (input.card === undefined && card !== null) assertMappingFits(parsedStoredCard(card), card.mapping, input.definition);
    const versionChanged = diffVersions({ definition: definitionOf(latest), card: baseCard }, { definition: input.definition, card }).length > 0;
    const nodeClassChanged = input.nodeClass !== undefined && input.nodeClass !== profile.nodeClass;
    if (!versionChanged && !nodeClassChanged) {
      throw new DomainError('NO_CHANGES', `Nothing changed: this is version ${latest.number} as it is`, 400, 'definition');
    }
    if (processNameKey(input.definition.name) !== profile.nameKey) await assertNameFree(manager, input.definition.name, profile.id, nameField);
    if (versionChanged) {
      profile.latestVersion += 1;
      await this.insertVersion(manager, profile.id, profile.latestVersion, input.definition, card, input.message, author);
    }
    Object.assign(profile, namesOf(input.definition), { nodeClass: input.nodeClass ?? profile.nodeClass, updatedById: author?.id ?? null });
    return profiles.save(profile);
  }

  private async insertVersion(manager: EntityManager, profileId: string, number: number, definition: Process, card: StoredCard | null, message: string, author: Author): Promise<void> {
    const versions = manager.getRepository(ProcessVersionEntity);
    await versions.insert(
      versions.create({
        profileId,
        number,
        schemaVersion: PROCESS_FILE_SCHEMA_VERSION,
        definition: JSON.stringify(definition),
        modelCard: card?.text ?? null,
        modelCardSha256: card?.sha256 ?? null,
        modelCardMapping: card === null ? null : JSON.stringify(card.mapping),
        message,
        authorId: author?.id ?? null,
      }),
    );
    await this.audit.record(manager, processVersionAudit(profileId, number, definition.name, message, author));
  }
}

function namesOf(definition: Process) {
  return { name: definition.name, nameKey: processNameKey(definition.name), description: definition.description ?? '' };
}

async function assertNameFree(manager: EntityManager, name: string, exceptId: string | undefined, field: NameField): Promise<void> {
  const other = await manager.getRepository(ProcessProfileEntity).findOneBy({ nameKey: processNameKey(name) });
  if (other && other.id !== exceptId) throw conflict('PROCESS_NAME_TAKEN', `A process profile named ${other.name} exists already; choose another name`, field);
}

function staleEdit(baseVersion: number, latest: ProcessVersionEntity, author: string | undefined): DomainError {
  const who = author ?? 'someone';
  return conflict(
    'STALE_EDIT',
    `Version ${latest.number} was saved by ${who} at ${latest.createdAt.toISOString()}, after version ${baseVersion} you edited; nothing was saved. Reload, then make your change again.`,
    'baseVersion',
  );
}
