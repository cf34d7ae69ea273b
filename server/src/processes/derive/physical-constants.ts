import type { PhysicalConstant } from '@channelwright/shared/schemas';
import { INTRINSIC_CARRIER_DENSITY_300K } from '@channelwright/shared/device';
import { epsilon0, epsilonRSi, epsilonRSiO2, k, q } from '@channelwright/shared/units';

/** The constants the physics helper uses (values from the shared engine), with their sources, as the answer lists them. */
export const DERIVE_CONSTANTS: readonly PhysicalConstant[] = [
  { symbol: 'k', name: 'Boltzmann constant', value: k, unit: 'J/K', source: 'exact; BIPM, The International System of Units (SI Brochure), 9th ed., 2019' },
  { symbol: 'q', name: 'elementary charge', value: q, unit: 'C', source: 'exact; BIPM, The International System of Units (SI Brochure), 9th ed., 2019' },
  {
    symbol: 'ε0',
    name: 'vacuum permittivity',
    value: epsilon0,
    unit: 'F/m',
    source: 'Tiesinga, Mohr, Newell, Taylor, "CODATA recommended values of the fundamental physical constants: 2018", Rev. Mod. Phys. 93, 025010 (2021)',
  },
  { symbol: 'εr(SiO2)', name: 'relative permittivity of SiO2', value: epsilonRSiO2, unit: '', source: 'Sze & Ng, Physics of Semiconductor Devices, 3rd ed., Wiley, 2007' },
  {
    symbol: 'εr(Si)',
    name: 'relative permittivity of silicon',
    value: epsilonRSi,
    unit: '',
    source: 'Tsividis & McAndrew, Operation and Modeling of the MOS Transistor, 3rd ed., Oxford UP, 2011 (the SPICE value; Sze & Ng 2007 list 11.9)',
  },
  {
    symbol: 'ni(300 K)',
    name: 'intrinsic carrier density of silicon at 300 K',
    value: INTRINSIC_CARRIER_DENSITY_300K,
    unit: 'm⁻³',
    source: 'Sproul & Green, "Improved value for the silicon intrinsic carrier concentration from 275 to 375 K", J. Appl. Phys. 70, 846 (1991); scaled to T as T^1.5·exp(−Eg/2kT)',
  },
];

/** The equations of the answer, in words a designer reads; the engine (shared/src/device/derive-process.ts) computes them. */
export const DERIVE_EQUATIONS: readonly string[] = [
  'Cox = εr(SiO2)·ε0 / tox',
  'φF = (kT/q)·ln(NA/ni), 2φF = 2·φF',
  'γ = √(2·q·εr(Si)·ε0·NA) / Cox',
  'n = 1 + γ / (2·√(2φF))',
  'Wdep = √(2·εr(Si)·ε0·2φF / (q·NA))',
  'VT0 = VFB + 2φF + γ·√(2φF) (when VFB is given)',
  'kp = µ·Cox (when µ is given)',
  'Long-channel textbook equations: Tsividis & McAndrew 2011, ch. 2–4; Sze & Ng 2007, ch. 6',
];
