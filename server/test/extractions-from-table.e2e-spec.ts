import { join } from 'node:path';
import { channelCurrentAt, prepareDevice } from '@channelwright/shared/device';
import { apiErrorBodySchema, type CharacterisationTable, characterisationTableListSchema, type DeviceParams, type Extraction, extractionSchema } from '@channelwright/shared/schemas';
import { DEMO_ACCOUNTS } from '../src/seed/demo-accounts.js';
import { createCardProfile, finished as jobFinished, followJob, test250Definition } from './helpers/characterisation.js';
import { runDc } from './helpers/level1-curves.js';
import { describeWithNgspice, requireNativeNgspice } from './helpers/ngspice.js';
import { bearer, createTestApp, type TestApp } from './helpers/test-app.js';

/*
 * Fitting a profile's all-region parameters to a characterised table: the invented BSIM4 250 nm test card
 * (test/fixtures/model-cards/test-250nm.lib) characterised over a small NMOS grid, its TT lines fitted through
 * POST /api/extractions/from-table, and the fitted model checked against Debian's ngspice simulating the card on its
 * own (not through the table): ID at bias points off the table's VDS and VSB values, and the threshold voltage by the
 * maximum-transconductance linear extrapolation (Ortiz-Conde et al., Microelectronics Reliability 42, 2002).
 */

const CARD = join(__dirname, 'fixtures/model-cards/test-250nm.lib');
const GRID = { lengths: [0.25e-6, 0.5e-6, 1e-6], vgsStep: 0.025, vds: [0.1, 1.25, 2.5], vsb: [0, 0.8], corners: ['TT', 'FF'], temperatures: [27] };
const W = 10e-6;

// Characterisations and fits run on worker threads at a low priority: on a busy machine they take minutes (no test
// times them; these limits only keep a hung run from waiting forever).
jest.setTimeout(900_000);

/** ID of the card's tn25 at TT, 27 °C, by native ngspice: one VGS sweep (0 … 2.5 V in `step`) per (L, VDS, VSB). */
function simulated(curves: { l: number; vds: number; vsb: number }[], step: number): { vgs: number[]; id: number[][] } {
  const lines = ['* Invented test card, simulated on its own', `.lib '${CARD}' tt`, '.temp 27', 'vg g 0 0'];
  curves.forEach(({ l, vds, vsb }, k) => lines.push(`m${k} d${k} g 0 b${k} tn25 w=${W} l=${l}`, `vd${k} d${k} 0 ${vds}`, `vb${k} b${k} 0 ${-vsb}`));
  const run = runDc(lines, `dc vg 0 2.5 ${step}`, ['v(g)', ...curves.map((_, k) => `i(vd${k})`)]);
  return { vgs: run.get('v(g)') as number[], id: curves.map((_, k) => (run.get(`i(vd${k})`) as number[]).map((i) => -i)) };
}

/**
 * Threshold voltage by the extrapolation in the linear region (ELR): the tangent of ID(VGS) at the maximum of gm
 * meets ID = 0 at VGS_i, and VT = VGS_i − VDS/2 (Ortiz-Conde et al., Microelectronics Reliability 42, 2002, §2.2).
 */
function thresholdByMaxGm(vgs: readonly number[], id: readonly number[], vds: number): number {
  let best = 1;
  for (let k = 1; k < vgs.length - 1; k++) if (id[k + 1] - id[k - 1] > id[best + 1] - id[best - 1]) best = k;
  const gm = (id[best + 1] - id[best - 1]) / (vgs[best + 1] - vgs[best - 1]);
  return vgs[best] - id[best] / gm - vds / 2;
}

describe('fitting a profile from a characterised table', () => {
  let t: TestApp;
  let admin: string;
  let designer: string;
  let processId: string;
  let table: CharacterisationTable;

  beforeAll(async () => {
    t = await createTestApp();
    admin = await t.loginAs(DEMO_ACCOUNTS.admin.email);
    designer = await t.loginAs(DEMO_ACCOUNTS.designer.email);
    processId = (await createCardProfile(t, admin, 'T250-fit')).id;
    const job = (await t.http().post('/api/characterisations').set(bearer(admin)).send({ processId, devices: [{ polarity: 'nmos' }], grid: GRID }).expect(202)).body;
    const last = (await followJob(t, admin, job.id, jobFinished, 600_000)).at(-1);
    if (last?.status !== 'done') throw new Error(`the characterisation ended ${last?.status}: ${JSON.stringify(last?.error)}`);
    const tables = characterisationTableListSchema.parse((await t.http().get(`/api/processes/${processId}/tables`).set(bearer(admin)).expect(200)).body);
    table = tables.find((candidate) => candidate.current && candidate.polarity === 'nmos') as CharacterisationTable;
  });
  afterAll(() => t?.close());

  const fromTable = (body: object, token = admin) => t.http().post('/api/extractions/from-table').set(bearer(token)).send({ processId, version: 1, polarity: 'nmos', corner: 'TT', ...body });
  const finished = async (id: string, token = admin): Promise<Extraction> => {
    for (;;) {
      const job = extractionSchema.parse((await t.http().get(`/api/extractions/${id}`).set(bearer(token)).expect(200)).body);
      if (job.status !== 'queued' && job.status !== 'running') return job;
      await new Promise((resolve) => setTimeout(resolve, 100));
    }
  };
  const rowCounts = async () => {
    const [{ n: uploads }] = await t.dataSource.query(`SELECT COUNT(*) AS "n" FROM "extraction_uploads"`);
    const [{ n: extractions }] = await t.dataSource.query(`SELECT COUNT(*) AS "n" FROM "extractions"`);
    return { uploads, extractions };
  };

  describeWithNgspice('the all-region fit of the TT lines, against native ngspice', () => {
    let job: Extraction;
    let fitted: DeviceParams;
    let base: DeviceParams;
    const modelId = (params: DeviceParams, l: number, vgs: number, vds: number, vsb: number) =>
      channelCurrentAt(prepareDevice({ ...test250Definition('check'), nmos: params }, 'nmos', { temperature: 27 }), 'all-region', W, l, vgs, vds, vsb);

    beforeAll(async () => {
      requireNativeNgspice();
      const queued = extractionSchema.parse((await fromTable({ model: 'all-region' }).expect(202)).body);
      job = await finished(queued.id);
      if (job.status !== 'done' || !job.result) throw new Error(`the fit ended ${job.status}: ${JSON.stringify(job.error)}`);
      fitted = job.result.fitted;
      base = test250Definition('base').nmos;
    });

    it('keeps the table\'s TT lines as an upload whose header names the process, version, table hash and corner', async () => {
      expect(job.source).toMatchObject({ kind: 'upload', points: 3 * 3 * 2 * 101, table: { processId, processName: 'T250-fit', version: 1, polarity: 'nmos', flavour: null, tableId: table.id, sha256: table.sha256, corner: 'TT', model: 'tn25' } });
      expect(job.source.curves).toHaveLength(3 * 3 * 2);
      const csv = (await t.http().get(`/api/extractions/${job.id}/upload`).set(bearer(admin)).expect(200)).text;
      const comments = csv.split('\n').filter((line) => line.startsWith('#')).join('\n');
      expect(comments).toMatch(/T250-fit version 1, NMOS \(card model tn25\), corner TT/);
      expect(comments).toContain(`SHA-256 ${table.sha256}`);
      expect(csv).toMatch(/^VGS \[V\],VDS \[V\],VSB \[V\],T \[°C\],W \[um\],L \[um\],NF,ID \[A\]$/m);
    });

    // ±10 %: issue 13's target for the all-region model against a BSIM4 card (what is left is the shape of moderate
    // inversion, docs/extraction.md). Measured: +8.5 % and −1.7 %; the unfitted base profile is off by +36 % and +52 %.
    it('gives ID within 10 % of ngspice at two bias points off the table\'s VDS and VSB values, where the base profile is off by more', () => {
      const points = [
        { l: 0.5e-6, vgs: 0.9, vds: 1.8, vsb: 0.4 },
        { l: 1e-6, vgs: 1.5, vds: 1.8, vsb: 0.4 },
      ];
      const spice = points.map((p) => simulated([p], 0.05));
      const rows = points.map((p, k) => {
        const reference = spice[k].id[0][spice[k].vgs.findIndex((v) => Math.abs(v - p.vgs) < 1e-9)];
        return { ...p, ngspice: reference, fitted: modelId(fitted, p.l, p.vgs, p.vds, p.vsb), base: modelId(base, p.l, p.vgs, p.vds, p.vsb) };
      });
      console.log(JSON.stringify(rows));
      for (const row of rows) {
        expect(Math.abs(row.fitted / row.ngspice - 1)).toBeLessThan(0.1);
      }
      expect(Math.max(...rows.map((row) => Math.abs(row.base / row.ngspice - 1)))).toBeGreaterThan(0.1);
    });

    // The FF lines of the table have VTH0 40 mV lower (the card's corners): a fit of the wrong corner's lines fails this.
    // Measured: 3.5 mV apart (ngspice 522.4 mV, the fitted model 525.9 mV).
    it('gives the max-gm extrapolated VT of ngspice\'s linear-region curve (VDS 50 mV, L 1 µm) within 10 mV', () => {
      const vds = 0.05;
      const spice = simulated([{ l: 1e-6, vds, vsb: 0 }], 0.005);
      const model = spice.vgs.map((vgs) => modelId(fitted, 1e-6, vgs, vds, 0));
      const vtSpice = thresholdByMaxGm(spice.vgs, spice.id[0], vds);
      const vtFitted = thresholdByMaxGm(spice.vgs, model, vds);
      console.log(JSON.stringify({ vtSpice, vtFitted, vt0: fitted.vt0 }));
      expect(Math.abs(vtFitted - vtSpice)).toBeLessThan(0.01);
    });

    it('saves as a new version whose message and audit entry name the table the points came from', async () => {
      const saved = (await t.http().post(`/api/extractions/${job.id}/save`).set(bearer(admin)).send({}).expect(201)).body;
      expect(saved.version.message).toMatch(/^Parameters fitted to the TT lines of a characterised table of T250-fit version 1 \(extraction /);
      const [audit] = await t.query(`SELECT * FROM "audit_events" WHERE "action" = 'extraction.saved' AND "entityId" = ?`, [processId]);
      expect(JSON.parse(audit.after)).toMatchObject({ extractionId: job.id, source: { kind: 'table', tableId: table.id, sha256: table.sha256, corner: 'TT', version: 1 }, model: 'all-region' });
      expect(audit.summary).toContain(`to the TT lines of the NMOS table of T250-fit version 1 (SHA-256 ${table.sha256.slice(0, 12)}…)`);
    });
  });

  it('reads only the chosen lengths, and refuses a corner or a length the table does not have, or a version without tables, naming the field; nothing is stored', async () => {
    const before = await rowCounts();
    const corner = apiErrorBodySchema.parse((await fromTable({ corner: 'SS' }).expect(400)).body);
    expect(corner).toMatchObject({ code: 'CORNER_NOT_IN_TABLE', field: 'corner' });
    expect(corner.message).toMatch(/no corner SS \(it has TT, FF\)/);
    const length = apiErrorBodySchema.parse((await fromTable({ lengths: [0.3e-6] }).expect(400)).body);
    expect(length).toMatchObject({ code: 'VALIDATION_FAILED', field: 'lengths' });
    expect(length.message).toMatch(/300 nm is not a length L of the table \(it has 250 nm, 500 nm, 1 µm\)/);
    expect((await fromTable({ corner: '' }).expect(400)).body).toMatchObject({ code: 'VALIDATION_FAILED', field: 'corner' });
    expect((await fromTable({ version: 7 }).expect(404)).body).toMatchObject({ code: 'PROCESS_VERSION_NOT_FOUND', field: 'version' });
    const bare = await createCardProfile(t, admin, 'T250-uncharacterised');
    expect((await fromTable({ processId: bare.id }).expect(409)).body).toMatchObject({ code: 'TABLE_NOT_CHARACTERISED', field: 'polarity' });
    expect((await fromTable({ polarity: 'pmos' }).expect(409)).body).toMatchObject({ code: 'TABLE_NOT_CHARACTERISED', field: 'polarity' });
    expect(await rowCounts()).toEqual(before);

    const some = extractionSchema.parse((await fromTable({ lengths: [1e-6], vds: [1.25, 2.5], model: 'square-law' }).expect(202)).body);
    expect(some.source.curves).toHaveLength(2 * 2);
    expect(new Set(some.source.curves.map((c) => c.l))).toEqual(new Set([1e-6]));
    expect(new Set(some.source.curves.map((c) => c.vds))).toEqual(new Set([1.25, 2.5]));
    await t.http().delete(`/api/extractions/${some.id}`).set(bearer(admin));
  });

  it('answers 409 while the version\'s table is still being characterised', async () => {
    const pending = await createCardProfile(t, admin, 'T250-pending');
    const job = (await t.http().post('/api/characterisations').set(bearer(admin)).send({ processId: pending.id, devices: [{ polarity: 'nmos' }], grid: { ...GRID, temperatures: [-40, 27, 85, 125] } }).expect(202)).body;
    const refused = apiErrorBodySchema.parse((await fromTable({ processId: pending.id }).expect(409)).body);
    expect(refused).toMatchObject({ code: 'TABLE_NOT_READY', field: 'polarity' });
    await t.http().delete(`/api/characterisations/${job.id}`).set(bearer(admin)).expect(200);
  });

  it('is open to whoever may upload curves (a designer who reads the process), not to someone who cannot see it', async () => {
    const started = extractionSchema.parse((await fromTable({ lengths: [1e-6], model: 'square-law' }, designer).expect(202)).body);
    expect(started.createdBy?.displayName).toBe(DEMO_ACCOUNTS.designer.displayName);
    await t.http().delete(`/api/extractions/${started.id}`).set(bearer(designer));
    const outsider = await t.register({ email: 'outsider-fit@example.invalid', password: 'a long enough password', displayName: 'Outsider' });
    expect((await fromTable({}, outsider.accessToken).expect(404)).body).toMatchObject({ code: 'PROCESS_NOT_FOUND', field: 'processId' });
  });
});
