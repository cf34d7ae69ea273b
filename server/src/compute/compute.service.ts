import {
  type CornersRequestInput,
  type CornersResponse,
  type SizeRequestInput,
  type SizeResponse,
  type SweepRequestInput,
  type SweepResponse,
} from '@channelwright/shared/schemas';
import { computeCorners, computeSize, computeSweep } from '@channelwright/shared/device';
import { Injectable } from '@nestjs/common';

/**
 * Thin around the engine: the engine parses the request with the shared schema (an EngineError naming
 * the field when it is wrong), checks it against the process and computes; this service only supplies
 * the stored process when the request names one by id.
 */
@Injectable()
export class ComputeService {
  size(request: SizeRequestInput): SizeResponse {
    return computeSize(request);
  }

  sweep(request: SweepRequestInput): SweepResponse {
    return computeSweep(request);
  }

  corners(request: CornersRequestInput): CornersResponse {
    return computeCorners(request);
  }
}
