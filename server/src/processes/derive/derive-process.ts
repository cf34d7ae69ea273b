import type { DeriveProcessRequest, DeriveProcessResponse } from '@channelwright/shared/schemas';
import { deriveProcessParameters } from '@channelwright/shared/device';
import { DERIVE_CONSTANTS, DERIVE_EQUATIONS } from './physical-constants.js';

/** POST /api/processes/derive: the engine's deriveProcessParameters, with VT0 only when a flat-band voltage was given. */
export function deriveProcess(request: DeriveProcessRequest): DeriveProcessResponse {
  const { vt0, vtTc, kp, flatBand: _assumedFlatBand, ...derived } = deriveProcessParameters(request);
  return {
    ...derived,
    ...(request.flatBand !== undefined && { vt0, vtTc }),
    ...(kp !== undefined && { kp }),
    temperature: request.temperature,
    equations: [...DERIVE_EQUATIONS],
    constants: [...DERIVE_CONSTANTS],
  };
}
