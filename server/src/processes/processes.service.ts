import type {
  CreateProcessRequest,
  ListProcessesQuery,
  Process,
  ProcessDiff,
  ProcessFile,
  ProcessProfile,
  ProcessProfileSummary,
  ProcessVersionSummary,
  UpdateProcessRequest,
} from '@channelwright/shared/schemas';
import { PROCESS_FILE_FORMAT, PROCESS_FILE_SCHEMA_VERSION } from '@channelwright/shared/schemas';
import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { QueryFailedError, type DataSource, type EntityManager } from 'typeorm';
import { conflict, DomainError, notFound } from '../common/errors/domain-error.js';
import { runInTransaction } from '../database/run-in-transaction.js';
import type { UserEntity } from '../users/user.entity.js';
import type { ImportedProcess } from './import/read-process-file.js';
import { diffProcesses } from './process-diff.js';
import { ProcessProfileEntity } from './process-profile.entity.js';
import { findProcessReferences } from './process-references.js';
import { definitionOf, toProfile, toProfileSummary, toVersionSummary } from './process-response.js';
import { ProcessVersionEntity } from './process-version.entity.js';
import { appendVersion, insertProfile } from './process-writes.js';

/** One version of a stored process, as the compute API and sheets use it. */
export interface ResolvedProcess {
  profileId: string;
  name: string;
  deprecated: boolean;
  /** The version number, 1, 2 … */
  version: number;
  /** The id of the ProcessVersionEntity row (what a sheet's foreign key holds). */
  versionId: string;
  definition: Process;
}

/** Where an imported file goes: a new profile, or a new version of one. */
export interface ImportTarget {
  nodeClass?: string;
  message?: string;
  profileId?: string;
  baseVersion?: number;
}

/** The process-profile library: reads for everyone signed in, writes (callers check maintainers) in one transaction each. */
@Injectable()
export class ProcessesService {
  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  /** The latest version of every profile, by name; deprecated ones only when asked; `search` matches name, node class or description. */
  async list(query: ListProcessesQuery): Promise<ProcessProfileSummary[]> {
    const profiles = await this.dataSource.getRepository(ProcessProfileEntity).find({
      where: query.includeDeprecated ? {} : { deprecated: false },
      relations: { updatedBy: true },
      order: { nameKey: 'ASC' },
    });
    const needle = query.search?.toLowerCase();
    const found = needle ? profiles.filter((p) => [p.name, p.nodeClass, p.description].some((text) => text.toLowerCase().includes(needle))) : profiles;
    const latest = await this.latestVersions(found);
    return found.map((profile) => toProfileSummary(profile, latest.get(profile.id)!));
  }

  /** A profile with one version in full: `version`, or the latest. */
  async get(id: string, version?: number): Promise<ProcessProfile> {
    const profile = await this.profile(id);
    const latest = await this.version(this.dataSource.manager, profile.id, profile.latestVersion, 'version');
    const shown = version === undefined || version === latest.number ? latest : await this.version(this.dataSource.manager, profile.id, version, 'version');
    return toProfile(profile, latest, shown);
  }

  /** Every version, newest first. */
  async versions(id: string): Promise<ProcessVersionSummary[]> {
    const profile = await this.profile(id);
    const versions = await this.dataSource.getRepository(ProcessVersionEntity).find({
      where: { profileId: profile.id },
      relations: { author: true },
      order: { number: 'DESC' },
    });
    return versions.map(toVersionSummary);
  }

  /** What changed from version `from` to `to` (defaults: the latest and the one before it). */
  async diff(id: string, from?: number, to?: number): Promise<ProcessDiff> {
    const profile = await this.profile(id);
    const toNumber = to ?? profile.latestVersion;
    const fromNumber = from ?? Math.max(1, toNumber - 1);
    const manager = this.dataSource.manager;
    const [older, newer] = [await this.version(manager, profile.id, fromNumber, 'from'), await this.version(manager, profile.id, toNumber, 'to')];
    return { profileId: profile.id, from: fromNumber, to: toNumber, changes: diffProcesses(definitionOf(older), definitionOf(newer)) };
  }

  async create(request: CreateProcessRequest, author: UserEntity): Promise<ProcessProfile> {
    const profile = await runInTransaction(this.dataSource, (manager) => insertProfile(manager, request, author, 'definition.name'));
    return this.get(profile.id);
  }

  /** A new version from the edit of `baseVersion`; 409 STALE_EDIT (nothing written) when someone saved after it. */
  async update(id: string, request: UpdateProcessRequest, author: UserEntity): Promise<ProcessProfile> {
    const profile = await runInTransaction(this.dataSource, (manager) => appendVersion(manager, id, request, author, 'definition.name'));
    return this.get(profile.id);
  }

  /** Stores an imported file as a new profile, or as a new version of `target.profileId` edited from `target.baseVersion`. */
  async import(file: ImportedProcess, target: ImportTarget, author: UserEntity): Promise<ProcessProfile> {
    const nodeClass = target.nodeClass ?? file.nodeClass;
    const message = target.message ?? 'Imported from a file';
    const profile = await runInTransaction(this.dataSource, (manager) =>
      target.profileId !== undefined && target.baseVersion !== undefined
        ? appendVersion(manager, target.profileId, { baseVersion: target.baseVersion, definition: file.definition, nodeClass, message }, author, 'name')
        : insertProfile(manager, { definition: file.definition, nodeClass: nodeClass ?? '', message }, author, 'name'),
    );
    return this.get(profile.id);
  }

  async setDeprecated(id: string, deprecated: boolean, author: UserEntity): Promise<ProcessProfile> {
    await runInTransaction(this.dataSource, async (manager) => {
      const repository = manager.getRepository(ProcessProfileEntity);
      const profile = await repository.findOneBy({ id });
      if (!profile) throw profileNotFound();
      if (profile.deprecated !== deprecated) await repository.save(Object.assign(profile, { deprecated, updatedById: author.id }));
    });
    return this.get(id);
  }

  /** Deletes a profile with all its versions; 409 PROCESS_IN_USE when any row of another table refers to it. */
  async remove(id: string): Promise<void> {
    try {
      await runInTransaction(this.dataSource, async (manager) => {
        const profile = await manager.getRepository(ProcessProfileEntity).findOneBy({ id });
        if (!profile) throw profileNotFound();
        const references = await findProcessReferences(manager, id);
        if (references.length > 0) {
          const uses = references.map((r) => `${r.count} in ${r.table}`).join(', ');
          throw conflict('PROCESS_IN_USE', `${profile.name} is in use (${uses}) and cannot be deleted; deprecate it instead`);
        }
        await manager.getRepository(ProcessVersionEntity).delete({ profileId: id });
        await manager.getRepository(ProcessProfileEntity).delete({ id });
      });
    } catch (error) {
      // The foreign keys are the last word: a reference the check did not see still refuses the delete.
      if (error instanceof QueryFailedError && /FOREIGN KEY/i.test(error.message)) {
        throw conflict('PROCESS_IN_USE', 'This process profile is in use and cannot be deleted; deprecate it instead');
      }
      throw error;
    }
  }

  /** One version as our exchange file. */
  async exportFile(id: string, version?: number): Promise<{ fileName: string; file: ProcessFile }> {
    const profile = await this.get(id, version);
    const file: ProcessFile = {
      format: PROCESS_FILE_FORMAT,
      schemaVersion: PROCESS_FILE_SCHEMA_VERSION,
      nodeClass: profile.nodeClass,
      exportedAt: new Date().toISOString(),
      source: { profileId: profile.id, version: profile.version.number },
      process: profile.version.definition,
    };
    const base = profile.name.replace(/[^A-Za-z0-9._-]+/g, '_');
    return { fileName: `${base}-v${profile.version.number}.process.json`, file };
  }

  /**
   * The definition of a stored process for computations: `version`, or the latest when absent.
   * 404 PROCESS_NOT_FOUND (field processId) or PROCESS_VERSION_NOT_FOUND (field processVersion).
   * Pass the manager of an open transaction to read inside it.
   */
  async resolveDefinition(processId: string, version?: number, manager: EntityManager = this.dataSource.manager): Promise<ResolvedProcess> {
    const profile = await manager.getRepository(ProcessProfileEntity).findOneBy({ id: processId });
    if (!profile) throw new DomainError('PROCESS_NOT_FOUND', 'There is no process profile with this id', 404, 'processId');
    const row = await this.version(manager, profile.id, version ?? profile.latestVersion, 'processVersion');
    return resolved(profile, row);
  }

  /** The same for a version id, as a sheet's foreign key holds it; 404 PROCESS_VERSION_NOT_FOUND (field processVersionId). */
  async resolveVersion(versionId: string, manager: EntityManager = this.dataSource.manager): Promise<ResolvedProcess> {
    const row = await manager.getRepository(ProcessVersionEntity).findOne({ where: { id: versionId }, relations: { profile: true } });
    if (!row) throw new DomainError('PROCESS_VERSION_NOT_FOUND', 'There is no process version with this id', 404, 'processVersionId');
    return resolved(row.profile, row);
  }

  private async profile(id: string): Promise<ProcessProfileEntity> {
    const profile = await this.dataSource.getRepository(ProcessProfileEntity).findOne({ where: { id }, relations: { updatedBy: true } });
    if (!profile) throw profileNotFound();
    return profile;
  }

  private async version(manager: EntityManager, profileId: string, number: number, field: string): Promise<ProcessVersionEntity> {
    const version = await manager.getRepository(ProcessVersionEntity).findOne({ where: { profileId, number }, relations: { author: true } });
    if (!version) throw new DomainError('PROCESS_VERSION_NOT_FOUND', `This profile has no version ${number}`, 404, field);
    return version;
  }

  private async latestVersions(profiles: ProcessProfileEntity[]): Promise<Map<string, ProcessVersionEntity>> {
    if (profiles.length === 0) return new Map();
    const rows = await this.dataSource
      .getRepository(ProcessVersionEntity)
      .createQueryBuilder('version')
      .innerJoin(ProcessProfileEntity, 'profile', 'profile.id = version.profileId AND profile.latestVersion = version.number')
      .where('version.profileId IN (:...ids)', { ids: profiles.map((p) => p.id) })
      .getMany();
    return new Map(rows.map((row) => [row.profileId, row]));
  }
}

function profileNotFound(): DomainError {
  return notFound('PROCESS_NOT_FOUND', 'There is no process profile with this id');
}

function resolved(profile: ProcessProfileEntity, row: ProcessVersionEntity): ResolvedProcess {
  return { profileId: profile.id, name: profile.name, deprecated: profile.deprecated, version: row.number, versionId: row.id, definition: definitionOf(row) };
}
