import { parseModelCard } from '@channelwright/shared/model-card';
import { Injectable, Logger } from '@nestjs/common';
import { ModuleRef } from '@nestjs/core';
import { registeredUnder } from '../../common/extension-points.js';
import { AppConfigService } from '../../config/app-config.service.js';
import { ProcessesService } from '../../processes/processes.service.js';
import { SimulationWorkers } from '../simulation-workers.js';
import { SimulatorEngineChoice } from '../simulator-engine-choice.js';
import { characterise } from '../simulator/characterise.js';
import { CharacterisationError } from '../simulator/characterisation-error.js';
import { packTable } from '../table-storage.js';
import { TABLES_LISTENERS, type TablesListener } from '../tables/tables-listener.js';
import { CharacterisationJobStore, type Report } from './characterisation-job-store.js';
import type { PlannedDevice } from './characterisation-plan.js';
import type { StopReason } from './job-queue.js';

/** How often a running job writes its progress (and heartbeat) at most, ms. */
const REPORT_EVERY_MS = 500;
/** The estimate waits for this much running time before it is given, ms. */
const ESTIMATE_AFTER_MS = 2000;

/** A job stopped from outside: cancelled, or its server lost the job or is stopping (then nothing is written). */
class Stopped extends Error {
  constructor(readonly reason: StopReason | 'lost') {
    super(`stopped: ${reason}`);
  }
}

/**
 * Runs one claimed characterisation job (the queue's handler): per device not yet stored, simulates its grid on the
 * simulation workers, packs the table and stores it whole; then marks the job done and tells the listeners (sheets
 * waiting for these tables). Reports progress, an estimate and a heartbeat as it goes, and stops when the job is
 * cancelled or another server took it over. A failure ends the job with the simulator's message and deletes the
 * tables it had stored, in one transaction; a server stop writes nothing (the job is resumed from its stored tables).
 */
@Injectable()
export class CharacterisationRunner {
  private readonly logger = new Logger('Characterisation');

  constructor(
    private readonly store: CharacterisationJobStore,
    private readonly processes: ProcessesService,
    private readonly workers: SimulationWorkers,
    private readonly engines: SimulatorEngineChoice,
    private readonly config: AppConfigService,
    private readonly moduleRef: ModuleRef,
  ) {}

  async run(jobId: string, owner: string, signal: AbortSignal): Promise<void> {
    const job = await this.store.get(jobId);
    if (!job || job.owner !== owner) return;
    const stop = new AbortController();
    const reporter = new Reporter(this.store, jobId, owner, job.total, stop, this.config.characterisation.leaseSeconds);
    const forward = () => stop.abort(signal.reason);
    signal.addEventListener('abort', forward, { once: true });
    try {
      const version = await this.processes.resolveVersion(job.processVersionId);
      if (!version.card) throw new CharacterisationError('PROCESS_HAS_NO_MODEL_CARD', `${version.name} version ${version.version} has no model card any more`);
      const card = parseModelCard(version.card.text);
      const engine = await this.engines.engine();
      await this.store.setEngine(jobId, owner, engine);
      const plan = JSON.parse(job.plan) as PlannedDevice[];
      await this.store.discardLooseChunks(jobId);
      const stored = new Set((await this.store.storedDevices(jobId)).map((table) => `${table.polarity}/${table.flavour}`));
      reporter.begin(plan.filter((device) => stored.has(key(device))).reduce((sum, device) => sum + device.points, 0));
      for (const device of plan) {
        if (stored.has(key(device))) continue;
        const sections = Object.fromEntries(device.grid.corners.map((corner) => [corner, version.card?.mapping.corners[corner] ?? null]));
        const table = await characterise({ card, grid: device.grid, sections }, { pool: this.workers, engine, signal: stop.signal, onProgress: (p) => reporter.progress(p.done) });
        reporter.deviceDone(device.points);
        const packed = await packTable(table);
        if (stop.signal.aborted) throw new Stopped(stopReason(stop.signal));
        if (!(await this.store.insertTable(jobId, owner, device, packed))) throw new Stopped('lost');
        this.logger.log(`Characterisation ${jobId}: ${device.model} done (${device.points.toLocaleString('en')} points, ${engine})`);
      }
      reporter.close();
      if (!(await this.store.finish(jobId, owner))) return;
      this.logger.log(`Characterisation ${jobId} of ${version.name} version ${version.version} done`);
      await this.tell(job.processVersionId);
    } catch (error) {
      reporter.close();
      await this.end(jobId, owner, error, stop.signal);
    } finally {
      signal.removeEventListener('abort', forward);
    }
  }

  private async end(jobId: string, owner: string, error: unknown, signal: AbortSignal): Promise<void> {
    const reason = error instanceof Stopped ? error.reason : signal.aborted ? stopReason(signal) : null;
    if (reason === 'shutdown' || reason === 'lost') return;
    if (reason === 'cancel') {
      await this.store.end(jobId, owner, { status: 'cancelled', code: 'CHARACTERISATION_CANCELLED', message: 'The characterisation was cancelled; nothing was kept' });
      return;
    }
    const code = error instanceof CharacterisationError ? error.code : 'SIMULATION_FAILED';
    const message = error instanceof Error ? error.message : String(error);
    this.logger.warn(`Characterisation ${jobId} failed: ${message}`);
    await this.store.end(jobId, owner, { status: 'failed', code, message: `${message}; nothing was kept` });
  }

  private async tell(processVersionId: string): Promise<void> {
    for (const listener of registeredUnder<TablesListener>(this.moduleRef, TABLES_LISTENERS)) {
      try {
        await listener.tablesChanged(processVersionId);
      } catch (error) {
        this.logger.error(`A listener of new tables failed: ${error instanceof Error ? error.message : String(error)}`);
      }
    }
  }
}

function key(device: PlannedDevice): string {
  return `${device.polarity}/${device.flavour ?? ''}`;
}

function stopReason(signal: AbortSignal): StopReason | 'lost' {
  return signal.reason === 'cancel' || signal.reason === 'lost' ? signal.reason : 'shutdown';
}

/**
 * Writes a running job's progress and estimate at most every REPORT_EVERY_MS, and a heartbeat at least every third
 * of the lease (a long table write still keeps the job), and stops the run when the job was cancelled or taken over.
 */
class Reporter {
  private finished = 0;
  private current = 0;
  private startDone = 0;
  private readonly startedAt = Date.now();
  private lastReport = 0;
  private reporting: Promise<void> | null = null;
  private readonly heartbeat: NodeJS.Timeout;

  constructor(
    private readonly store: CharacterisationJobStore,
    private readonly jobId: string,
    private readonly owner: string,
    private readonly total: number,
    private readonly stop: AbortController,
    leaseSeconds: number,
  ) {
    this.heartbeat = setInterval(() => this.report(), Math.max(200, (leaseSeconds * 1000) / 3));
    this.heartbeat.unref();
  }

  /** Points of the devices stored before this run (a resumed job). */
  begin(done: number): void {
    this.finished = done;
    this.startDone = done;
    this.report();
  }

  progress(doneInDevice: number): void {
    this.current = doneInDevice;
    if (Date.now() - this.lastReport >= REPORT_EVERY_MS) this.report();
  }

  deviceDone(points: number): void {
    this.finished += points;
    this.current = 0;
  }

  close(): void {
    clearInterval(this.heartbeat);
  }

  private report(): void {
    if (this.reporting || this.stop.signal.aborted) return;
    this.lastReport = Date.now();
    const done = this.finished + this.current;
    const elapsed = Date.now() - this.startedAt;
    const rate = (done - this.startDone) / elapsed;
    const etaSeconds = elapsed >= ESTIMATE_AFTER_MS && rate > 0 ? Math.round((this.total - done) / rate / 1000) : null;
    this.reporting = this.store
      .report(this.jobId, this.owner, { done, etaSeconds })
      .then((answer: Report) => {
        if (answer !== 'go-on') this.stop.abort(answer);
      })
      .catch(() => undefined)
      .finally(() => {
        this.reporting = null;
      });
  }
}
