import { k, q } from '../units/constants.js';
import { EngineError } from './errors.js';

/** UT = kT/q in volts, T in kelvin, with the exact SI 2019 k and q. T ≤ 0 K has no answer: EngineError. */
export function thermalVoltage(tempK: number): number {
  if (!(tempK > 0)) throw new EngineError('TEMPERATURE_BELOW_ABSOLUTE_ZERO', `Temperature must be above 0 K (−273.15 °C), got ${tempK} K`, 'temperature');
  return (k * tempK) / q;
}
