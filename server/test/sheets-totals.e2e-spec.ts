import { sheetListSchema, sheetSchema, type Device, type Process, type Sheet } from '@channelwright/shared/schemas';
import { processByName, signInEveryone, wrenmoss, type Tokens } from './fixtures/sheets/sheet-fixtures.js';
import { bearer, createTestApp, type TestApp } from './helpers/test-app.js';

describe('sheet totals, on the seeded Wrenmoss sheets (invented demo data)', () => {
  let t: TestApp;
  let tokens: Tokens;
  let bf180: Process;
  const sheets = new Map<string, Sheet>();

  beforeAll(async () => {
    t = await createTestApp();
    tokens = await signInEveryone(t);
    const project = await wrenmoss(t, tokens.designer);
    bf180 = (await processByName(t, tokens.designer, 'BF180-G')).definition;
    const list = sheetListSchema.parse((await t.http().get(`/api/projects/${project.id}/sheets`).set(bearer(tokens.viewer)).expect(200)).body);
    for (const summary of list) sheets.set(summary.name, sheetSchema.parse((await t.http().get(`/api/sheets/${summary.id}`).set(bearer(tokens.viewer)).expect(200)).body));
  });
  afterAll(() => t.close());

  const sheet = (name: string) => sheets.get(name)!;
  const device = (sheetName: string, name: string): Device => sheet(sheetName).devices.find((d) => d.targets.name === name)!;
  const relative = (actual: number, expected: number) => Math.abs(actual - expected) / Math.abs(expected);

  describe('the seed', () => {
    it('computed and stored a result for every device, on BF180-G\'s latest version, none stale', () => {
      for (const s of sheets.values()) {
        expect(s.process).toMatchObject({ name: 'BF180-G', version: s.process.latestVersion });
        expect(s.devices.every((d) => d.result !== null && !d.stale)).toBe(true);
        expect(s.totals.failedDeviceIds).toEqual([]);
      }
    });

    it('has weak, moderate and strong inversion in the amplifier, with bias currents from 100 nA to 200 µA', () => {
      const amplifier = sheet('Two-stage amplifier').devices;
      expect(new Set(amplifier.map((d) => d.result!.region))).toEqual(new Set(['weak', 'moderate', 'strong']));
      const currents = amplifier.map((d) => d.targets.id);
      expect(Math.min(...currents)).toBeCloseTo(100e-9, 15);
      expect(Math.max(...currents)).toBeCloseTo(200e-6, 15);
    });

    it('has stacked bias devices whose VT rises with VSB as γ(√(2φF + VSB) − √(2φF))', () => {
      // SPICE level-1 body effect (Shichman & Hodges, IEEE JSSC 3(3), 1968), at tnom and TT.
      const { vt0, gamma, twoPhiF } = bf180.nmos;
      for (const name of ['MN3', 'MN4']) {
        const d = device('Bias generator', name);
        expect(d.targets.vsb).toBeGreaterThan(0);
        expect(d.result!.vt).toBeCloseTo(vt0 + gamma * (Math.sqrt(twoPhiF + d.targets.vsb) - Math.sqrt(twoPhiF)), 9);
      }
    });

    it('has a native depletion NMOS start-up source that conducts at VGS = 0, left out of the leakage', () => {
      const native = device('Bias generator', 'MNAT');
      expect(native.targets).toMatchObject({ flavour: 'native', vgs: 0 });
      expect(native.result!.vt).toBeLessThan(0);
      expect(native.result!.warnings.map((w) => w.code)).toContain('DEPLETION_CONDUCTS_AT_VGS0');
      expect(sheet('Bias generator').totals.leakage.conductingDeviceIds).toEqual([native.id]);
    });

    it('has a large NMOS sleep switch computed at 125 °C', () => {
      const sw = device('Sleep switch', 'MSW');
      expect(sw.result).toMatchObject({ temperature: 125, polarity: 'nmos' });
      expect(sw.result!.w).toBeGreaterThan(100e-6);
      expect(sw.result!.fingers).toBeGreaterThan(1);
      expect(sw.result!.ioff).toBeGreaterThan(0);
    });
  });

  describe('totals', () => {
    it('add ID·multiplier of the supply branches for the supply current, and multiply by VDD for the power', () => {
      const amplifier = sheet('Two-stage amplifier');
      // The demo's supply branches: tail 20 µA, second stage 200 µA, bias diode 2 µA, trickle leg 100 nA (invented demo data).
      expect(relative(amplifier.totals.supplyCurrent, 20e-6 + 200e-6 + 2e-6 + 100e-9)).toBeLessThan(1e-9);
      expect(amplifier.totals.supplyPower).toBeCloseTo(amplifier.totals.supplyCurrent * bf180.vdd, 15);
      expect(amplifier.totals.vdd).toBe(bf180.vdd);
    });

    it('add W·L·multiplier for the gate area', () => {
      const bias = sheet('Bias generator');
      const expected = bias.devices.reduce((sum, d) => sum + d.result!.w * d.result!.l * d.targets.multiplier, 0);
      expect(device('Bias generator', 'MN2').targets.multiplier).toBe(4);
      expect(relative(bias.totals.gateArea, expected)).toBeLessThan(1e-12);
    });

    it('take the off-state leakage at the hottest temperature of the process at SS and FF, equal to the corners API summed over the devices', async () => {
      for (const name of ['Two-stage amplifier', 'Sleep switch']) {
        const s = sheet(name);
        expect(s.totals.leakage.slowest).toMatchObject({ corner: 'SS', temperature: bf180.tempRange!.max });
        expect(s.totals.leakage.fastest).toMatchObject({ corner: 'FF', temperature: bf180.tempRange!.max });
        for (const which of ['slowest', 'fastest'] as const) {
          let expected = 0;
          for (const d of s.devices) {
            const { polarity, flavour, l, vds, vsb } = d.sizeRequest;
            const body = { process: bf180, polarity, flavour, w: d.result!.w, l, vds, vsb, bias: 'voltage', vgs: d.result!.vgs, corners: [s.totals.leakage[which].corner], temperatures: [bf180.tempRange!.max] };
            const response = await t.http().post('/api/compute/corners').set(bearer(tokens.viewer)).send(body).expect(200);
            expected += response.body.points[0].op.ioff * d.targets.multiplier;
          }
          expect(relative(s.totals.leakage[which].current, expected)).toBeLessThan(1e-12);
        }
        // A faster corner (lower VT) leaks more (common practice, no source).
        expect(s.totals.leakage.fastest.current).toBeGreaterThan(s.totals.leakage.slowest.current);
      }
    });

    it('estimate the offset of a matched pair with Pelgrom\'s law: σ(VOS) = √(σ(ΔVT)² + (σ(Δβ/β)/(gm/ID))²)', () => {
      const amplifier = sheet('Two-stage amplifier');
      const pair = amplifier.totals.matchGroups.find((g) => g.name === 'input pair')!;
      const [m1, m2] = [device('Two-stage amplifier', 'M1'), device('Two-stage amplifier', 'M2')];
      expect(new Set(pair.worstPair)).toEqual(new Set([m1.id, m2.id]));
      // Pelgrom, Duinmaijer & Welbers, IEEE JSSC 24(5), 1989: σ(ΔVT) = AVT/√(W·L), σ(Δβ/β) = Aβ/√(W·L) for a pair.
      const { avt, abeta } = bf180.pmos;
      const area = m1.result!.w * m1.result!.l;
      const sigmaVt = avt / Math.sqrt(area);
      const sigmaBeta = abeta / Math.sqrt(area);
      expect(pair.sigmaVt!).toBeCloseTo(sigmaVt, 12);
      expect(pair.sigmaVos!).toBeCloseTo(Math.sqrt(sigmaVt ** 2 + (sigmaBeta / m1.result!.gmId) ** 2), 12);
      expect(amplifier.totals.matchGroups.map((g) => g.name)).toEqual(['input pair', 'mirror load']);
    });

    it('list the devices with warnings and count the warnings', () => {
      const sleep = sheet('Sleep switch');
      const warned = sleep.devices.filter((d) => d.result!.warnings.length > 0);
      expect(sleep.totals.warningDeviceIds).toEqual(warned.map((d) => d.id));
      expect(sleep.totals.warningCount).toBe(warned.reduce((n, d) => n + d.result!.warnings.length, 0));
      // The switch is on in deep triode: VDS below VDSsat is expected and said.
      expect(device('Sleep switch', 'MSW').result!.warnings.map((w) => w.code)).toContain('VDS_BELOW_VDSSAT');
    });
  });
});
