import { formatQuantity } from '../units/format-quantity.js';

/** A number with its unit for a sentence: "20 µA", "0.45 V". */
export function say(value: number, unit: string): string {
  return formatQuantity(value, unit, { digits: 4 });
}

/** gm/ID for a sentence: "25.3 /V". */
export function sayGmId(value: number): string {
  return `${formatQuantity(value, '', { digits: 4 })} /V`;
}
