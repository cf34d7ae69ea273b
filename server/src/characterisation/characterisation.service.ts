import { designChart } from '@channelwright/shared/device';
import { parseModelCard } from '@channelwright/shared/model-card';
import type { CharacterisationJob, CharacterisationRequest, CharacterisationTable, DesignChart, DesignChartQuery } from '@channelwright/shared/schemas';
import { Inject, Injectable } from '@nestjs/common';
import { conflict, DomainError, notFound } from '../common/errors/domain-error.js';
import { AppConfigService } from '../config/app-config.service.js';
import type { ProcessViewer } from '../processes/process-visibility.js';
import { ProcessesService, type ResolvedProcess } from '../processes/processes.service.js';
import { UsersService } from '../users/users.service.js';
import type { CharacterisationJobEntity } from './jobs/characterisation-job.entity.js';
import { CharacterisationJobStore } from './jobs/characterisation-job-store.js';
import { planCharacterisation, planHash } from './jobs/characterisation-plan.js';
import { JOB_QUEUE, type JobQueue } from './jobs/job-queue.js';
import { toJob } from './jobs/job-response.js';
import { CharacterisationTables, tableRefOf } from './tables/characterisation-tables.service.js';
import { chartConditions } from './tables/chart-conditions.js';

/** How long a cancel waits for the job's server to stop it before answering, ms. */
const CANCEL_WAIT_MS = 10_000;

const jobNotFound = () => notFound('CHARACTERISATION_NOT_FOUND', 'There is no characterisation with this id');

/**
 * Characterisations of process versions: start one (or find the same version and grid started already), follow it,
 * cancel it; the tables of a version and their design charts. Who may read a job or a table is who may read its
 * process (ProcessVisibility: 404 to others); callers check that only maintainers start and cancel.
 */
@Injectable()
export class CharacterisationService {
  constructor(
    private readonly store: CharacterisationJobStore,
    private readonly processes: ProcessesService,
    private readonly users: UsersService,
    private readonly tables: CharacterisationTables,
    private readonly config: AppConfigService,
    @Inject(JOB_QUEUE) private readonly queue: JobQueue,
  ) {}

  /** A new queued job, or (created false) the queued, running or finished one of the same version and grid. */
  async request(request: CharacterisationRequest, requester: ProcessViewer & { id: string }): Promise<{ job: CharacterisationJob; created: boolean }> {
    const version = await this.version(request.processId, request.version, requester);
    if (!version.card) {
      throw conflict('PROCESS_HAS_NO_MODEL_CARD', `${version.name} version ${version.version} has no model card: upload one as a new version first`, 'version');
    }
    const plan = planCharacterisation(version.definition, parseModelCard(version.card.text), version.card.mapping, request, this.config.characterisation.maxPoints);
    const { job, created } = await this.store.insertQueued({ processVersionId: version.versionId, gridHash: planHash(plan), plan, requestedById: requester.id });
    if (created) await this.queue.enqueue(job.id);
    return { job: (await this.present([job]))[0], created };
  }

  async get(id: string, viewer: ProcessViewer): Promise<CharacterisationJob> {
    return (await this.present([await this.visibleJob(id, viewer)]))[0];
  }

  /** Cancels a queued or running job (a running one once its server has stopped it); 409 CHARACTERISATION_FINISHED for a finished one. */
  async cancel(id: string, viewer: ProcessViewer): Promise<CharacterisationJob> {
    const job = await this.visibleJob(id, viewer);
    if (job.status === 'queued' && (await this.store.end(id, null, { status: 'cancelled', code: 'CHARACTERISATION_CANCELLED', message: 'The characterisation was cancelled before it started' }))) {
      return this.get(id, viewer);
    }
    const now = (await this.store.get(id)) ?? job;
    if (now.status !== 'running' && now.status !== 'queued') throw conflict('CHARACTERISATION_FINISHED', `This characterisation has ${now.status === 'done' ? 'finished' : now.status}; there is nothing to cancel`, 'id');
    await this.store.requestCancel(id);
    await this.queue.cancel(id);
    for (const deadline = Date.now() + CANCEL_WAIT_MS; Date.now() < deadline; ) {
      if ((await this.store.get(id))?.status !== 'running') break;
      await new Promise((resolve) => setTimeout(resolve, 100));
    }
    return this.get(id, viewer);
  }

  /** The jobs of a version, newest first. */
  async list(processId: string, versionNumber: number | undefined, viewer: ProcessViewer): Promise<CharacterisationJob[]> {
    const version = await this.version(processId, versionNumber, viewer);
    return this.present(await this.store.listByVersions([version.versionId]));
  }

  /** The stored tables of a version (of finished jobs), the current one of each device first. */
  async tablesOf(processId: string, versionNumber: number | undefined, viewer: ProcessViewer): Promise<CharacterisationTable[]> {
    const version = await this.version(processId, versionNumber, viewer);
    const tables = await this.tables.tablesOf([version.versionId]);
    return tables
      .toSorted((a, b) => Number(b.current) - Number(a.current))
      .map(({ row, current }) => ({
        ...tableRefOf(row),
        processId: version.profileId,
        version: version.version,
        polarity: row.polarity,
        flavour: row.flavour === '' ? null : row.flavour,
        points: row.points,
        size: row.size,
        storedBytes: row.storedBytes,
        grid: this.tables.gridOf(row),
        current,
        createdAt: row.createdAt.toISOString(),
      }));
  }

  /** The design charts of a device of a version from its current table. */
  async designChart(processId: string, query: DesignChartQuery, viewer: ProcessViewer): Promise<DesignChart> {
    const version = await this.version(processId, query.version, viewer);
    const device = { polarity: query.polarity, flavour: query.flavour };
    const source = await this.tables.tableSource(version.versionId, [device]);
    const choice = source(device);
    const conditions = chartConditions(choice.prepared.grid, version.definition, query);
    const chart = designChart(choice.prepared, conditions);
    const { grid } = choice.prepared;
    return {
      processId: version.profileId,
      version: version.version,
      polarity: query.polarity,
      flavour: query.flavour ?? null,
      table: choice.ref,
      ...conditions,
      ...chart,
      axes: { corners: grid.corners, temperatures: grid.temperatures, vds: grid.vds, vsb: grid.vsb, lengths: grid.lengths },
    };
  }

  /** The version a request names, if the viewer may see its profile; a missing version is named by the field "version". */
  private async version(processId: string, version: number | undefined, viewer: ProcessViewer): Promise<ResolvedProcess> {
    try {
      return await this.processes.resolveDefinition(processId, version, undefined, viewer);
    } catch (error) {
      if (error instanceof DomainError && error.field === 'processVersion') throw new DomainError(error.code, error.message, error.status, 'version');
      throw error;
    }
  }

  private async visibleJob(id: string, viewer: ProcessViewer): Promise<CharacterisationJobEntity> {
    const job = await this.store.get(id);
    if (!job) throw jobNotFound();
    const { profileId } = await this.processes.resolveVersion(job.processVersionId);
    try {
      await this.processes.resolveDefinition(profileId, undefined, undefined, viewer);
    } catch (error) {
      if (error instanceof DomainError && error.code === 'PROCESS_NOT_FOUND') throw jobNotFound();
      throw error;
    }
    return job;
  }

  private async present(jobs: CharacterisationJobEntity[]): Promise<CharacterisationJob[]> {
    const versions = new Map<string, ResolvedProcess>();
    for (const id of new Set(jobs.map((job) => job.processVersionId))) versions.set(id, await this.processes.resolveVersion(id));
    const users = await this.users.cards(jobs.map((job) => job.requestedById));
    const tables = await this.store.tablesOfJobs(jobs.map((job) => job.id));
    return jobs.map((job) => {
      const version = versions.get(job.processVersionId) as ResolvedProcess;
      return toJob(job, { profileId: version.profileId, name: version.name, version: version.version }, users, tables);
    });
  }
}

