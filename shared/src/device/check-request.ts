import type { ComputeRequest } from '../schemas/compute.js';
import type { Process } from '../schemas/process.js';
import { EngineError } from './errors.js';
import { cornerShiftOf, deviceParamsOf } from './resolve-device.js';
import { say, voltageNames } from './say.js';

/**
 * Checks what needs the process: corner names (field "corner" or "corners.<i>"), the flavour and its
 * polarity, VSB above −2φF, L at least lmin. Throws EngineError with the field.
 */
export function checkRequestAgainstProcess(request: ComputeRequest, process: Process): void {
  const params = deviceParamsOf(process, request.polarity, request.flavour);
  if ('corner' in request && request.corner !== undefined) cornerShiftOf(process, request.polarity, request.corner, 'corner');
  const corners = 'corners' in request ? request.corners : undefined;
  corners?.forEach((name, index) => cornerShiftOf(process, request.polarity, name, `corners.${index}`));
  const { vsb } = voltageNames(request.polarity);
  if (!(request.vsb > -params.twoPhiF)) {
    throw new EngineError('VSB_BEYOND_FORWARD_LIMIT', `${vsb} = ${say(request.vsb, 'V')} is at or beyond −2φF = ${say(-params.twoPhiF, 'V')}: the source–body junction is forward-biased past where the model has an answer`, 'vsb');
  }
  if (request.l < params.lmin) {
    throw new EngineError('L_BELOW_LMIN', `L = ${say(request.l, 'm')} is below the process minimum ${say(params.lmin, 'm')}`, 'l');
  }
}
