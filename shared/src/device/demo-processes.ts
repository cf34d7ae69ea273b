import type { Corner, DeviceParams, Process } from '../schemas/process.js';

/**
 * INVENTED DEMO DATA, NOT ANY FOUNDRY'S PROCESS.
 * BF180-G and BF130-G belong to Brackenfold Semiconductor, an invented design house. The numbers are
 * plausible for a generic 180 nm-class and 130 nm-class bulk CMOS process and were chosen for the demo,
 * not measured or copied from anywhere. Do not design real silicon with them.
 */
export const DEMO_DATA_NOTICE = "Invented demo data, not any foundry's process";

/** Corners TT/FF/SS/FS/SF: ±40 mV on VT, ±10 % on kp; the first letter is the NMOS, the second the PMOS. */
function demoCorners(): Corner[] {
  const fast = { dvt: -0.04, kpScale: 1.1 };
  const slow = { dvt: 0.04, kpScale: 0.9 };
  const typical = { dvt: 0, kpScale: 1 };
  return [
    { name: 'TT', nmos: typical, pmos: typical },
    { name: 'FF', nmos: fast, pmos: fast },
    { name: 'SS', nmos: slow, pmos: slow },
    { name: 'FS', nmos: fast, pmos: slow },
    { name: 'SF', nmos: slow, pmos: fast },
  ];
}

const BF180G_NMOS: DeviceParams = {
  vt0: 0.45,
  kp: 290e-6,
  gamma: 0.45,
  twoPhiF: 0.88,
  lambda: 0.08,
  lRef: 0.5e-6,
  tox: 4.1e-9,
  cgdo: 0.35e-9,
  cj: 1.0e-3,
  cjsw: 0.25e-9,
  ldiff: 0.48e-6,
  vtTc: -1.0e-3,
  muExp: -1.5,
  avt: 4.5e-9,
  abeta: 1.0e-8,
  lmin: 0.18e-6,
  wmin: 0.22e-6,
  wgrid: 5e-9,
  jg: 1e-6,
  js: 5e-4,
};

const BF180G_PMOS: DeviceParams = {
  vt0: 0.48,
  kp: 65e-6,
  gamma: 0.42,
  twoPhiF: 0.85,
  lambda: 0.1,
  lRef: 0.5e-6,
  tox: 4.1e-9,
  cgdo: 0.33e-9,
  cj: 1.1e-3,
  cjsw: 0.22e-9,
  ldiff: 0.48e-6,
  vtTc: -1.3e-3,
  muExp: -1.2,
  avt: 5.5e-9,
  abeta: 1.2e-8,
  lmin: 0.18e-6,
  wmin: 0.22e-6,
  wgrid: 5e-9,
  jg: 3e-7,
  js: 4e-4,
};

/** BF180-G: invented 180 nm-class CMOS, vdd 1.8 V, tnom 27 °C, −40 … 125 °C, with a native (depletion-mode) NMOS. */
export const BF180G: Process = {
  name: 'BF180-G',
  description: `${DEMO_DATA_NOTICE}. A generic 180 nm-class bulk CMOS process, 1.8 V, for the Channelwright demo.`,
  tnom: 27,
  vdd: 1.8,
  tempRange: { min: -40, max: 125 },
  nmos: BF180G_NMOS,
  pmos: BF180G_PMOS,
  corners: demoCorners(),
  flavours: [
    {
      name: 'native',
      polarity: 'nmos',
      description: 'Native (undoped-channel) NMOS: depletion mode, VT0 = −0.12 V; conducts at VGS = 0',
      params: { ...BF180G_NMOS, vt0: -0.12, kp: 320e-6, gamma: 0.15, twoPhiF: 0.6, lambda: 0.06, lRef: 1e-6, vtTc: -0.8e-3, avt: 6e-9, lmin: 0.5e-6, wmin: 0.5e-6 },
    },
  ],
  // The model names of the invented demo model cards (server/src/characterisation/demo-cards/bf180g.lib).
  spiceModels: { nmos: 'bfn18', pmos: 'bfp18', flavours: { native: 'bfn18na' } },
};

/** BF130-G: invented 130 nm-class CMOS, vdd 1.2 V, tnom 27 °C, −40 … 125 °C (for the "migrate a sheet" example). */
export const BF130G: Process = {
  name: 'BF130-G',
  description: `${DEMO_DATA_NOTICE}. A generic 130 nm-class bulk CMOS process, 1.2 V, for the Channelwright demo.`,
  tnom: 27,
  vdd: 1.2,
  tempRange: { min: -40, max: 125 },
  nmos: {
    vt0: 0.36,
    kp: 420e-6,
    gamma: 0.35,
    twoPhiF: 0.9,
    lambda: 0.1,
    lRef: 0.35e-6,
    tox: 2.6e-9,
    cgdo: 0.3e-9,
    cj: 1.1e-3,
    cjsw: 0.1e-9,
    ldiff: 0.34e-6,
    vtTc: -0.9e-3,
    muExp: -1.5,
    avt: 3.5e-9,
    abeta: 1.0e-8,
    lmin: 0.13e-6,
    wmin: 0.16e-6,
    wgrid: 5e-9,
    jg: 1e-2,
    js: 8e-4,
  },
  pmos: {
    vt0: 0.34,
    kp: 95e-6,
    gamma: 0.32,
    twoPhiF: 0.88,
    lambda: 0.12,
    lRef: 0.35e-6,
    tox: 2.6e-9,
    cgdo: 0.28e-9,
    cj: 1.2e-3,
    cjsw: 0.1e-9,
    ldiff: 0.34e-6,
    vtTc: -1.1e-3,
    muExp: -1.2,
    avt: 4.0e-9,
    abeta: 1.2e-8,
    lmin: 0.13e-6,
    wmin: 0.16e-6,
    wgrid: 5e-9,
    jg: 3e-3,
    js: 6e-4,
  },
  corners: demoCorners(),
  // The model names of the invented demo model cards (server/src/characterisation/demo-cards/bf130g.lib).
  spiceModels: { nmos: 'bfn13', pmos: 'bfp13' },
};

/** The demo processes the server seeds, in order. */
export const DEMO_PROCESSES: readonly Process[] = [BF180G, BF130G];
