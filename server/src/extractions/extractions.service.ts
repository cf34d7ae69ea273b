import { createHash } from 'node:crypto';
import type { CurveFileOptions } from '@channelwright/shared/curve-file';
import { FIT_STAGES } from '@channelwright/shared/extraction';
import {
  type Extraction,
  type ExtractionOptions,
  type ExtractionResultResponse,
  type ExtractionSummary,
  type ExtractionFromTableRequest,
  type ExtractionUploadFields,
  extractionOptionsSchema,
  type ProcessProfile,
  processSchema,
  type RerunExtractionRequest,
  type SaveExtractionRequest,
} from '@channelwright/shared/schemas';
import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { In, IsNull, type Repository } from 'typeorm';
import { AuditService } from '../audit/audit.service.js';
import { conflict, DomainError, notFound } from '../common/errors/domain-error.js';
import { UnitOfWork } from '../database/unit-of-work.js';
import { CharacterisationTables } from '../characterisation/tables/characterisation-tables.service.js';
import { isProcessMaintainer } from '../processes/process-maintainer.guard.js';
import { ProcessesService, type ResolvedProcess } from '../processes/processes.service.js';
import type { Account } from '../users/users.service.js';
import { UsersService } from '../users/users.service.js';
import { extractionSavedAudit, uploadSource } from './extraction-audit.js';
import { toExtraction, toExtractionSummary, type UploadFacts, type UploadReading } from './extraction-response.js';
import { ExtractionUploadEntity } from './extraction-upload.entity.js';
import { ExtractionEntity } from './extraction.entity.js';
import { ExtractionJobStore } from './jobs/extraction-job-store.js';
import { ExtractionRunner } from './jobs/extraction-runner.js';
import { ExtractionWorkers } from './jobs/extraction-workers.js';
import { curveFileInvalid, decodeCurveFile } from './read-upload.js';
import { tableUpload } from './table-upload.js';

/** The part of an upload the service reads (multer's memory storage). */
export interface UploadedCurveFile {
  originalname: string;
  buffer: Buffer;
}

/** Most extractions a list answers. */
const LIST_LIMIT = 200;

/** The upload's columns without its bytes (a list or a job view never needs them). */
const UPLOAD_FACTS = { id: true, fileName: true, sha256: true, bytes: true, readOptions: true, reading: true, uploadedById: true, createdAt: true } as const;

/**
 * Parameter extraction (docs/extraction.md): uploads read and kept, fits queued as jobs, their results, and a result
 * saved as a new version of its base profile through the processes module. An extraction is seen by whoever ran it and
 * by the process maintainers; to everyone else it does not exist (404).
 */
@Injectable()
export class ExtractionsService {
  constructor(
    @InjectRepository(ExtractionEntity) private readonly rows: Repository<ExtractionEntity>,
    @InjectRepository(ExtractionUploadEntity) private readonly uploads: Repository<ExtractionUploadEntity>,
    private readonly unitOfWork: UnitOfWork,
    private readonly processes: ProcessesService,
    private readonly users: UsersService,
    private readonly audit: AuditService,
    private readonly workers: ExtractionWorkers,
    private readonly runner: ExtractionRunner,
    private readonly store: ExtractionJobStore,
    private readonly tables: CharacterisationTables,
  ) {}

  /**
   * Reads an upload (in a worker thread) and, when it reads, stores it with a queued fit; 400 CURVE_FILE_INVALID with
   * every problem by row and column otherwise, and nothing stored. 404 when the viewer may not see the base profile.
   */
  async create(file: UploadedCurveFile, fields: ExtractionUploadFields, user: Account): Promise<Extraction> {
    const base = await this.processes.resolveDefinition(fields.processId, fields.version, undefined, user);
    const text = decodeCurveFile(file.buffer);
    const readOptions: CurveFileOptions = { polarity: fields.polarity, w: fields.w, l: fields.l, fingers: fields.fingers, temperature: fields.temperature };
    const reading = await this.workers.read(text, readOptions);
    if (!reading.ok) throw curveFileInvalid(reading.problems);
    const { points, convention, notes, curves } = reading.file;
    const summary: UploadReading = { points: points.length, convention, notes, curves };
    const options = extractionOptionsSchema.parse({
      model: fields.model,
      fixed: fields.fixed,
      noiseFloor: fields.noiseFloor ?? null,
      maxIterations: fields.maxIterations,
      minGmId: fields.minGmId ?? null,
    });
    return this.keepAndQueue(
      { fileName: file.originalname.slice(0, 255) || 'curves.csv', content: file.buffer, readOptions, reading: summary },
      { base, polarity: fields.polarity, options },
      user,
    );
  }

  /**
   * A fit of the current table of a version's device (polarity and flavour), read at one corner and the chosen values
   * of its axes: the table's points are written as the CSV an upload is (with "#" lines naming the process, version,
   * table, its hash and the corner) and kept as an upload, so the job, re-run and audit paths are those of an upload.
   * 409 TABLE_NOT_CHARACTERISED / TABLE_NOT_READY (field polarity) without a finished table; 400 naming the field for
   * a corner or an axis value the table does not have; 404 when the viewer may not see the profile. Nothing is stored
   * on a refusal.
   */
  async createFromTable(request: ExtractionFromTableRequest, user: Account): Promise<Extraction> {
    const base = await this.baseVersion(request.processId, request.version, user);
    const device = { polarity: request.polarity, flavour: request.flavour ?? null };
    const stored = await this.tables.storedTable(base.versionId, device);
    const { corner, temperatures, lengths, vds, vsb } = request;
    const upload = tableUpload(stored, { processId: base.profileId, processName: base.name, version: base.version }, device, { corner, temperatures, lengths, vds, vsb });
    const readOptions: CurveFileOptions = { polarity: request.polarity };
    const reading = await this.workers.read(upload.text, readOptions);
    // The table's lines are curves of its VGS axis; only a table of too few VGS values is refused here.
    if (!reading.ok) throw curveFileInvalid(reading.problems);
    const { points, convention, notes, curves } = reading.file;
    const options = extractionOptionsSchema.parse({ model: request.model, fixed: request.fixed, noiseFloor: request.noiseFloor, maxIterations: request.maxIterations, minGmId: request.minGmId });
    return this.keepAndQueue(
      { fileName: upload.fileName, content: Buffer.from(upload.text, 'utf8'), readOptions, reading: { points: points.length, convention, notes, curves, table: upload.origin } },
      { base, polarity: request.polarity, options },
      user,
    );
  }

  /** Keeps an upload with its queued fit in one transaction, and has a worker take it. */
  private async keepAndQueue(
    upload: { fileName: string; content: Buffer; readOptions: CurveFileOptions; reading: UploadReading },
    fit: { base: ResolvedProcess; polarity: ExtractionEntity['polarity']; options: ExtractionOptions },
    user: Account,
  ): Promise<Extraction> {
    const id = await this.unitOfWork.run(async (manager) => {
      const uploads = manager.getRepository(ExtractionUploadEntity);
      const saved = await uploads.save(
        uploads.create({
          fileName: upload.fileName,
          sha256: createHash('sha256').update(upload.content).digest('hex'),
          bytes: upload.content.length,
          content: upload.content,
          readOptions: JSON.stringify(upload.readOptions),
          reading: JSON.stringify(upload.reading),
          uploadedById: user.id,
        }),
      );
      return this.insertJob(manager.getRepository(ExtractionEntity), { uploadId: saved.id, processVersionId: fit.base.versionId, polarity: fit.polarity, options: fit.options, createdById: user.id, rerunOfId: null });
    });
    await this.runner.enqueue();
    return this.get(id, user);
  }

  /** The base version a request names, if the viewer may see its profile; a missing version is named by the request's field "version". */
  private async baseVersion(processId: string, version: number | undefined, user: Account): Promise<ResolvedProcess> {
    try {
      return await this.processes.resolveDefinition(processId, version, undefined, user);
    } catch (error) {
      if (error instanceof DomainError && error.field === 'processVersion') throw new DomainError(error.code, error.message, error.status, 'version');
      throw error;
    }
  }

  /** The same points fitted again with other options (absent ones as before), on the same base version. */
  async rerun(id: string, request: RerunExtractionRequest, user: Account): Promise<Extraction> {
    const row = await this.visible(id, user);
    const options = extractionOptionsSchema.parse({ ...(JSON.parse(row.options) as ExtractionOptions), ...request });
    const rerun = await this.insertJob(this.rows, { uploadId: row.uploadId, processVersionId: row.processVersionId, polarity: row.polarity, options, createdById: user.id, rerunOfId: row.id });
    await this.runner.enqueue();
    return this.get(rerun, user);
  }

  async get(id: string, user: Account): Promise<Extraction> {
    const row = await this.visible(id, user);
    const [upload, facts, users] = await Promise.all([this.uploadFacts(row.uploadId), this.processes.versionFacts([row.processVersionId]), this.users.cards([row.createdById])]);
    return toExtraction(row, { upload, version: facts.get(row.processVersionId)!, users });
  }

  /** The viewer's extractions (a maintainer's: everyone's), newest first. */
  async list(user: Account): Promise<ExtractionSummary[]> {
    const rows = await this.rows.find({ where: isProcessMaintainer(user) ? {} : { createdById: user.id }, order: { createdAt: 'DESC' }, take: LIST_LIMIT });
    const uploads = await this.uploads.find({ select: { id: true, fileName: true }, where: { id: In([...new Set(rows.map((r) => r.uploadId))]) } });
    const names = new Map(uploads.map((u) => [u.id, u.fileName]));
    const [facts, users] = await Promise.all([this.processes.versionFacts(rows.map((r) => r.processVersionId)), this.users.cards(rows.map((r) => r.createdById))]);
    return rows.map((row) => toExtractionSummary(row, names.get(row.uploadId) ?? null, facts.get(row.processVersionId)!, users));
  }

  /** The curves with the fit at every point, as stored JSON text; 409 EXTRACTION_NOT_DONE before the fit has ended. */
  async curves(id: string, user: Account): Promise<string> {
    const row = await this.visible(id, user);
    if (row.curves === null) throw conflict('EXTRACTION_NOT_DONE', `This extraction is ${row.status}; its curves come with its result`);
    return row.curves;
  }

  /** The uploaded file as it came. */
  async uploadedFile(id: string, user: Account): Promise<{ fileName: string; content: Buffer }> {
    const row = await this.visible(id, user);
    const upload = await this.uploads.findOneByOrFail({ id: row.uploadId });
    return { fileName: upload.fileName, content: upload.content };
  }

  /**
   * Stops a queued or running fit (nothing of it is kept); 409 EXTRACTION_FINISHED once it has ended. A running fit
   * that has not reached its worker yet shows cancelRequested and ends cancelled when it does.
   */
  async cancel(id: string, user: Account): Promise<Extraction> {
    const row = await this.visible(id, user);
    const ended = () => conflict('EXTRACTION_FINISHED', `This extraction has ended (${row.status}); there is nothing to cancel`);
    if (row.status === 'queued') {
      const cancelled = await this.store.end(id, 'queued', { status: 'cancelled', code: 'EXTRACTION_CANCELLED', message: 'Cancelled before it started' });
      // A worker claimed it meanwhile: cancel the run instead.
      if (!cancelled) return this.cancel(id, user);
    } else if (row.status === 'running') {
      await this.store.requestCancel(id);
      await this.runner.cancel(id);
    } else {
      throw ended();
    }
    const now = await this.rows.findOneByOrFail({ id });
    if (now.status === 'done' || now.status === 'failed') {
      row.status = now.status;
      throw ended();
    }
    return this.get(id, user);
  }

  /**
   * Saves a finished fit as a new version of its base profile (the caller checks maintainers): the polarity's parameters
   * replaced by the fitted ones, the extraction's id in the version's message, an audit row with the values before and
   * after, and the extraction marked, all in one transaction.
   */
  async save(id: string, request: SaveExtractionRequest, user: Account): Promise<ProcessProfile> {
    const row = await this.visible(id, user);
    if (row.status !== 'done' || row.result === null) throw conflict('EXTRACTION_NOT_DONE', `This extraction is ${row.status}; only a finished fit can be saved`);
    if (row.savedVersion !== null) throw conflict('EXTRACTION_ALREADY_SAVED', `This fit was saved as version ${row.savedVersion} already`);
    const result = JSON.parse(row.result) as ExtractionResultResponse;
    const base = await this.processes.resolveVersion(row.processVersionId);
    const facts = (await this.processes.versionFacts([row.processVersionId])).get(row.processVersionId)!;
    if (facts.latestVersion !== base.version) {
      throw conflict(
        'STALE_EDIT',
        `${base.name} has version ${facts.latestVersion}, newer than version ${base.version} this fit started from; nothing was saved. Re-run the fit on version ${facts.latestVersion}.`,
        'version',
      );
    }
    const definition = processSchema.safeParse({ ...base.definition, [row.polarity]: { ...base.definition[row.polarity], ...result.fitted } });
    if (!definition.success) {
      const problems = definition.error.issues.map((issue) => ({ field: issue.path.join('.'), message: `The fitted ${String(issue.path.at(-1) ?? 'value')} is not accepted: ${issue.message}` }));
      throw new DomainError('VALIDATION_FAILED', 'A fitted value lies outside what a profile accepts; nothing was saved', 400, problems[0]?.field, problems);
    }
    const source = uploadSource(await this.uploadFacts(row.uploadId));
    const note = `(extraction ${row.id}, ${result.model} fit of the ${row.polarity.toUpperCase()})`;
    const message = `${request.message ?? `Parameters fitted to ${source.table ? `the ${source.table.corner} lines of a characterised table of ${source.table.processName} version ${source.table.version}` : 'measured curves'}`} ${note}`.slice(0, 500);
    const saved = await this.unitOfWork.run(async (manager) => {
      const version = await this.processes.appendVersionIn(manager, base.profileId, { baseVersion: base.version, definition: definition.data, message }, user);
      const marked = await manager.getRepository(ExtractionEntity).update({ id: row.id, savedVersion: IsNull() }, { savedProfileId: version.profileId, savedVersion: version.number });
      if (marked.affected !== 1) throw conflict('EXTRACTION_ALREADY_SAVED', 'This fit was saved meanwhile; nothing more was saved');
      await this.audit.record(manager, extractionSavedAudit(row.id, version, row.polarity, base.definition[row.polarity], result, source, user));
      return version;
    });
    return this.processes.get(saved.profileId, user, saved.number);
  }

  private async insertJob(
    rows: Repository<ExtractionEntity>,
    job: Pick<ExtractionEntity, 'uploadId' | 'processVersionId' | 'polarity' | 'createdById' | 'rerunOfId'> & { options: ExtractionOptions },
  ): Promise<string> {
    const saved = await rows.save(
      rows.create({ ...job, options: JSON.stringify(job.options), status: 'queued', iterations: 0, maxIterations: job.options.maxIterations * FIT_STAGES[job.options.model], attempts: 0, cancelRequested: false }),
    );
    return saved.id;
  }

  /** An extraction the user may see: theirs, or any for a process maintainer; 404 EXTRACTION_NOT_FOUND otherwise. */
  private async visible(id: string, user: Account): Promise<ExtractionEntity> {
    const row = await this.rows.findOneBy({ id });
    if (!row || !(isProcessMaintainer(user) || row.createdById === user.id)) throw notFound('EXTRACTION_NOT_FOUND', 'There is no extraction with this id');
    return row;
  }

  private uploadFacts(id: string): Promise<UploadFacts> {
    return this.uploads.findOneOrFail({ select: UPLOAD_FACTS, where: { id } });
  }
}
