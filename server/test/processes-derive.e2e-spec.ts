import { deriveProcessResponseSchema, type DeriveProcessResponse } from '@channelwright/shared/schemas';
import { DEMO_ACCOUNTS } from '../src/seed/demo-accounts.js';
import { bearer, createTestApp, type TestApp } from './helpers/test-app.js';

// Constants written out here, not imported from the product, so the product's own are checked against them.
// k and q: exact, BIPM, The International System of Units (SI Brochure), 9th ed., 2019, table 1.
const K_BOLTZMANN = 1.380649e-23;
const Q_ELEMENTARY = 1.602176634e-19;
// ε0: Tiesinga, Mohr, Newell, Taylor, "CODATA recommended values of the fundamental physical constants: 2018", Rev. Mod. Phys. 93, 025010 (2021).
const EPSILON_0 = 8.8541878128e-12;
// εr(SiO2) = 3.9: Sze & Ng, Physics of Semiconductor Devices, 3rd ed., 2007 (from memory).
const EPSILON_R_SIO2 = 3.9;
// εr(Si) = 11.7: Tsividis & McAndrew, Operation and Modeling of the MOS Transistor, 3rd ed., 2011 (from memory; Sze & Ng 2007 list 11.9).
const EPSILON_R_SI = 11.7;
// ni(300 K) = 1.0e10 cm⁻³: Sproul & Green, J. Appl. Phys. 70, 846 (1991).
const NI_300K_PER_M3 = 1.0e10 * 1e6;

const T_KELVIN = 300;
const AT_300K_CELSIUS = T_KELVIN - 273.15;
const UT = (K_BOLTZMANN * T_KELVIN) / Q_ELEMENTARY;
const PER_CM3 = 1e6; // 1 cm⁻³ = 1e6 m⁻³

// Long-channel textbook equations: Tsividis & McAndrew 2011, ch. 2–3; Sze & Ng 2007, ch. 6.
const coxOf = (tox: number) => (EPSILON_R_SIO2 * EPSILON_0) / tox; // Cox = εox/tox
const twoPhiFOf = (na: number) => 2 * UT * Math.log(na / NI_300K_PER_M3); // 2φF = 2·(kT/q)·ln(NA/ni)
const gammaOf = (na: number, tox: number) => Math.sqrt(2 * Q_ELEMENTARY * EPSILON_R_SI * EPSILON_0 * na) / coxOf(tox); // γ = √(2qεSiNA)/Cox

const closeTo = (actual: number, expected: number, relative = 1e-9) => expect(Math.abs(actual - expected)).toBeLessThanOrEqual(Math.abs(expected) * relative);

describe('POST /api/processes/derive, the physics helper', () => {
  let t: TestApp;
  let designer: string;
  beforeAll(async () => {
    t = await createTestApp();
    designer = await t.loginAs(DEMO_ACCOUNTS.designer.email);
  });
  afterAll(() => t.close());

  const derive = async (body: object): Promise<DeriveProcessResponse> =>
    deriveProcessResponseSchema.parse((await t.http().post('/api/processes/derive').set(bearer(designer)).send(body).expect(200)).body);

  it('gives Cox = εox/tox for 10 nm and 4 nm oxides', async () => {
    for (const tox of [10e-9, 4e-9]) closeTo((await derive({ tox, substrateDoping: 1e17 * PER_CM3 })).cox, coxOf(tox));
    // A 10 nm oxide is about 3.45 fF/µm² (common practice, no source).
    expect((await derive({ tox: 10e-9, substrateDoping: 1e23 })).cox * 1e3).toBeCloseTo(3.45, 2);
  });

  it.each([
    { label: '1e16', naPerCm3: 1e16, nm: 10 },
    { label: '1e16', naPerCm3: 1e16, nm: 4 },
    { label: '1e17', naPerCm3: 1e17, nm: 10 },
    { label: '1e17', naPerCm3: 1e17, nm: 4 },
  ])('gives γ and 2φF for NA = $label cm⁻³ under a $nm nm oxide, at 300 K with ni = 1.0e10 cm⁻³', async ({ naPerCm3, nm }) => {
    const tox = nm * 1e-9;
    const na = naPerCm3 * PER_CM3;
    const answer = await derive({ tox, substrateDoping: na, temperature: AT_300K_CELSIUS });
    closeTo(answer.twoPhiF, twoPhiFOf(na), 1e-9);
    closeTo(answer.phiF, twoPhiFOf(na) / 2, 1e-9);
    closeTo(answer.gamma, gammaOf(na, tox), 1e-9);
    closeTo(answer.ni, NI_300K_PER_M3, 1e-12);
    // n = 1 + γ/(2√(2φF)) (Tsividis & McAndrew 2011, ch. 4).
    closeTo(answer.n, 1 + gammaOf(na, tox) / (2 * Math.sqrt(twoPhiFOf(na))), 1e-9);
    expect(answer.vt0).toBeUndefined();
  });

  it('gives VT0 = VFB + 2φF + γ√(2φF) only when the flat-band voltage is given', async () => {
    const na = 1e17 * PER_CM3;
    const answer = await derive({ tox: 4e-9, substrateDoping: na, flatBand: -0.9, temperature: AT_300K_CELSIUS });
    const twoPhiF = twoPhiFOf(na);
    closeTo(answer.vt0!, -0.9 + twoPhiF + gammaOf(na, 4e-9) * Math.sqrt(twoPhiF), 1e-9);
    // Hotter gives a lower threshold (common practice, no source).
    expect(answer.vtTc).toBeLessThan(0);
  });

  it('gives kp = µ·Cox when a mobility is given', async () => {
    const answer = await derive({ tox: 10e-9, substrateDoping: 1e23, mobility: 0.04 });
    closeTo(answer.kp!, 0.04 * coxOf(10e-9));
  });

  it('lists its constants with their values and sources', async () => {
    const { constants, equations } = await derive({ tox: 10e-9, substrateDoping: 1e23 });
    const bySymbol = Object.fromEntries(constants.map((c) => [c.symbol, c]));
    expect(bySymbol.k).toMatchObject({ value: K_BOLTZMANN, unit: 'J/K', source: expect.stringContaining('SI Brochure') });
    expect(bySymbol.q).toMatchObject({ value: Q_ELEMENTARY, unit: 'C', source: expect.stringContaining('2019') });
    expect(bySymbol['ε0']).toMatchObject({ value: EPSILON_0, source: expect.stringContaining('CODATA') });
    expect(bySymbol['εr(Si)'].value).toBe(EPSILON_R_SI);
    expect(bySymbol['εr(SiO2)'].value).toBe(EPSILON_R_SIO2);
    expect(bySymbol['ni(300 K)']).toMatchObject({ value: NI_300K_PER_M3, unit: 'm⁻³', source: expect.stringContaining('Sproul') });
    expect(equations.join('\n')).toContain('γ = √(2·q·εr(Si)·ε0·NA) / Cox');
  });

  it('answers bad input with 400 naming the field', async () => {
    const bad = async (body: object, field: string) => {
      const response = await t.http().post('/api/processes/derive').set(bearer(designer)).send(body).expect(400);
      expect(response.body.field).toBe(field);
    };
    await bad({ tox: 0, substrateDoping: 1e23 }, 'tox');
    await bad({ tox: 1e-300, substrateDoping: 1e23 }, 'tox'); // below one atomic layer: not an oxide
    await bad({ tox: 'NaN', substrateDoping: 1e23 }, 'tox');
    await bad({ tox: '10n', substrateDoping: 1e23 }, 'tox');
    await bad({ tox: 10e-9 }, 'substrateDoping');
    await bad({ tox: 10e-9, substrateDoping: 1e17 }, 'substrateDoping'); // cm⁻³ by mistake: 1e17 m⁻³ is below the range
    // At 300 °C silicon's ni is far above 1e19 m⁻³: the doping no longer sets the Fermi level.
    await bad({ tox: 10e-9, substrateDoping: 1e19, temperature: 300 }, 'substrateDoping');
  });
});
