import type { DeviceParams } from '../schemas/process.js';
import type { ModelAccuracy } from '../schemas/operating-point.js';
import type { CurrentModel } from './drain-current.js';
import { hasShortChannelTerms } from './short-channel.js';

/**
 * What is known of how far a model's sizing is off, said on every result (measured, docs/model.md and
 * docs/extraction.md): the square law and the long-channel all-region model against a realistic short-channel
 * device, the all-region model with fitted short-channel terms against the card it was fitted to.
 */
export function modelAccuracyOf(model: CurrentModel, params: Pick<DeviceParams, 'dl' | 'dw' | 'theta0' | 'theta1' | 'theta2' | 'thetaB' | 'dibl' | 'pclm' | 'muExpL' | 'vtl' | 'nl'>): ModelAccuracy {
  if (model === 'square-law') {
    return {
      basis: 'long-channel',
      summary: 'SPICE level 1 (long channel): against a 180 nm-class BSIM4 device, W at gm/ID 5 … 20 S/A was off by −55 … +71 %; strong inversion only',
    };
  }
  if (hasShortChannelTerms(params)) {
    return {
      basis: 'fitted',
      summary: 'EKV with short-channel terms fitted to a model card: W at gm/ID 5 … 20 S/A within −8 … +8 % of the BSIM4 card it was fitted to (L = lmin … 10·lmin); VT from a first-order law',
    };
  }
  return {
    basis: 'long-channel',
    summary: 'EKV long channel, not fitted to short-channel effects: against a 180 nm-class BSIM4 device, W at gm/ID 5 … 20 S/A was off by tens of per cent; fit the profile or use the lookup tables',
  };
}
