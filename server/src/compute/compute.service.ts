import {
  type CornersRequestInput,
  type CornersResponse,
  type SizeRequestInput,
  type SizeResponse,
  type SweepColumnsResponse,
  type SweepRequestInput,
  type SweepResponse,
} from '@channelwright/shared/schemas';
import { computeCorners, computeSize, computeSweep, type TableSource } from '@channelwright/shared/device';
import { Injectable } from '@nestjs/common';
import { CharacterisationTables } from '../characterisation/tables/characterisation-tables.service.js';
import type { ProcessViewer } from '../processes/process-visibility.js';
import { ProcessesService, type ResolvedProcess } from '../processes/processes.service.js';
import { INLINE_SWEEP_POINTS, SweepPool, sweepPointsOf } from './sweep-pool.js';

type ProcessSource = { processId?: unknown; processVersion?: unknown; model?: unknown; compare?: unknown; polarity?: unknown; flavour?: unknown };

/**
 * Thin around the engine: the engine parses the request with the shared schema (an EngineError naming
 * the field when it is wrong), checks it against the process and computes; this service only supplies
 * the stored process version when the request names a profile by id (404 PROCESS_NOT_FOUND when there is
 * none, or the caller may not see it), and for model "table" the device's table of that version.
 */
@Injectable()
export class ComputeService {
  constructor(
    private readonly processes: ProcessesService,
    private readonly tables: CharacterisationTables,
    private readonly pool: SweepPool,
  ) {}

  async size(request: SizeRequestInput, viewer: ProcessViewer): Promise<SizeResponse> {
    const stored = await this.storedProcess(request, viewer);
    return computeSize(request, stored?.definition, await this.tablesFor(request, stored));
  }

  /**
   * A sweep; a large one (more than INLINE_SWEEP_POINTS over all series) is computed and written as JSON by a worker
   * thread and answered as those bytes. The table model stays here: its tables live in this thread's cache, and its
   * sweeps are capped lower.
   */
  async sweep(request: SweepRequestInput, viewer: ProcessViewer): Promise<SweepResponse | SweepColumnsResponse | Buffer> {
    const stored = await this.storedProcess(request, viewer);
    if (request?.model !== 'table' && sweepPointsOf(request) > INLINE_SWEEP_POINTS) return this.pool.sweepJson(request, stored?.definition);
    return computeSweep(request, stored?.definition, await this.tablesFor(request, stored));
  }

  async corners(request: CornersRequestInput, viewer: ProcessViewer): Promise<CornersResponse> {
    const stored = await this.storedProcess(request, viewer);
    return computeCorners(request, stored?.definition, await this.tablesFor(request, stored));
  }

  /** The stored version a request names; undefined for an inline process (or a malformed id the engine will name). */
  private async storedProcess(request: ProcessSource, viewer: ProcessViewer): Promise<ResolvedProcess | undefined> {
    if (typeof request?.processId !== 'string' || request.processId.length === 0) return undefined;
    const version = Number.isInteger(request.processVersion) && (request.processVersion as number) > 0 ? (request.processVersion as number) : undefined;
    if (request.processVersion !== undefined && version === undefined) return undefined; // the engine's schema names processVersion
    return this.processes.resolveDefinition(request.processId, version, undefined, viewer);
  }

  /** The table of the request's device on its stored version, when the request uses the table model (to size or to compare). */
  private async tablesFor(request: ProcessSource, stored: ResolvedProcess | undefined): Promise<TableSource | undefined> {
    if (!stored || (request.model !== 'table' && request.compare !== 'table')) return undefined;
    if (request.polarity !== 'nmos' && request.polarity !== 'pmos') return undefined; // the engine's schema names polarity
    const flavour = typeof request.flavour === 'string' ? request.flavour.trim() : undefined;
    return this.tables.tableSource(stored.versionId, [{ polarity: request.polarity, flavour }]);
  }
}
