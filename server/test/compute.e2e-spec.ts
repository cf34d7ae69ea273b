import { BF180G, computeSweep } from '@channelwright/shared/device';
import { MAX_SWEEP_POINTS, MAX_SWEEP_TOTAL_POINTS, type SweepRequestInput } from '@channelwright/shared/schemas';
import { DEMO_ACCOUNTS } from '../src/seed/demo-accounts.js';
import { bearer, createTestApp, type TestApp } from './helpers/test-app.js';

const nmos = BF180G.nmos;
const lambdaAt = (l: number) => (nmos.lRef === undefined ? nmos.lambda : (nmos.lambda * nmos.lRef) / l);

/** A strong-inversion NMOS sizing on the invented demo process (invented demo data). */
const sizeBody = {
  process: BF180G,
  polarity: 'nmos',
  model: 'square-law',
  corner: 'TT',
  temperature: BF180G.tnom,
  id: 20e-6,
  l: 0.5e-6,
  vds: 0.9,
  vsb: 0,
  vov: 0.3,
};

describe('compute API', () => {
  let t: TestApp;
  let token: string;

  beforeAll(async () => {
    t = await createTestApp();
    token = await t.loginAs(DEMO_ACCOUNTS.designer.email);
  });
  afterAll(() => t.close());

  const post = (path: string, body: unknown) => t.http().post(`/api/compute/${path}`).set(bearer(token)).send(body as object);

  it('refuses an anonymous caller with 401', async () => {
    const response = await t.http().post('/api/compute/size').send(sizeBody);
    expect(response.status).toBe(401);
  });

  it('sizes a saturated square-law NMOS to W = 2·ID·L / (kp·VOV²·(1 + λ·VDS)) within one width-grid step', async () => {
    const response = await post('size', sizeBody);
    expect(response.status).toBe(200);
    // Shichman & Hodges, IEEE JSSC 3(3), 1968: saturation ID = (kp/2)(W/L)·VOV²·(1 + λ·VDS).
    const expectedW = (2 * sizeBody.id * sizeBody.l) / (nmos.kp * sizeBody.vov ** 2 * (1 + lambdaAt(sizeBody.l) * sizeBody.vds));
    expect(Math.abs(response.body.w - expectedW)).toBeLessThanOrEqual(nmos.wgrid);
    // The reached current is the target: the engine re-solves VGS at the snapped W.
    expect(response.body.id).toBeCloseTo(sizeBody.id, 12);
    // VSB = 0 at tnom and TT gives VT0 exactly (common practice, no source).
    expect(response.body.vt).toBeCloseTo(nmos.vt0, 12);
    // In square-law saturation gm = 2·ID/VOV (Shichman & Hodges 1968, derivative of the law above).
    expect(response.body.gm).toBeCloseTo((2 * response.body.id) / response.body.vov, 9);
    expect(response.body.region).toBe('strong');
    expect(response.body.saturated).toBe(true);
    expect(Array.isArray(response.body.warnings)).toBe(true);
  });

  it('raises VT with source-body bias as γ(√(2φF + VSB) − √(2φF))', async () => {
    const vsb = 0.5;
    const response = await post('size', { ...sizeBody, vsb });
    expect(response.status).toBe(200);
    // Body effect: e.g. Tsividis & McAndrew, Operation and Modeling of the MOS Transistor, 3rd ed., 2011 (from memory: ch. 4).
    const expected = nmos.vt0 + nmos.gamma * (Math.sqrt(nmos.twoPhiF + vsb) - Math.sqrt(nmos.twoPhiF));
    expect(response.body.vt).toBeCloseTo(expected, 12);
  });

  it('sweeps VGS at a held width and returns one series per corner × temperature with the chosen fields', async () => {
    const response = await post('sweep', {
      ...sizeBody,
      model: 'all-region',
      vov: undefined,
      w: 5e-6,
      hold: 'w',
      sweep: { param: 'vgs', from: 0, to: 1.8, points: 181, scale: 'lin' },
      corners: ['TT', 'SS', 'FF'],
      temperatures: [-40, 27, 125],
      fields: ['id', 'gm', 'gmId', 'vt'],
    });
    expect(response.status).toBe(200);
    expect(response.body.series).toHaveLength(9);
    for (const series of response.body.series) {
      expect(series.points).toHaveLength(181);
      const ids = series.points.map((p: { id: number }) => p.id);
      // ID rises with VGS at fixed W/L (common practice, no source).
      for (let i = 1; i < ids.length; i++) expect(ids[i]).toBeGreaterThan(ids[i - 1]);
      expect(Object.keys(series.points[0]).sort()).toEqual(['gm', 'gmId', 'id', 'vgs', 'vt']);
    }
    // Hotter gives a lower VT (common practice, no source).
    const tt = (temperature: number) => response.body.series.find((s: { corner: string; temperature: number }) => s.corner === 'TT' && s.temperature === temperature);
    expect(tt(125).points[0].vt).toBeLessThan(tt(-40).points[0].vt);
    // … and more subthreshold current at VGS = 0.1 V (common practice, no source).
    expect(tt(125).points[10].id).toBeGreaterThan(tt(-40).points[10].id);
  });

  describe('a large sweep (more points than the server computes on its own thread)', () => {
    const large: SweepRequestInput = {
      ...sizeBody,
      polarity: 'nmos',
      model: 'all-region',
      vov: undefined,
      w: 5e-6,
      hold: 'w',
      sweep: { param: 'vgs', from: 0, to: 1.8, points: 2000, scale: 'lin' },
      corners: ['TT', 'SS', 'FF'],
      temperatures: [-40, 27, 125],
    };

    it('answers 18,000 points computed by a worker thread exactly as the engine answers them here, in both layouts', async () => {
      for (const layout of ['points', 'columns'] as const) {
        const response = await post('sweep', { ...large, layout });
        expect(response.status).toBe(200);
        expect(response.headers['content-type']).toMatch(/^application\/json/);
        expect(response.body).toEqual(JSON.parse(JSON.stringify(computeSweep({ ...large, layout }))));
      }
    });

    it('names the wrong field of a large sweep as a small one does (an unknown corner, found in the worker)', async () => {
      const response = await post('sweep', { ...large, corners: ['TT', 'XX'] });
      expect(response.status).toBe(400);
      expect(response.body.field).toBe('corners.1');
    });
  });

  it('runs a sized device over corners × temperatures and names the worst case of each figure', async () => {
    const response = await post('corners', {
      process: BF180G,
      polarity: 'nmos',
      model: 'all-region',
      w: 5e-6,
      l: 0.5e-6,
      vds: 0.9,
      vsb: 0,
      bias: 'voltage',
      vgs: 1.2,
    });
    expect(response.status).toBe(200);
    expect(response.body.points.length).toBe((BF180G.corners.some((c) => c.name === 'TT') ? BF180G.corners.length : BF180G.corners.length + 1) * 3);
    const idAt = (corner: string, temperature: number) =>
      response.body.points.find((p: { corner: string; temperature: number }) => p.corner === corner && p.temperature === temperature).op.id;
    // At large overdrive the saturation current falls as the device gets hotter (common practice, no source).
    expect(idAt('TT', 125)).toBeLessThan(idAt('TT', -40));
    // SS (higher VT, lower kp) carries less current than FF at the same bias (common practice, no source).
    expect(idAt('SS', 27)).toBeLessThan(idAt('FF', 27));
    // The worst-case ID of a voltage-biased device is its lowest current, found among the points.
    const ids = response.body.points.map((p: { op: { id: number } }) => p.op.id);
    expect(response.body.extremes.id.min.value).toBe(Math.min(...ids));
  });

  describe('a stored process named by processId', () => {
    const seededId = async () => {
      const list = await t.http().get('/api/processes').set(bearer(token));
      return list.body.find((p: { name: string }) => p.name === BF180G.name).id as string;
    };

    it('gives the same answer as the same process sent inline', async () => {
      const processId = await seededId();
      const { process: _inline, ...byReference } = sizeBody;
      const stored = await post('size', { ...byReference, processId });
      const inline = await post('size', sizeBody);
      expect(stored.status).toBe(200);
      expect(stored.body.w).toBe(inline.body.w);
      expect(stored.body.vgs).toBe(inline.body.vgs);
      const version = await post('size', { ...byReference, processId, processVersion: 1 });
      expect(version.status).toBe(200);
      expect(version.body.w).toBe(inline.body.w);
    });

    it('answers 404 naming processId for an unknown profile and processVersion for a missing version', async () => {
      const { process: _inline, ...byReference } = sizeBody;
      const unknown = await post('size', { ...byReference, processId: 'no-such-profile' });
      expect(unknown.status).toBe(404);
      expect(unknown.body.field).toBe('processId');
      const missing = await post('sweep', { ...byReference, processId: await seededId(), processVersion: 99, hold: 'id', sweep: { param: 'vov', from: 0.1, to: 0.4, points: 4 } });
      expect(missing.status).toBe(404);
      expect(missing.body.field).toBe('processVersion');
    });
  });

  describe('bad input answers 400 naming the field', () => {
    const cases: Array<[string, Record<string, unknown>, string]> = [
      ['a string for the current', { id: '20u' }, 'id'],
      ['NaN (sent as null)', { id: null }, 'id'],
      ['a negative current', { id: -1e-6 }, 'id'],
      ['a zero current', { id: 0 }, 'id'],
      ['a negative length', { l: -0.5e-6 }, 'l'],
      ['two constraints at once', { gmId: 10 }, 'gmId'],
      ['no constraint', { vov: undefined }, 'vov'],
      ['an unknown corner', { corner: 'XX' }, 'corner'],
    ];
    it.each(cases)('%s', async (_label, change, field) => {
      const response = await post('size', { ...sizeBody, ...change });
      expect(response.status).toBe(400);
      expect(response.body.field).toBe(field);
      expect(typeof response.body.code).toBe('string');
      expect(response.body.message.length).toBeGreaterThan(0);
    });

    it('a negative width in a sweep', async () => {
      const response = await post('sweep', { ...sizeBody, vov: undefined, w: -1e-6, hold: 'w', sweep: { param: 'vgs', from: 0, to: 1, points: 11 } });
      expect(response.status).toBe(400);
      expect(response.body.field).toBe('w');
    });

    it('100,000 sweep points', async () => {
      const response = await post('sweep', { ...sizeBody, hold: 'id', sweep: { param: 'vov', from: 0.05, to: 0.5, points: 10 * MAX_SWEEP_POINTS } });
      expect(response.status).toBe(400);
      expect(response.body.field).toBe('sweep.points');
    });

    it('more points over all series than one answer may hold (10,000 points × 20 temperatures)', async () => {
      const response = await post('sweep', { ...sizeBody, hold: 'id', temperatures: Array.from({ length: 20 }, (_, i) => -40 + 8 * i), sweep: { param: 'vov', from: 0.05, to: 0.5, points: MAX_SWEEP_POINTS } });
      expect(response.status).toBe(400);
      expect(response.body.field).toBe('sweep.points');
      expect(response.body.message).toContain(`at most ${MAX_SWEEP_TOTAL_POINTS.toLocaleString('en')} points over all series`);
    });
  });
});
