import { epsilon0, epsilonRSi, k, q } from '../units/constants.js';
import { celsiusToKelvin } from '../units/temperature.js';
import { oxideCapacitance } from './capacitance.js';
import { EngineError } from './errors.js';
import { thermalVoltage } from './thermal-voltage.js';

/**
 * Intrinsic carrier density of silicon at 300 K: 1.0e10 cm⁻³ = 1.0e16 m⁻³. A. B. Sproul, M. A. Green,
 * "Improved value for the silicon intrinsic carrier concentration from 275 to 375 K", J. Appl. Phys. 70,
 * 846 (1991). (SPICE uses the older 1.45e10 cm⁻³ of Sze 1981, which gives a 2φF about 20 mV lower.)
 */
export const INTRINSIC_CARRIER_DENSITY_300K = 1.0e16;

/**
 * Band gap of silicon in eV, Varshni's law Eg(T) = 1.17 − 4.73e-4·T²/(T + 636) (Y. P. Varshni, Physica 34,
 * 149, 1967; silicon coefficients as tabulated in Sze & Ng, Physics of Semiconductor Devices, 3rd ed., 2007).
 */
export function siliconBandgap(tempK: number): number {
  return 1.17 - (4.73e-4 * tempK * tempK) / (tempK + 636);
}

/** ni(T) = ni(300 K)·(T/300)^1.5·exp(Eg(300)/(2k·300) − Eg(T)/(2kT)), m⁻³ (effective densities of states ∝ T^1.5). */
export function intrinsicCarrierDensity(tempK: number): number {
  const exponent = (q / (2 * k)) * (siliconBandgap(300) / 300 - siliconBandgap(tempK) / tempK);
  return INTRINSIC_CARRIER_DENSITY_300K * (tempK / 300) ** 1.5 * Math.exp(exponent);
}

export interface DeriveInputs {
  /** Oxide thickness, m. */
  tox: number;
  /** Substrate (body) doping NA for NMOS, ND for PMOS, m⁻³ (1e17 cm⁻³ = 1e23 m⁻³). */
  substrateDoping: number;
  /**
   * Flat-band voltage, V, polarity-normalised, held constant with temperature. When absent: a gate of
   * the channel's type (n+ poly on p-Si for NMOS, p+ poly on n-Si for PMOS) without oxide charge,
   * VFB = −(Eg/2 + φF), which follows Eg(T) and φF(T).
   */
  flatBand?: number;
  /** Channel mobility, m²/(V·s) (e.g. 0.04 for 400 cm²/Vs); when given, kp = µ·Cox is returned. */
  mobility?: number;
  /** °C; default 27 (SPICE's tnom). */
  temperature?: number;
}

export interface DerivedParameters {
  /** F/m² */
  cox: number;
  /** √V */
  gamma: number;
  /** V */
  phiF: number;
  twoPhiF: number;
  /** V, polarity-normalised (enhancement > 0). */
  flatBand: number;
  /** VT0 = VFB + 2φF + γ·√(2φF), V. */
  vt0: number;
  /** dVT0/dT by central difference over ±0.5 K, V/K. */
  vtTc: number;
  /** Slope factor 1 + γ/(2√(2φF)) at VSB = 0. */
  n: number;
  /** Depletion width at 2φF, m. */
  depletionWidth: number;
  /** ni at this temperature, m⁻³. */
  ni: number;
  /** µ·Cox when a mobility was given, A/V². */
  kp?: number;
}

/**
 * Long-channel parameters from oxide thickness and doping (Tsividis & McAndrew 2011, ch. 2–4;
 * Sze & Ng 2007, ch. 6): Cox = εox/tox, φF = UT·ln(NA/ni), γ = √(2·q·εSi·NA)/Cox (εr(Si) = 11.7),
 * VT0 = VFB + 2φF + γ√(2φF), Wdep = √(2·εSi·2φF/(q·NA)), n = 1 + γ/(2√(2φF)) = 1 + Cdep/Cox.
 */
export function deriveProcessParameters(inputs: DeriveInputs): DerivedParameters {
  const { tox, substrateDoping, flatBand, mobility } = inputs;
  if (!(tox > 0)) throw new EngineError('VALIDATION_FAILED', 'tox must be above 0 m', 'tox');
  const tempK = celsiusToKelvin(inputs.temperature ?? 27);
  const at = (t: number) => {
    const ni = intrinsicCarrierDensity(t);
    if (!(substrateDoping > ni)) throw new EngineError('VALIDATION_FAILED', `The doping must be above ni = ${ni.toPrecision(3)} m⁻³`, 'substrateDoping');
    const phiF = thermalVoltage(t) * Math.log(substrateDoping / ni);
    const vfb = flatBand ?? -(siliconBandgap(t) / 2 + phiF);
    return { ni, phiF, vfb, vt0: vfb + 2 * phiF + gamma * Math.sqrt(2 * phiF) };
  };
  const cox = oxideCapacitance(tox);
  const epsSi = epsilonRSi * epsilon0;
  const gamma = Math.sqrt(2 * q * epsSi * substrateDoping) / cox;
  const here = at(tempK);
  const twoPhiF = 2 * here.phiF;
  return {
    cox,
    gamma,
    phiF: here.phiF,
    twoPhiF,
    flatBand: here.vfb,
    vt0: here.vt0,
    vtTc: at(tempK + 0.5).vt0 - at(tempK - 0.5).vt0,
    n: 1 + gamma / (2 * Math.sqrt(twoPhiF)),
    depletionWidth: Math.sqrt((2 * epsSi * twoPhiF) / (q * substrateDoping)),
    ni: here.ni,
    ...(mobility === undefined ? {} : { kp: mobility * cox }),
  };
}
