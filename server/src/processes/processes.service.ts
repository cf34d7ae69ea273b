import type {
  CreateProcessRequest,
  ListProcessesQuery,
  ModelCardCheck,
  ModelCardCheckFields,
  ModelCardMapping,
  Process,
  ProcessDiff,
  ProcessFile,
  ProcessProfile,
  ProcessProfileSummary,
  ProcessVersionSummary,
  StoredModelCard,
  UpdateProcessRequest,
} from '@channelwright/shared/schemas';
import { PROCESS_FILE_FORMAT, PROCESS_FILE_SCHEMA_VERSION } from '@channelwright/shared/schemas';
import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { In, QueryFailedError, type EntityManager, type Repository } from 'typeorm';
import { conflict, DomainError, notFound } from '../common/errors/domain-error.js';
import { findReferences } from '../database/foreign-key-references.js';
import { CommittedVersions } from './committed-versions.js';
import { UnitOfWork } from '../database/unit-of-work.js';
import { UsersService } from '../users/users.service.js';
import type { ImportedProcess } from './import/read-process-file.js';
import { cardSummary, checkUploadedCard, readModelCard, type StoredCard } from './model-card/stored-card.js';
import { diffVersions } from './process-diff.js';
import { ProcessProfileEntity, processNameKey } from './process-profile.entity.js';
import { definitionOf, storedCardOf, toProfile, toProfileSummary, toVersionSummary } from './process-response.js';
import { ProcessVersionEntity } from './process-version.entity.js';
import { ProcessVisibility, type ProcessViewer } from './process-visibility.js';
import { ProcessWriter } from './process-writes.js';

const OWN_TABLES = new Set(['process_profiles', 'process_versions']);

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
  /** The version's model card (re-emitted text, hash, mapping); null when it has none. */
  card: StoredCard | null;
}

/** A process version as other modules show it: its number, and its profile's newest. */
export interface VersionFacts {
  profileId: string;
  /** The profile's name. */
  profileName: string;
  number: number;
  latestVersion: number;
}

/** Where an imported file goes: a new profile, or a new version of one. */
export interface ImportTarget {
  nodeClass?: string;
  message?: string;
  profileId?: string;
  baseVersion?: number;
  mapping?: ModelCardMapping;
}

/** An account that saves (the callers check maintainers). */
type Author = { id: string };

/**
 * The process-profile library: reads for whoever may see a profile (ProcessVisibility: a profile the reader
 * may not see is as absent as one that does not exist), writes (callers check maintainers) in one
 * transaction each.
 */
@Injectable()
export class ProcessesService {
  constructor(
    @InjectRepository(ProcessProfileEntity) private readonly profiles: Repository<ProcessProfileEntity>,
    @InjectRepository(ProcessVersionEntity) private readonly versionRows: Repository<ProcessVersionEntity>,
    private readonly unitOfWork: UnitOfWork,
    private readonly writer: ProcessWriter,
    private readonly users: UsersService,
    private readonly visibility: ProcessVisibility,
  ) {}

  private readonly committedVersions = new CommittedVersions();

  /** The latest version of every profile the viewer may see, by name; deprecated ones only when asked; `search` matches name, node class or description. */
  async list(query: ListProcessesQuery, viewer: ProcessViewer): Promise<ProcessProfileSummary[]> {
    const visible = await this.visibility.visibleTo(viewer);
    const profiles = await this.profiles.find({
      where: query.includeDeprecated ? {} : { deprecated: false },
      order: { nameKey: 'ASC' },
    });
    const needle = query.search?.toLowerCase();
    const found = profiles
      .filter((p) => visible === 'all' || visible.has(p.id))
      .filter((p) => !needle || [p.name, p.nodeClass, p.description].some((text) => text.toLowerCase().includes(needle)));
    const latest = await this.latestVersions(found);
    const users = await this.users.cards(found.map((p) => p.updatedById));
    return found.map((profile) => toProfileSummary(profile, latest.get(profile.id)!, users));
  }

  /** A profile with one version in full: `version`, or the latest. */
  async get(id: string, viewer: ProcessViewer, version?: number): Promise<ProcessProfile> {
    const profile = await this.visibleProfile(id, viewer);
    return this.present(profile, version);
  }

  /** Every version, newest first. */
  async versions(id: string, viewer: ProcessViewer): Promise<ProcessVersionSummary[]> {
    const profile = await this.visibleProfile(id, viewer);
    const versions = await this.versionRows.find({ where: { profileId: profile.id }, order: { number: 'DESC' } });
    const users = await this.users.cards(versions.map((v) => v.authorId));
    return versions.map((version) => toVersionSummary(version, users));
  }

  /** What changed from version `from` to `to` (defaults: the latest and the one before it). */
  async diff(id: string, viewer: ProcessViewer, from?: number, to?: number): Promise<ProcessDiff> {
    const profile = await this.visibleProfile(id, viewer);
    const toNumber = to ?? profile.latestVersion;
    const fromNumber = from ?? Math.max(1, toNumber - 1);
    const manager = this.unitOfWork.manager;
    const [older, newer] = [await this.version(manager, profile.id, fromNumber, 'from'), await this.version(manager, profile.id, toNumber, 'to')];
    const changes = diffVersions({ definition: definitionOf(older), card: storedCardOf(older) }, { definition: definitionOf(newer), card: storedCardOf(newer) });
    return { profileId: profile.id, from: fromNumber, to: toNumber, changes };
  }

  async create(request: CreateProcessRequest, author: Author): Promise<ProcessProfile> {
    const card = request.modelCard ? readModelCard(request.modelCard.text, request.modelCard.mapping, request.definition) : null;
    const profile = await this.unitOfWork.run((manager) => this.writer.insertProfile(manager, { ...request, card }, author, 'definition.name'));
    return this.present(profile);
  }

  /** A new version from the edit of `baseVersion`; 409 STALE_EDIT (nothing written) when someone saved after it. */
  async update(id: string, request: UpdateProcessRequest, author: Author): Promise<ProcessProfile> {
    const { modelCard, ...edit } = request;
    const card = modelCard ? readModelCard(modelCard.text, modelCard.mapping, request.definition) : modelCard;
    const profile = await this.unitOfWork.run((manager) => this.writer.appendVersion(manager, id, { ...edit, card }, author, 'definition.name'));
    return this.present(profile);
  }

  /**
   * Stores an upload as a new profile, or as a new version of `target.profileId` edited from `target.baseVersion`: a
   * process file (with the card it carries, or `card`), or a model card alone, which becomes a new version of the base
   * version's process with that card (a card needs a profile to belong to: 400 naming profileId without one).
   */
  async import(file: ImportedProcess | null, cardText: string | null, target: ImportTarget, author: Author): Promise<ProcessProfile> {
    const message = target.message ?? (file ? 'Imported from a file' : 'Model card uploaded');
    const profile = await this.unitOfWork.run(async (manager) => {
      if (target.profileId === undefined || target.baseVersion === undefined) {
        if (!file) throw new DomainError('VALIDATION_FAILED', 'A model card alone becomes a new version of a profile: give profileId and baseVersion (or upload a process file with it)', 400, 'profileId');
        const card = this.uploadedCard(cardText ?? file.modelCard?.text ?? null, target.mapping ?? file.modelCard?.mapping, file.definition);
        return this.writer.insertProfile(manager, { definition: file.definition, nodeClass: target.nodeClass ?? file.nodeClass ?? '', message, card }, author, 'name');
      }
      const base = await this.resolveDefinition(target.profileId, target.baseVersion, manager);
      const definition = file?.definition ?? base.definition;
      const text = cardText ?? file?.modelCard?.text ?? null;
      // A new mapping alone re-maps the base version's card.
      const card = text === null && target.mapping !== undefined && base.card ? this.uploadedCard(base.card.text, target.mapping, definition) : this.uploadedCard(text, target.mapping ?? file?.modelCard?.mapping, definition);
      const nodeClass = target.nodeClass ?? file?.nodeClass;
      return this.writer.appendVersion(manager, target.profileId, { baseVersion: target.baseVersion, definition, nodeClass, message, ...(card === null ? {} : { card }) }, author, 'name');
    });
    return this.present(profile);
  }

  private uploadedCard(text: string | null, mapping: ModelCardMapping | undefined, definition: Process): StoredCard | null {
    return text === null ? null : readModelCard(text, mapping, definition);
  }

  async setDeprecated(id: string, deprecated: boolean, author: Author): Promise<ProcessProfile> {
    const profile = await this.unitOfWork.run(async (manager) => {
      const repository = manager.getRepository(ProcessProfileEntity);
      const found = await repository.findOneBy({ id });
      if (!found) throw profileNotFound();
      return found.deprecated === deprecated ? found : repository.save(Object.assign(found, { deprecated, updatedById: author.id }));
    });
    return this.present(profile);
  }

  /** Deletes a profile with all its versions; 409 PROCESS_IN_USE when any row of another table refers to it. */
  async remove(id: string): Promise<void> {
    try {
      await this.unitOfWork.run(async (manager) => {
        const profile = await manager.getRepository(ProcessProfileEntity).findOneBy({ id });
        if (!profile) throw profileNotFound();
        const references = await findReferences(
          manager,
          [
            { table: 'process_profiles', column: 'id', value: id },
            { table: 'process_versions', column: 'profileId', value: id },
          ],
          OWN_TABLES,
        );
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
  async exportFile(id: string, viewer: ProcessViewer, version?: number): Promise<{ fileName: string; file: ProcessFile }> {
    const profile = await this.get(id, viewer, version);
    const card = storedCardOf(await this.version(this.unitOfWork.manager, profile.id, profile.version.number, 'version'));
    const file: ProcessFile = {
      format: PROCESS_FILE_FORMAT,
      schemaVersion: PROCESS_FILE_SCHEMA_VERSION,
      nodeClass: profile.nodeClass,
      exportedAt: new Date().toISOString(),
      source: { profileId: profile.id, version: profile.version.number },
      process: profile.version.definition,
      ...(card === null ? {} : { modelCard: { text: card.text, mapping: card.mapping } }),
    };
    const base = profile.name.replace(/[^A-Za-z0-9._-]+/g, '_');
    return { fileName: `${base}-v${profile.version.number}.process.json`, file };
  }

  /** An uploaded card checked against a version's corners and flavours, nothing stored. */
  async checkModelCard(text: string, fields: ModelCardCheckFields, viewer: ProcessViewer): Promise<ModelCardCheck> {
    const profile = await this.visibleProfile(fields.profileId, viewer);
    const row = await this.version(this.unitOfWork.manager, profile.id, fields.version ?? profile.latestVersion, 'version');
    return checkUploadedCard(text, fields.mapping, definitionOf(row));
  }

  /** A version's model card with its re-emitted text; 404 PROCESS_HAS_NO_MODEL_CARD when it has none. */
  async modelCard(id: string, viewer: ProcessViewer, version?: number): Promise<StoredModelCard> {
    const profile = await this.visibleProfile(id, viewer);
    const row = await this.version(this.unitOfWork.manager, profile.id, version ?? profile.latestVersion, 'version');
    const card = storedCardOf(row);
    if (!card) throw notFound('PROCESS_HAS_NO_MODEL_CARD', `${profile.name} version ${row.number} has no model card`);
    return { ...cardSummary(card), text: card.text };
  }

  /**
   * The definition of a stored process for computations: `version`, or the latest when absent.
   * 404 PROCESS_NOT_FOUND (field processId) or PROCESS_VERSION_NOT_FOUND (field processVersion), and
   * PROCESS_NOT_FOUND too when a `viewer` is given who may not see the profile.
   * Pass the manager of an open transaction to read inside it.
   */
  async resolveDefinition(processId: string, version?: number, inTransaction?: EntityManager, viewer?: ProcessViewer): Promise<ResolvedProcess> {
    const manager = inTransaction ?? this.unitOfWork.manager;
    const profile = await manager.getRepository(ProcessProfileEntity).findOneBy({ id: processId });
    if (!profile || (viewer && !(await this.visibility.sees(viewer, profile.id)))) {
      throw new DomainError('PROCESS_NOT_FOUND', 'There is no process profile with this id', 404, 'processId');
    }
    const number = version ?? profile.latestVersion;
    // Outside a transaction only: a version written by a transaction that is then rolled back must never be kept.
    const cached = inTransaction ? undefined : this.committedVersions.get(profile.id, number);
    if (cached) return { profileId: profile.id, name: profile.name, deprecated: profile.deprecated, ...cached };
    const result = resolved(profile, await this.version(manager, profile.id, number, 'processVersion'));
    if (!inTransaction) this.committedVersions.keep(profile.id, number, result);
    return result;
  }

  /** The same for a version id, as a sheet's foreign key holds it; 404 PROCESS_VERSION_NOT_FOUND (field processVersionId). */
  async resolveVersion(versionId: string, manager: EntityManager = this.unitOfWork.manager): Promise<ResolvedProcess> {
    // Outside a transaction a committed version kept parsed saves reading its definition and card; the profile row
    // (name, deprecation) is read every time.
    const cached = manager === this.unitOfWork.manager ? this.committedVersions.getById(versionId) : undefined;
    if (cached) {
      const profile = await manager.getRepository(ProcessProfileEntity).findOneBy({ id: cached.profileId });
      if (profile) return { profileId: profile.id, name: profile.name, deprecated: profile.deprecated, ...cached.content };
    }
    const row = await manager.getRepository(ProcessVersionEntity).findOne({ where: { id: versionId }, relations: { profile: true } });
    if (!row) throw new DomainError('PROCESS_VERSION_NOT_FOUND', 'There is no process version with this id', 404, 'processVersionId');
    const result = resolved(row.profile, row);
    if (manager === this.unitOfWork.manager) this.committedVersions.keep(row.profile.id, row.number, result);
    return result;
  }

  /** Number, profile and the profile's newest version of each version id. */
  async versionFacts(versionIds: Iterable<string>, manager: EntityManager = this.unitOfWork.manager): Promise<Map<string, VersionFacts>> {
    const ids = [...new Set(versionIds)];
    if (ids.length === 0) return new Map();
    const rows = await manager.getRepository(ProcessVersionEntity).find({ where: { id: In(ids) }, relations: { profile: true } });
    return new Map(rows.map((row) => [row.id, { profileId: row.profileId, profileName: row.profile.name, number: row.number, latestVersion: row.profile.latestVersion }]));
  }

  /**
   * Appends a version inside the caller's transaction, for a write of another module that must be stored with it (a
   * fitted extraction saved as a version, with its own row and audit); the caller checks maintainers. 409 STALE_EDIT
   * when baseVersion is not the latest, 400 NO_CHANGES when nothing differs.
   */
  async appendVersionIn(manager: EntityManager, profileId: string, version: { baseVersion: number; definition: Process; message: string }, author: Author): Promise<{ profileId: string; name: string; number: number }> {
    const profile = await this.writer.appendVersion(manager, profileId, version, author, 'definition.name');
    return { profileId: profile.id, name: profile.name, number: profile.latestVersion };
  }

  /** The id of the profile with this name (any case), or null. */
  async profileIdByName(name: string, manager: EntityManager = this.unitOfWork.manager): Promise<string | null> {
    return (await manager.getRepository(ProcessProfileEntity).findOneBy({ nameKey: processNameKey(name) }))?.id ?? null;
  }

  private async present(profile: ProcessProfileEntity, version?: number): Promise<ProcessProfile> {
    const manager = this.unitOfWork.manager;
    const latest = await this.version(manager, profile.id, profile.latestVersion, 'version');
    const shown = version === undefined || version === latest.number ? latest : await this.version(manager, profile.id, version, 'version');
    const users = await this.users.cards([profile.updatedById, latest.authorId, shown.authorId]);
    return toProfile(profile, latest, shown, users);
  }

  private async visibleProfile(id: string, viewer: ProcessViewer): Promise<ProcessProfileEntity> {
    const profile = await this.profiles.findOneBy({ id });
    if (!profile || !(await this.visibility.sees(viewer, profile.id))) throw profileNotFound();
    return profile;
  }

  private async version(manager: EntityManager, profileId: string, number: number, field: string): Promise<ProcessVersionEntity> {
    const version = await manager.getRepository(ProcessVersionEntity).findOneBy({ profileId, number });
    if (!version) throw new DomainError('PROCESS_VERSION_NOT_FOUND', `This profile has no version ${number}`, 404, field);
    return version;
  }

  private async latestVersions(profiles: ProcessProfileEntity[]): Promise<Map<string, ProcessVersionEntity>> {
    if (profiles.length === 0) return new Map();
    const rows = await this.versionRows
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
  return { profileId: profile.id, name: profile.name, deprecated: profile.deprecated, version: row.number, versionId: row.id, definition: definitionOf(row), card: storedCardOf(row) };
}
