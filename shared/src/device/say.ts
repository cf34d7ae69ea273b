import { formatQuantity } from '../units/format-quantity.js';

/** A number with its unit for a sentence: "20 µA", "0.45 V". */
export function say(value: number, unit: string): string {
  return formatQuantity(value, unit, { digits: 4 });
}

/** gm/ID for a sentence: "25.3 /V". */
export function sayGmId(value: number): string {
  return `${formatQuantity(value, '', { digits: 4 })} /V`;
}

/** The names a designer uses for the polarity-normalised voltages: VGS, VDS, VSB for NMOS; VSG, VSD, VBS for PMOS. */
export function voltageNames(polarity: 'nmos' | 'pmos'): { vgs: string; vds: string; vsb: string; vdsat: string } {
  return polarity === 'pmos' ? { vgs: 'VSG', vds: 'VSD', vsb: 'VBS', vdsat: 'VSDsat' } : { vgs: 'VGS', vds: 'VDS', vsb: 'VSB', vdsat: 'VDSsat' };
}
