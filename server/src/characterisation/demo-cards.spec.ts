import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { lineOffset, type TableGrid } from '@channelwright/shared/device';
import { type ModelCard, parseModelCard } from '@channelwright/shared/model-card';
import { describeWithNgspice, requireNativeNgspice } from '../../test/helpers/ngspice.js';
import { characterise } from './simulator/characterise.js';
import { SimulatorPool } from './simulator/simulator-pool.js';

const DEMO = join(__dirname, 'demo-cards');
const TESTS = join(__dirname, '../../test/fixtures/model-cards');
const files = [...readdirSync(DEMO).map((f) => join(DEMO, f)), ...readdirSync(TESTS).map((f) => join(TESTS, f))];
const read = (file: string) => readFileSync(file, 'utf8');
const cardOf = (file: string): ModelCard => parseModelCard(read(file));

describe('the invented model cards', () => {
  it('each starts with a line saying it is invented data, not any foundry model', () => {
    expect(files.length).toBe(4);
    for (const file of files) expect(read(file).split('\n')[0]).toMatch(/^\* INVENTED (DEMO|TEST) DATA, not any foundry's model/);
  });

  it('BF180-G holds NMOS, PMOS and native NMOS BSIM4 models in the five corner sections, BF130-G NMOS and PMOS', () => {
    const bf180 = cardOf(join(DEMO, 'bf180g.lib'));
    expect(bf180.sections.map((s) => s.name)).toEqual(['tt', 'ff', 'ss', 'fs', 'sf']);
    for (const section of bf180.sections) {
      expect(section.models.map((m) => [m.name, m.polarity, m.level])).toEqual([
        ['bfn18', 'nmos', 54],
        ['bfp18', 'pmos', 54],
        ['bfn18na', 'nmos', 54],
      ]);
    }
    const bf130 = cardOf(join(DEMO, 'bf130g.lib'));
    expect(bf130.sections.map((s) => [s.name, s.models.map((m) => m.name)])).toEqual(['tt', 'ff', 'ss', 'fs', 'sf'].map((c) => [c, ['bfn13', 'bfp13']]));
  });

  it('shifts |VT| by 40 mV and mobility by 10 % per corner, the first letter naming the NMOS and the second the PMOS', () => {
    const card = cardOf(join(DEMO, 'bf180g.lib'));
    const parameter = (corner: string, model: string, name: string) => card.sections.find((s) => s.name === corner)?.models.find((m) => m.name === model)?.parameters[name] as number;
    expect(parameter('fs', 'bfn18', 'vth0') - parameter('tt', 'bfn18', 'vth0')).toBeCloseTo(-0.04, 12);
    expect(parameter('fs', 'bfp18', 'vth0') - parameter('tt', 'bfp18', 'vth0')).toBeCloseTo(-0.04, 12);
    expect(parameter('sf', 'bfp18', 'vth0') - parameter('tt', 'bfp18', 'vth0')).toBeCloseTo(0.04, 12);
    expect(parameter('ff', 'bfn18', 'u0') / parameter('tt', 'bfn18', 'u0')).toBeCloseTo(1.1, 12);
    expect(parameter('ss', 'bfp18', 'u0') / parameter('tt', 'bfp18', 'u0')).toBeCloseTo(0.9, 12);
  });
});

describeWithNgspice('the demo cards simulated in native ngspice are plausible for their class', () => {
  /*
   * Class figures of bulk CMOS at lmin and VGS = VDS = VDD (common practice, no source): NMOS about 600–750 µA/µm,
   * PMOS about 250–320 µA/µm; the highest gm/ID of a long device near 1/(n·UT) with n ≈ 1.3, about 25–31 S/A at 27 °C.
   */
  const cases = [
    { file: 'bf180g.lib', model: 'bfn18', polarity: 'nmos', vdd: 1.8, lmin: 0.18e-6, idsat: [600e-6, 760e-6] },
    { file: 'bf180g.lib', model: 'bfp18', polarity: 'pmos', vdd: 1.8, lmin: 0.18e-6, idsat: [250e-6, 330e-6] },
    { file: 'bf130g.lib', model: 'bfn13', polarity: 'nmos', vdd: 1.2, lmin: 0.13e-6, idsat: [600e-6, 760e-6] },
    { file: 'bf130g.lib', model: 'bfp13', polarity: 'pmos', vdd: 1.2, lmin: 0.13e-6, idsat: [250e-6, 330e-6] },
  ] as const;
  const found: { idsat: number; gmIdMax: number; vtShort: number; vtLong: number }[] = [];

  beforeAll(async () => {
    requireNativeNgspice();
    const pool = new SimulatorPool({ threads: 2 });
    try {
      for (const c of cases) {
        const grid: TableGrid = { polarity: c.polarity, modelName: c.model, referenceWidth: 10e-6, lengths: [c.lmin, 10 * c.lmin], vgs: { start: 0, step: 0.01, count: Math.round(c.vdd / 0.01) + 1 }, vds: [c.vdd / 2, c.vdd], vsb: [0], corners: ['tt'], temperatures: [27] };
        const table = await characterise({ card: cardOf(join(DEMO, c.file)), grid, sections: { tt: 'tt' } }, { pool, engine: 'native' });
        const top = grid.vgs.count - 1;
        const long = lineOffset(grid, 0, 0, 1, 0, 0);
        let gmIdMax = 0;
        for (let g = 0; g <= top; g++) gmIdMax = Math.max(gmIdMax, table.columns.gm[long + g] / table.columns.id[long + g]);
        found.push({
          idsat: table.columns.id[lineOffset(grid, 0, 0, 0, 0, 1) + top] / 10,
          gmIdMax,
          vtShort: table.columns.vt[lineOffset(grid, 0, 0, 0, 0, 1)],
          vtLong: table.columns.vt[lineOffset(grid, 0, 0, 1, 0, 1)],
        });
      }
    } finally {
      await pool.destroy();
    }
  }, 120_000);

  it('drives the class saturation current per µm of width at lmin', () => {
    cases.forEach((c, i) => {
      expect(found[i].idsat).toBeGreaterThan(c.idsat[0]);
      expect(found[i].idsat).toBeLessThan(c.idsat[1]);
    });
  });

  it('reaches a highest gm/ID of 25 to 31 S/A on a long device', () => {
    for (const f of found) {
      expect(f.gmIdMax).toBeGreaterThan(25);
      expect(f.gmIdMax).toBeLessThan(31);
    }
  });

  it('rolls its threshold off at lmin: lower than on a long device', () => {
    for (const f of found) expect(f.vtLong - f.vtShort).toBeGreaterThan(0.03);
  });
});
