import { BF180G, computeSize, matchGroupMismatch } from '@channelwright/shared/device';
import { matchGroupResizeSchema, sheetSchema, type Sheet } from '@channelwright/shared/schemas';
import { countDeviceRows, demoSheet, signInEveryone, type Tokens } from './fixtures/sheets/sheet-fixtures.js';
import { bearer, createTestApp, type TestApp } from './helpers/test-app.js';

describe('POST /api/sheets/:id/match-groups/resize', () => {
  let t: TestApp;
  let tokens: Tokens;
  let amplifier: Sheet;

  const resize = (body: object, token = tokens.designer) => t.http().post(`/api/sheets/${amplifier.id}/match-groups/resize`).set(bearer(token)).send(body);
  const rows = () => t.query('SELECT "id", "version", "targets", "result" FROM "devices" WHERE "sheetId" = ? ORDER BY "position"', [amplifier.id]);

  beforeAll(async () => {
    t = await createTestApp();
    tokens = await signInEveryone(t);
    amplifier = await demoSheet(t, tokens.designer, 'Two-stage amplifier');
  });
  afterAll(() => t.close());

  it('shows a plan that meets the input pair\'s budget of 2 mV at the same gm/ID, and writes nothing', async () => {
    const before = await rows();
    const plan = matchGroupResizeSchema.parse((await resize({ group: 'input pair' }).expect(200)).body);
    expect(plan.target).toBe(2e-3);
    expect(plan.keep).toBe('gmId');
    expect(plan.applied).toBe(false);
    expect(plan.after.sigmaVos).toBeLessThanOrEqual(2e-3);
    // The 2.0 model sizes the pair wider than 2 mV needs (1.63 mV), so the plan shrinks it; on the width grid and
    // with gm/ID drifting with L (n(L), λ(L)) it lands within 2 % under the target.
    expect(plan.before.sigmaVos).toBeLessThan(2e-3);
    expect(plan.after.sigmaVos).toBeGreaterThan(0.98 * 2e-3);
    // The same group sized by hand with the engine at the plan's length gives the plan's offset (Pelgrom 1989, Kinget 2005).
    const sized = plan.members.map((m) => computeSize({ processId: 'bf180g', polarity: 'pmos', id: 10e-6, l: m.to.l, vds: 0.6, gmId: 16 }, BF180G));
    const { avt, abeta } = BF180G.pmos;
    const check = matchGroupMismatch(sized.map((s) => ({ avt, abeta, w: s.w, l: s.l, gmId: s.gmId })));
    expect(check?.sigmaVos).toBeCloseTo(plan.after.sigmaVos, 12);
    expect(await rows()).toEqual(before);
  });

  it('applies the plan in one transaction: both members re-sized, the totals meet the budget', async () => {
    const plan = matchGroupResizeSchema.parse((await resize({ group: 'input pair' }).expect(200)).body);
    const versions = Object.fromEntries(plan.members.map((m) => [m.deviceId, m.version]));
    const applied = matchGroupResizeSchema.parse((await resize({ group: 'input pair', apply: true, versions }).expect(200)).body);
    expect(applied.applied).toBe(true);
    const sheet = sheetSchema.parse((await t.http().get(`/api/sheets/${amplifier.id}`).set(bearer(tokens.viewer)).expect(200)).body);
    for (const member of applied.members) {
      const device = sheet.devices.find((d) => d.id === member.deviceId)!;
      expect(device.targets.l).toBe(member.to.l);
      expect(device.result?.w).toBe(member.to.w);
      expect(device.version).toBe(member.version + 1);
    }
    const group = sheet.totals.matchGroups.find((g) => g.name === 'input pair')!;
    expect(group.meetsBudget).toBe(true);
    expect(group.sigmaVos).toBeCloseTo(applied.after.sigmaVos, 15);
  });

  it('refuses to apply a plan whose members changed since: 409 STALE_EDIT, nothing written', async () => {
    const plan = matchGroupResizeSchema.parse((await resize({ group: 'mirror load', sigmaVos: 1e-3 }).expect(200)).body);
    const versions = Object.fromEntries(plan.members.map((m) => [m.deviceId, m.version + 1]));
    const before = await rows();
    expect((await resize({ group: 'mirror load', sigmaVos: 1e-3, apply: true, versions }).expect(409)).body.code).toBe('STALE_EDIT');
    expect(await rows()).toEqual(before);
  });

  it('answers 404 for a group the sheet lacks, 400 without a target, and 403 to a viewer, who may not edit', async () => {
    expect((await resize({ group: 'nope', sigmaVos: 1e-3 }).expect(404)).body).toMatchObject({ code: 'MATCH_GROUP_NOT_FOUND', field: 'group' });
    expect((await resize({ group: 'mirror load' }).expect(400)).body).toMatchObject({ code: 'OFFSET_TARGET_REQUIRED', field: 'sigmaVos' });
    expect((await resize({ group: 'input pair', apply: true }).expect(400)).body).toMatchObject({ code: 'VALIDATION_FAILED', field: 'versions' });
    expect((await resize({ group: 'input pair' }, tokens.viewer).expect(403)).body.code).toBe('FORBIDDEN');
    expect(await countDeviceRows(t, amplifier.id)).toBe(amplifier.devices.length);
  });
});
