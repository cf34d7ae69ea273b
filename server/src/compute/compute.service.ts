import {
  type CornersRequestInput,
  type CornersResponse,
  type Process,
  type SizeRequestInput,
  type SizeResponse,
  type SweepRequestInput,
  type SweepResponse,
} from '@channelwright/shared/schemas';
import { computeCorners, computeSize, computeSweep } from '@channelwright/shared/device';
import { Injectable } from '@nestjs/common';
import type { ProcessViewer } from '../processes/process-visibility.js';
import { ProcessesService } from '../processes/processes.service.js';

type ProcessSource = { processId?: unknown; processVersion?: unknown };

/**
 * Thin around the engine: the engine parses the request with the shared schema (an EngineError naming
 * the field when it is wrong), checks it against the process and computes; this service only supplies
 * the stored process version when the request names a profile by id (404 PROCESS_NOT_FOUND when there is
 * none, or the caller may not see it).
 */
@Injectable()
export class ComputeService {
  constructor(private readonly processes: ProcessesService) {}

  async size(request: SizeRequestInput, viewer: ProcessViewer): Promise<SizeResponse> {
    return computeSize(request, await this.storedProcess(request, viewer));
  }

  async sweep(request: SweepRequestInput, viewer: ProcessViewer): Promise<SweepResponse> {
    return computeSweep(request, await this.storedProcess(request, viewer));
  }

  async corners(request: CornersRequestInput, viewer: ProcessViewer): Promise<CornersResponse> {
    return computeCorners(request, await this.storedProcess(request, viewer));
  }

  /** The stored definition a request names; undefined for an inline process (or a malformed id the engine will name). */
  private async storedProcess(request: ProcessSource, viewer: ProcessViewer): Promise<Process | undefined> {
    if (typeof request?.processId !== 'string' || request.processId.length === 0) return undefined;
    const version = Number.isInteger(request.processVersion) && (request.processVersion as number) > 0 ? (request.processVersion as number) : undefined;
    if (request.processVersion !== undefined && version === undefined) return undefined; // the engine's schema names processVersion
    return (await this.processes.resolveDefinition(request.processId, version, undefined, viewer)).definition;
  }
}
