import { randomUUID } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { type PreparedTable, prepareTable, sizeFromTable, type TableGrid, type TableSizing, tableLine } from '@channelwright/shared/device';
import { type ModelCard, type ModelStatement, parseModelCard } from '@channelwright/shared/model-card';
import { describeWithNgspice, requireNativeNgspice } from '../../test/helpers/ngspice.js';
import { characterise } from './simulator/characterise.js';
import { buildOperatingPointNetlist, type DeviceToCheck } from './simulator/operating-point-netlist.js';
import { SimulatorPool } from './simulator/simulator-pool.js';

/*
 * The acceptance check of the table model (issue 10): characterise invented BSIM4 test cards over a small grid
 * on Debian's native ngspice, size random devices from the tables by gm/ID (the method of Silveira, Flandre &
 * Jespers, IEEE JSSC 31(9), 1996), then simulate each sized device (its W, L, VGS, VDS, VSB) on native ngspice
 * again: ID within 1 % and gm/ID within 2 % at grid lengths, both within 3 % between grid lengths.
 */

interface Process {
  file: string;
  vdd: number;
  lmin: number;
  models: Record<'nmos' | 'pmos', string>;
}

const PROCESSES: Process[] = [
  { file: 'test-250nm.lib', vdd: 2.5, lmin: 0.25e-6, models: { nmos: 'tn25', pmos: 'tp25' } },
  { file: 'test-90nm.lib', vdd: 1.0, lmin: 0.09e-6, models: { nmos: 'tn9', pmos: 'tp9' } },
];
/** Lengths closer than ×1.2 next to lmin, where the threshold rolls off steeply, then log-spaced to 8·lmin. */
const LENGTH_FACTORS = [1, 1.15, 1.33, 1.6, 2, 3, 5, 8];
const CORNERS = ['tt', 'ss'];
const TEMPERATURES = [27, 125];

function gridOf(process: Process, polarity: 'nmos' | 'pmos'): TableGrid {
  const step = 0.01;
  return {
    polarity,
    modelName: process.models[polarity],
    referenceWidth: 10e-6,
    lengths: LENGTH_FACTORS.map((k) => k * process.lmin),
    vgs: { start: 0, step, count: Math.round(process.vdd / step) + 1 },
    vds: [0.3, 0.45, 0.6, 0.8, 1].map((k) => k * process.vdd),
    vsb: [0, 0.2, 0.4].map((k) => k * process.vdd),
    corners: CORNERS,
    temperatures: TEMPERATURES,
  };
}

/** A small deterministic generator (a linear congruential one, Numerical Recipes constants), so the devices are the same every run. */
function generator(seed: number) {
  let state = seed >>> 0;
  const next = () => {
    state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
    return state / 2 ** 32;
  };
  return { next, pick: <T>(list: readonly T[]) => list[Math.floor(next() * list.length)], between: (lo: number, hi: number) => lo + (hi - lo) * next() };
}

interface Case {
  process: Process;
  polarity: 'nmos' | 'pmos';
  onGrid: boolean;
  sized: TableSizing;
  model: ModelStatement;
}

describeWithNgspice('sizing from tables against native ngspice (24 random devices)', () => {
  const cases: Case[] = [];
  const simulated: { id: number; gmId: number }[] = [];

  beforeAll(async () => {
    requireNativeNgspice();
    const pool = new SimulatorPool();
    try {
      const cards = new Map<Process, ModelCard>(PROCESSES.map((p) => [p, parseModelCard(readFileSync(join(__dirname, '../../test/fixtures/model-cards', p.file), 'utf8'))]));
      const tables = new Map<string, PreparedTable>();
      for (const process of PROCESSES) {
        for (const polarity of ['nmos', 'pmos'] as const) {
          const table = await characterise({ card: cards.get(process) as ModelCard, grid: gridOf(process, polarity), sections: { tt: 'tt', ss: 'ss' } }, { pool, engine: 'native' });
          tables.set(`${process.file}/${polarity}`, prepareTable(table));
        }
      }

      const random = generator(20260610);
      for (let index = 0; index < 24; index++) {
        const process = PROCESSES[Math.floor(index / 2) % 2];
        const polarity = index % 2 === 0 ? 'nmos' : 'pmos';
        const onGrid = index < 12;
        const grid = gridOf(process, polarity);
        const prepared = tables.get(`${process.file}/${polarity}`) as PreparedTable;
        const corner = random.pick(CORNERS);
        const temperature = index % 3 === 2 ? 125 : random.pick(TEMPERATURES);
        const k = Math.floor(random.next() * (grid.lengths.length - 1));
        const l = onGrid ? grid.lengths[k] : grid.lengths[k] * (grid.lengths[k + 1] / grid.lengths[k]) ** random.between(0.2, 0.8);
        const vsb = index % 4 < 2 ? 0 : random.pick(grid.vsb.slice(1));
        const vds = random.pick(grid.vds);
        const conditions = { corner, temperature, l, vds, vsb };
        // gm/ID from 5 S/A to 25 S/A, or to 92 % of the highest gm/ID this point reaches (less when hot).
        const line = tableLine(prepared, conditions);
        let highest = 0;
        for (let g = 0; g < line.count; g++) highest = Math.max(highest, line.gmIdAtNode(g));
        const gmId = random.between(5, Math.min(25, 0.92 * highest));
        // An ID that gives a width between 2 µm and 50 µm (the table is at 10 µm; the cards' ΔW = 2·wint = 10 nm makes a 1 µm device 0.9 % weaker per µm).
        const density = sizeFromTable(prepared, { ...conditions, id: 1e-6, gmId }).idW;
        const id = density * Math.exp(random.between(Math.log(2e-6), Math.log(50e-6)));
        const sized = sizeFromTable(prepared, { ...conditions, id, gmId });
        const model = cards.get(process)?.sections.find((s) => s.name === corner)?.models.find((m) => m.name === grid.modelName) as ModelStatement;
        cases.push({ process, polarity, onGrid, sized, model });
      }

      // One .op run per corner and temperature (BSIM4 has no per-instance temperature).
      for (const corner of CORNERS) {
        for (const temperature of TEMPERATURES) {
          const group = cases.map((c, i) => ({ c, i })).filter(({ c }) => c.sized.corner === corner && c.sized.temperature === temperature);
          if (group.length === 0) continue;
          const devices: DeviceToCheck[] = group.map(({ c }) => ({ model: c.model, w: c.sized.w, l: c.sized.l, vgs: c.sized.vgs, vds: c.sized.vds, vsb: c.sized.vsb }));
          const check = buildOperatingPointNetlist(devices, temperature, randomUUID());
          const result = await pool.run({ engine: 'native', netlist: check.netlist, nonce: check.nonce, vectors: check.vectors, timeoutMs: 60_000 });
          group.forEach(({ c, i }, k) => {
            const sign = c.polarity === 'nmos' ? 1 : -1;
            const id = -sign * result.data[2 * k * result.points];
            const gm = result.data[(2 * k + 1) * result.points];
            simulated[i] = { id, gmId: gm / id };
          });
        }
      }
    } finally {
      await pool.destroy();
    }
    const rows = cases.map((c, i) => ({
      device: `${c.process.file.replace('.lib', '')} ${c.polarity} ${c.sized.corner} ${c.sized.temperature}°C`,
      L_um: +(c.sized.l * 1e6).toFixed(4),
      onGrid: c.onGrid,
      gmId: +c.sized.gmId.toFixed(2),
      W_um: +(c.sized.w * 1e6).toFixed(3),
      VGS: +c.sized.vgs.toFixed(4),
      VDS: c.sized.vds,
      VSB: c.sized.vsb,
      ID_err_pct: +(100 * (simulated[i].id / c.sized.id - 1)).toFixed(3),
      gmId_err_pct: +(100 * (simulated[i].gmId / c.sized.gmId - 1)).toFixed(3),
    }));
    // The figures for docs/model.md; the assertions are below.
    console.log(JSON.stringify(rows));
  }, 300_000);

  it('covers NMOS and PMOS, both corners, 125 °C, VSB 0 and above, gm/ID 5 to 25 S/A, L on and between grid lengths', () => {
    expect(cases).toHaveLength(24);
    expect(new Set(cases.map((c) => c.polarity)).size).toBe(2);
    expect(new Set(cases.map((c) => c.sized.corner)).size).toBe(2);
    expect(cases.some((c) => c.sized.temperature === 125)).toBe(true);
    expect(cases.some((c) => c.sized.vsb === 0) && cases.some((c) => c.sized.vsb > 0)).toBe(true);
    expect(Math.min(...cases.map((c) => c.sized.gmId))).toBeLessThan(8);
    expect(Math.max(...cases.map((c) => c.sized.gmId))).toBeGreaterThan(18);
    expect(cases.filter((c) => c.onGrid)).toHaveLength(12);
  });

  it('at grid lengths, the simulated device carries ID within 1 % and has gm/ID within 2 % of the table sizing', () => {
    cases.forEach((c, i) => {
      if (!c.onGrid) return;
      expect(Math.abs(simulated[i].id / c.sized.id - 1)).toBeLessThan(0.01);
      expect(Math.abs(simulated[i].gmId / c.sized.gmId - 1)).toBeLessThan(0.02);
    });
  });

  it('between grid lengths, the simulated device carries ID and has gm/ID within 3 % of the table sizing', () => {
    cases.forEach((c, i) => {
      if (c.onGrid) return;
      expect(Math.abs(simulated[i].id / c.sized.id - 1)).toBeLessThan(0.03);
      expect(Math.abs(simulated[i].gmId / c.sized.gmId - 1)).toBeLessThan(0.03);
    });
  });
});
