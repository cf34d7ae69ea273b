import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { lineOffset, type LookupTable, TABLE_FIELDS, type TableGrid, vgsOfNode } from '@channelwright/shared/device';
import { emitModel, ModelCardError, parseModelCard } from '@channelwright/shared/model-card';
import { describeWithNgspice, requireNativeNgspice } from '../../../test/helpers/ngspice.js';
import { type CharacterisationInput, characterise, planChunks } from './characterise.js';
import type { SimulationRequest, SimulatorPool } from './simulator-pool.js';
import { SimulatorPool as Pool } from './simulator-pool.js';
import { finishSweep, sweepPlacements } from './store-sweep.js';
import { buildSweepNetlist } from './sweep-netlist.js';

const cards = join(__dirname, '../../../test/fixtures/model-cards');
const card250 = parseModelCard(readFileSync(join(cards, 'test-250nm.lib'), 'utf8'));
const sections = { tt: 'tt', ss: 'ss' };

function grid(polarity: 'nmos' | 'pmos'): TableGrid {
  return {
    polarity,
    modelName: polarity === 'nmos' ? 'tn25' : 'tp25',
    referenceWidth: 10e-6,
    lengths: [0.25e-6, 0.5e-6, 2e-6],
    vgs: { start: 0, step: 0.05, count: 51 },
    vds: [0.1, 1.25, 2.5],
    vsb: [0, 0.6],
    corners: ['tt', 'ss'],
    temperatures: [27, 125],
  };
}

/** A pool that records the netlists it is given and answers nothing. */
function recordingPool(): { pool: SimulatorPool; netlists: string[] } {
  const netlists: string[] = [];
  const pool = { threads: 1, run: async (request: SimulationRequest) => { netlists.push(request.netlist); throw new Error('not simulated'); } };
  return { pool: pool as unknown as SimulatorPool, netlists };
}

describe('characterise without a simulator', () => {
  it('never hands a card with a .control block or an .include to a simulator: the parser refuses it first', () => {
    for (const text of ['.model n nmos level=54\n.control\nshell touch /tmp/owned\n.endc', '.include /etc/passwd\n.model n nmos level=54']) {
      expect(() => parseModelCard(text)).toThrow(ModelCardError);
    }
  });

  it('gives a simulator only the netlists it writes, with the model re-emitted from the parsed statement', async () => {
    const uploaded = ['* my secret comment', '.lib tt', '.model TN25 NMOS (LEVEL=54 VTH0=0.5 TOXE=5.7n) $ note', '.endl'].join('\n');
    const card = parseModelCard(uploaded);
    const { pool, netlists } = recordingPool();
    const input: CharacterisationInput = { card, grid: { ...grid('nmos'), corners: ['tt'], temperatures: [27] }, sections: { tt: 'tt' } };
    await expect(characterise(input, { pool, engine: 'native' })).rejects.toMatchObject({ code: 'SIMULATION_FAILED' });
    expect(netlists.length).toBeGreaterThan(0);
    for (const netlist of netlists) {
      expect(netlist).not.toMatch(/secret|note|\$|\(LEVEL/i);
      expect(netlist).toContain(emitModel(card.sections[0].models[0]));
    }
  });

  it('plans runs per corner and temperature with at most the asked number of transistors', () => {
    const chunks = planChunks(grid('nmos'), 12);
    expect(chunks).toHaveLength(2 * 2 * 2);
    expect(chunks.map((c) => c.lengths)).toContainEqual([0, 1]);
    expect(chunks.map((c) => c.lengths)).toContainEqual([2]);
    expect(planChunks(grid('nmos'), 1).every((c) => c.lengths.length === 1)).toBe(true);
  });

  it('refuses a model that is not in the mapped section, of the other polarity, or of levels 1 to 3', async () => {
    const { pool } = recordingPool();
    await expect(characterise({ card: card250, grid: { ...grid('nmos'), modelName: 'nope' }, sections }, { pool, engine: 'native' })).rejects.toMatchObject({ code: 'MODEL_NOT_IN_CARD', field: 'modelName' });
    await expect(characterise({ card: card250, grid: { ...grid('nmos'), modelName: 'tp25' }, sections }, { pool, engine: 'native' })).rejects.toMatchObject({ code: 'MODEL_POLARITY_MISMATCH' });
    await expect(characterise({ card: card250, grid: grid('nmos'), sections: { tt: 'tt' } }, { pool, engine: 'native' })).rejects.toMatchObject({ code: 'CORNER_WITHOUT_SECTION' });
    const level1 = parseModelCard('.model n1 nmos level=1 vto=0.5 kp=100u');
    await expect(characterise({ card: level1, grid: { ...grid('nmos'), modelName: 'n1', corners: ['tt'] }, sections: { tt: null } }, { pool, engine: 'native' })).rejects.toMatchObject({ code: 'LEVEL_NOT_CHARACTERISED' });
  });
});

/** Worst |a − b| / max(|a|, |b|) over a column pair. */
function worstRelative(a: ArrayLike<number>, b: ArrayLike<number>): number {
  let worst = 0;
  for (let i = 0; i < a.length; i++) worst = Math.max(worst, Math.abs(a[i] - b[i]) / Math.max(Math.abs(a[i]), Math.abs(b[i]), 1e-300));
  return worst;
}

describeWithNgspice('characterise on ngspice (Debian ngspice 39 native, ngspice 45 as WebAssembly from npm eecircuit-engine)', () => {
  let pool: Pool;
  const tables: Record<string, LookupTable> = {};

  beforeAll(async () => {
    requireNativeNgspice();
    pool = new Pool({ threads: 2 });
    for (const polarity of ['nmos', 'pmos'] as const) {
      for (const engine of ['native', 'wasm'] as const) {
        tables[`${polarity}-${engine}`] = await characterise({ card: card250, grid: grid(polarity), sections }, { pool, engine, precision: 'float64' });
      }
    }
  }, 180_000);

  afterAll(async () => {
    await pool?.destroy();
  });

  it('reports progress that rises to the number of grid points', async () => {
    const seen: number[] = [];
    const small = { ...grid('nmos'), temperatures: [27] };
    await characterise({ card: card250, grid: small, sections }, { pool, engine: 'native', onProgress: ({ done, total }) => seen.push(done / total) });
    expect(seen.length).toBeGreaterThan(1);
    expect(seen).toEqual([...seen].sort((a, b) => a - b));
    expect(seen[seen.length - 1]).toBe(1);
  });

  it('stores polarity-normalised lines: ID positive and rising with VGS for NMOS and PMOS alike, VT positive, Cgs + Cgd + Cgb = Cgg', () => {
    for (const polarity of ['nmos', 'pmos'] as const) {
      const table = tables[`${polarity}-native`];
      const g = table.grid;
      const offset = lineOffset(g, 0, 0, 1, 0, 2);
      for (let k = 1; k < g.vgs.count; k++) expect(table.columns.id[offset + k]).toBeGreaterThan(table.columns.id[offset + k - 1]);
      expect(table.columns.id[offset]).toBeGreaterThan(0);
      expect(table.columns.vt[offset]).toBeGreaterThan(0.3);
      expect(table.columns.vt[offset]).toBeLessThan(0.7);
      for (let k = 0; k < g.vgs.count; k++) {
        const at = offset + k;
        const sum = table.columns.cgs[at] + table.columns.cgd[at] + table.columns.cgb[at];
        expect(Math.abs(sum - table.columns.cgg[at])).toBeLessThan(1e-9 * table.columns.cgg[at]);
      }
    }
  });

  it('makes a slow corner carry less current and a hot die a lower threshold (BSIM4: kt1 < 0; BSIM4v4.8.0 Technical Manual, UC Berkeley, 2013, from memory)', () => {
    const table = tables['nmos-native'];
    const g = table.grid;
    const top = g.vgs.count - 1;
    expect(table.columns.id[lineOffset(g, 1, 0, 0, 0, 2) + top]).toBeLessThan(table.columns.id[lineOffset(g, 0, 0, 0, 0, 2) + top]);
    expect(table.columns.vt[lineOffset(g, 0, 1, 0, 0, 2)]).toBeLessThan(table.columns.vt[lineOffset(g, 0, 0, 0, 0, 2)]);
  });

  it('gives the same table on the WebAssembly build as on the native one, within 1e-6 relative in every field', () => {
    for (const polarity of ['nmos', 'pmos'] as const) {
      for (const field of TABLE_FIELDS) {
        expect(worstRelative(tables[`${polarity}-native`].columns[field], tables[`${polarity}-wasm`].columns[field])).toBeLessThan(1e-6);
      }
    }
  });

  it('refuses a run whose sweep is not the grid VGS axis', () => {
    const g = grid('nmos');
    const columns = tables['nmos-native'].columns;
    const sweep = { netlist: '', nonce: 'x', instances: [{ length: 0, vsb: 0, vds: 0 }], vectors: [], scales: [] };
    const data = new Float64Array(g.vgs.count);
    for (let k = 0; k < g.vgs.count; k++) data[k] = vgsOfNode(g.vgs, k) + (k === 7 ? 1e-3 : 0);
    expect(() => finishSweep(columns, g, { corner: 0, temperature: 0, lengths: [0] }, sweep, 'bsim4', { points: g.vgs.count, data, messages: '' })).toThrow(/sweep point 7/);
    expect(() => finishSweep(columns, g, { corner: 0, temperature: 0, lengths: [0] }, sweep, 'bsim4', { points: 50, data, messages: '' })).toThrow(/50 VGS points/);
  });

  it('places every instance line of a run at its own offset of its own column', () => {
    const g = grid('nmos');
    const chunk = { corner: 1, temperature: 1, lengths: [1, 2] };
    const sweep = buildSweepNetlist(card250.sections[0].models[0], 'bsim4', g, chunk, 'x');
    const placements = sweepPlacements(g, chunk, sweep, 'bsim4');
    expect(placements).toHaveLength(3 * sweep.instances.length * 10);
    const targets = new Set<string>();
    for (let p = 0; p < placements.length; p += 3) {
      expect(sweep.vectors[placements[p]]).toMatch(/^(i\(vd\d+\)|@m\d+\[\w+\])$/);
      targets.add(`${placements[p + 1]}:${placements[p + 2]}`);
    }
    expect(targets.size).toBe(placements.length / 3);
    expect(placements.slice(0, 3)).toEqual([1, 0, lineOffset(g, 1, 1, 1, 0, 0)]);
  });

  it('fails with the simulator message when ngspice refuses the model, and keeps no table', async () => {
    const bad = parseModelCard('.model tn25 nmos level=54 toxe=-1n');
    const promise = characterise({ card: bad, grid: { ...grid('nmos'), corners: ['tt'] }, sections: { tt: null } }, { pool, engine: 'native' });
    await expect(promise).rejects.toMatchObject({ code: 'SIMULATION_FAILED' });
    await expect(promise).rejects.toThrow(/Toxe = -1e-09 is not positive/);
  });

  it('stops when cancelled and says so', async () => {
    const controller = new AbortController();
    let progressAfterCancel = 0;
    const promise = characterise(
      { card: card250, grid: grid('pmos'), sections },
      { pool, engine: 'native', signal: controller.signal, instancesPerRun: 6, onProgress: () => (controller.signal.aborted ? (progressAfterCancel += 1) : controller.abort()) },
    );
    await expect(promise).rejects.toMatchObject({ code: 'CHARACTERISATION_CANCELLED' });
    expect(progressAfterCancel).toBe(0);
  });
});
