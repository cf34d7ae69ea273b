import type { TableGrid } from './lookup-table.js';

/** What a default grid is made from: the device, the process's supply and minimum length, the corners and temperatures to characterise. */
export interface DefaultGridInputs {
  polarity: 'nmos' | 'pmos';
  modelName: string;
  vdd: number;
  lmin: number;
  corners: string[];
  temperatures: number[];
  /** m; default 10 µm. */
  referenceWidth?: number;
  /** V; default 10 mV. */
  vgsStep?: number;
  /** V; default 0 (a depletion-mode device wants its grid to start below its VT). */
  vgsFrom?: number;
}

/**
 * The default characterisation grid (docs/characterisation.md): lengths lmin·20^(i/8), i = 0 … 8, with
 * 1.15·lmin and 1.33·lmin added where the threshold rolls off; VGS from 0 to vdd in 10 mV steps; eight VDS
 * from 50 mV to vdd, closer at low VDS where the current bends; VSB from 0 to vdd/2 in four steps.
 */
export function defaultTableGrid(inputs: DefaultGridInputs): TableGrid {
  const { vdd, lmin } = inputs;
  const step = inputs.vgsStep ?? 0.01;
  const from = inputs.vgsFrom ?? 0;
  const round = (value: number) => Number(value.toPrecision(12));
  const lengths = [...Array.from({ length: 9 }, (_, i) => lmin * 20 ** (i / 8)), 1.15 * lmin, 1.33 * lmin].map(round).sort((a, b) => a - b);
  return {
    polarity: inputs.polarity,
    modelName: inputs.modelName,
    referenceWidth: inputs.referenceWidth ?? 10e-6,
    lengths,
    vgs: { start: from, step, count: Math.floor(round((vdd - from) / step)) + 1 },
    vds: [0.05 / 1.8, 0.1 / 1.8, 0.2 / 1.8, 0.35 / 1.8, 0.6 / 1.8, 0.5, 1.3 / 1.8, 1].map((k) => round(k * vdd)),
    vsb: [0, 1, 2, 3, 4].map((k) => round((k * vdd) / 8)),
    corners: [...inputs.corners],
    temperatures: [...inputs.temperatures].sort((a, b) => a - b),
  };
}
