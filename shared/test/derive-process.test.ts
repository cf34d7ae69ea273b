import { describe, expect, it } from 'vitest';
import { INTRINSIC_CARRIER_DENSITY_300K, deriveProcessParameters, intrinsicCarrierDensity, siliconBandgap } from '../src/device/index.js';

// Long-channel equations (Tsividis & McAndrew, Operation and Modeling of the MOS Transistor, 3rd ed., 2011, ch. 2–4;
// Sze & Ng, Physics of Semiconductor Devices, 3rd ed., 2007, ch. 6): φF = UT·ln(NA/ni), γ = √(2qεSi·NA)/Cox.
// ni(300 K) = 1.0e10 cm⁻³: A. B. Sproul, M. A. Green, J. Appl. Phys. 70, 846 (1991). εr(Si) = 11.7.
const cm3 = 1e6; // 1 cm⁻³ in m⁻³
const at300K = 300 - 273.15;

describe('deriveProcessParameters', () => {
  it('names its ni: 1.0e10 cm⁻³ at 300 K (Sproul & Green 1991)', () => {
    expect(INTRINSIC_CARRIER_DENSITY_300K).toBe(1.0e10 * cm3);
    expect(intrinsicCarrierDensity(300)).toBe(1.0e10 * cm3);
  });

  it('gives 2φF = 0.83337 V for NA = 1e17 cm⁻³ and 0.71432 V for NA = 1e16 cm⁻³ at 300 K', () => {
    expect(deriveProcessParameters({ tox: 10e-9, substrateDoping: 1e17 * cm3, temperature: at300K }).twoPhiF).toBeCloseTo(0.83337, 5);
    expect(deriveProcessParameters({ tox: 10e-9, substrateDoping: 1e16 * cm3, temperature: at300K }).twoPhiF).toBeCloseTo(0.71432, 5);
  });

  it('gives γ = 0.52762 √V (10 nm) and 0.21105 √V (4 nm) for NA = 1e17 cm⁻³, and 0.16685 √V (10 nm) for 1e16', () => {
    expect(deriveProcessParameters({ tox: 10e-9, substrateDoping: 1e17 * cm3 }).gamma).toBeCloseTo(0.52762, 5);
    expect(deriveProcessParameters({ tox: 4e-9, substrateDoping: 1e17 * cm3 }).gamma).toBeCloseTo(0.21105, 5);
    expect(deriveProcessParameters({ tox: 10e-9, substrateDoping: 1e16 * cm3 }).gamma).toBeCloseTo(0.16685, 5);
  });

  it('gives Cox, the depletion width 103.81 nm and n = 1 + Cdep/Cox = 1.2890 at NA = 1e17 cm⁻³, 10 nm', () => {
    const derived = deriveProcessParameters({ tox: 10e-9, substrateDoping: 1e17 * cm3, temperature: at300K });
    expect(derived.cox).toBeCloseTo(3.453133e-3, 8);
    expect(derived.depletionWidth * 1e9).toBeCloseTo(103.81, 2);
    expect(derived.n).toBeCloseTo(1.289, 4);
  });

  it('derives VT0 = VFB + 2φF + γ√(2φF) for an n+ poly gate, VFB = −(Eg/2 + φF), and its temperature coefficient', () => {
    // Values computed from these equations with Varshni's Eg(T) for Si (Varshni, Physica 34, 149, 1967).
    const table: [number, number, number, number][] = [[1e16, 10e-9, -0.0641, -0.999], [1e17, 10e-9, 0.3361, -1.043], [1e17, 4e-9, 0.0471, -0.786], [1e18, 4e-9, 0.5653, -0.788]];
    for (const [doping, tox, vt0, tc] of table) {
      const derived = deriveProcessParameters({ tox, substrateDoping: doping * cm3, temperature: at300K });
      expect(derived.vt0).toBeCloseTo(vt0, 4);
      expect(derived.vtTc * 1e3).toBeCloseTo(tc, 3);
    }
    expect(siliconBandgap(300)).toBeCloseTo(1.1245, 4);
  });

  it('keeps a given flat-band voltage and returns kp = µ·Cox when a mobility is given', () => {
    const derived = deriveProcessParameters({ tox: 4e-9, substrateDoping: 1e17 * cm3, flatBand: -0.9, mobility: 0.04 });
    expect(derived.vt0).toBeCloseTo(-0.9 + derived.twoPhiF + derived.gamma * Math.sqrt(derived.twoPhiF), 15);
    expect(derived.kp).toBeCloseTo(0.04 * derived.cox, 15);
  });

  it('refuses a doping below ni, naming the field', () => {
    expect(() => deriveProcessParameters({ tox: 4e-9, substrateDoping: 1e9 * cm3 })).toThrow(expect.objectContaining({ field: 'substrateDoping' }));
  });
});
