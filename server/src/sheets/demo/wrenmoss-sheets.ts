import type { CreateSheetRequestInput, DeviceTargetsInput } from '@channelwright/shared/schemas';

// Invented demo data: the sheets of the invented Wrenmoss sensor front end (Brackenfold Semiconductor,
// a made-up design house) on the invented BF180-G process. Numbers in SI units; PMOS voltages
// polarity-normalised (VSG, VSD, VBS). Bias currents span 100 nA to 200 µA so that weak, moderate and
// strong inversion all appear.

export interface DemoSheet {
  sheet: Omit<CreateSheetRequestInput, 'processId' | 'processVersion'>;
  devices: DeviceTargetsInput[];
}

const µ = 1e-6;
const n = 1e-9;

const biasGenerator: DemoSheet = {
  sheet: {
    name: 'Bias generator',
    description: 'Invented demo data. Constant-gm style reference: NMOS pair with a degenerated side, PMOS mirror, cascodes whose sources sit above the body, a start-up device and a native start-up current source.',
  },
  devices: [
    { name: 'MN1', function: 'reference diode (constant-gm core)', polarity: 'nmos', id: 5 * µ, l: 2 * µ, vds: 0.55, vov: 0.12, matchGroup: 'core NMOS', limits: [{ figure: 'headroom', min: 0.35 }], notes: 'Keep 350 mV between VDS and VDSsat: the core must stay saturated as the supply droops.' },
    { name: 'MN2', function: 'degenerated side of the core, 4× wider', polarity: 'nmos', id: 5 * µ, l: 2 * µ, vds: 0.45, vov: 0.06, multiplier: 4, matchGroup: 'core NMOS', notes: 'Source on the degeneration resistor: sized with four parallel devices.' },
    { name: 'MN3', function: 'cascode of the reference branch', polarity: 'nmos', id: 5 * µ, l: 1 * µ, vds: 0.4, vsb: 0.55, vov: 0.15, notes: 'Source above the body: the body effect raises VT.' },
    { name: 'MN4', function: 'cascode of the output branch', polarity: 'nmos', id: 5 * µ, l: 1 * µ, vds: 0.4, vsb: 0.45, vov: 0.15 },
    { name: 'MP1', function: 'PMOS mirror, reference branch', polarity: 'pmos', id: 5 * µ, l: 2 * µ, vds: 0.5, vov: 0.2, matchGroup: 'bias PMOS mirror', supplyBranch: true, limits: [{ figure: 'headroom', min: 0.25 }, { figure: 'vgs', max: 1.1 }] },
    { name: 'MP2', function: 'PMOS mirror, output branch', polarity: 'pmos', id: 5 * µ, l: 2 * µ, vds: 0.5, vov: 0.2, matchGroup: 'bias PMOS mirror', supplyBranch: true },
    { name: 'MS1', function: 'start-up device (off once the core runs)', polarity: 'nmos', id: 100 * n, l: 1 * µ, vds: 1.0, gmId: 27, notes: 'Weak inversion: it only has to pull the core out of the zero-current state.' },
    { name: 'MNAT', function: 'native start-up current source', polarity: 'nmos', flavour: 'native', id: 1 * µ, l: 2 * µ, vds: 0.5, vgs: 0, supplyBranch: true, notes: 'Depletion-mode native NMOS with its gate at its source: conducts at VGS = 0.' },
  ],
};

const twoStageAmplifier: DemoSheet = {
  sheet: {
    name: 'Two-stage amplifier',
    description: 'Invented demo data. PMOS input pair (offset budget 2 mV 1-sigma), NMOS mirror load, tail source, common-source second stage; compensation left to the designer.',
    offsetBudgets: [{ group: 'input pair', sigmaVos: 2e-3 }],
  },
  devices: [
    { name: 'M1', function: 'input pair (+)', polarity: 'pmos', id: 10 * µ, l: 0.5 * µ, vds: 0.6, gmId: 16, matchGroup: 'input pair', notes: 'Offset budget 2 mV 1-sigma for the pair.' },
    { name: 'M2', function: 'input pair (−)', polarity: 'pmos', id: 10 * µ, l: 0.5 * µ, vds: 0.6, gmId: 16, matchGroup: 'input pair' },
    { name: 'M3', function: 'mirror load (diode side)', polarity: 'nmos', id: 10 * µ, l: 1 * µ, vds: 0.6, vov: 0.15, matchGroup: 'mirror load' },
    { name: 'M4', function: 'mirror load (output side)', polarity: 'nmos', id: 10 * µ, l: 1 * µ, vds: 0.6, vov: 0.15, matchGroup: 'mirror load' },
    { name: 'M5', function: 'tail current source', polarity: 'pmos', id: 20 * µ, l: 1 * µ, vds: 0.4, vov: 0.2, supplyBranch: true },
    { name: 'M6', function: 'second stage (common source)', polarity: 'nmos', id: 200 * µ, l: 0.36 * µ, vds: 0.9, vov: 0.3 },
    { name: 'M7', function: 'second-stage current source', polarity: 'pmos', id: 200 * µ, l: 0.5 * µ, vds: 0.9, vov: 0.3, supplyBranch: true },
    { name: 'M8', function: 'bias mirror diode', polarity: 'pmos', id: 2 * µ, l: 1 * µ, vds: 0.7, vov: 0.2, supplyBranch: true },
    { name: 'M9', function: 'trickle bias leg', polarity: 'nmos', id: 100 * n, l: 2 * µ, vds: 0.5, gmId: 29, supplyBranch: true, notes: 'Weak inversion at 100 nA.' },
  ],
};

const sleepSwitch: DemoSheet = {
  sheet: {
    name: 'Sleep switch',
    description: 'Invented demo data. Large NMOS power switch for the sensor\'s sleep mode and its gate driver; the off-state leakage at 125 °C is the battery-life concern.',
    leakageBudget: { current: 50e-9, temperature: 125 },
  },
  devices: [
    { name: 'MSW', function: 'sleep switch (power gate, fully on)', polarity: 'nmos', id: 20e-3, l: 0.18 * µ, vds: 0.05, vgs: 1.8, temperature: 125, notes: 'Deep triode when on (VDS = 50 mV); off-state leakage at 125 °C sets the sleep current.' },
    { name: 'MDN', function: 'gate driver pull-down', polarity: 'nmos', id: 50 * µ, l: 0.18 * µ, vds: 0.9, vov: 0.3 },
    { name: 'MDP', function: 'gate driver pull-up', polarity: 'pmos', id: 50 * µ, l: 0.18 * µ, vds: 0.9, vov: 0.3 },
  ],
};

export const WRENMOSS_SHEETS: readonly DemoSheet[] = [biasGenerator, twoStageAmplifier, sleepSwitch];

/** The process the demo sheets are sized on (its latest version). */
export const WRENMOSS_PROCESS_NAME = 'BF180-G';
