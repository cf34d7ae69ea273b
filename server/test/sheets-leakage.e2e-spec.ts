import { BF180G, leakage, prepareDevice } from '@channelwright/shared/device';
import { sheetLeakageSchema, sheetSchema, type Sheet, type SheetLeakage } from '@channelwright/shared/schemas';
import { demoSheet, signInEveryone, type Tokens } from './fixtures/sheets/sheet-fixtures.js';
import { bearer, createTestApp, type TestApp } from './helpers/test-app.js';

describe('GET /api/sheets/:id/leakage', () => {
  let t: TestApp;
  let tokens: Tokens;
  let sleep: Sheet;
  let answer: SheetLeakage;

  beforeAll(async () => {
    t = await createTestApp();
    tokens = await signInEveryone(t);
    sleep = await demoSheet(t, tokens.viewer, 'Sleep switch');
    answer = sheetLeakageSchema.parse((await t.http().get(`/api/sheets/${sleep.id}/leakage`).set(bearer(tokens.viewer)).expect(200)).body);
  });
  afterAll(() => t.close());

  it('gives every device, at every temperature of the range at the fast corner, the off current the engine gives it alone', () => {
    expect(answer.fastCorner).toBe('FF');
    expect(answer.temperatures[0]).toBe(-40);
    expect(answer.temperatures.at(-1)).toBe(125);
    expect(answer.devices.map((d) => d.name)).toEqual(['MSW', 'MDN', 'MDP']);
    for (const row of answer.devices) {
      const device = sleep.devices.find((d) => d.id === row.deviceId)!;
      answer.temperatures.forEach((temperature, i) => {
        const single = leakage(prepareDevice(BF180G, device.targets.polarity, { corner: 'FF', temperature }), device.result!.w, device.result!.l);
        const terms = row.atFastCorner[i]!;
        expect(terms.total).toBeCloseTo((single.ioff as number) * device.targets.multiplier, 24);
        expect(terms.subthreshold + terms.gate + terms.junction + (terms.gidl ?? 0)).toBeCloseTo(terms.total, 24);
      });
    }
  });

  it('totals the devices per temperature and holds the worst corner against the sheet\'s budget of 50 nA at 125 °C (invented demo data)', () => {
    expect(answer.budget).toEqual({ current: 50e-9, temperature: 125 });
    answer.temperatures.forEach((_, i) => expect(answer.totals[i]).toBeCloseTo(answer.devices.reduce((sum, d) => sum + (d.atFastCorner[i]?.total ?? 0), 0), 24));
    const byCorner = answer.byCorner.map((c) => c.total);
    expect(answer.worst.total).toBe(Math.max(...byCorner));
    expect(answer.withinBudget).toBe(answer.worst.total <= 50e-9);
    const hot = answer.temperatures.indexOf(125);
    expect(answer.byCorner.find((c) => c.corner === 'FF')?.total).toBeCloseTo(answer.totals[hot], 24);
  });

  it('lists the depletion-mode start-up source of the bias generator apart, not as leakage', async () => {
    const bias = await demoSheet(t, tokens.viewer, 'Bias generator');
    const body = sheetLeakageSchema.parse((await t.http().get(`/api/sheets/${bias.id}/leakage`).set(bearer(tokens.viewer)).expect(200)).body);
    expect(body.conducting.map((d) => d.name)).toEqual(['MNAT']);
    expect(body.devices.map((d) => d.name)).not.toContain('MNAT');
    expect(body.budget).toBeNull();
    expect(body.withinBudget).toBeNull();
    expect(body.budgetTemperature).toBe(125);
  });

  it('follows a budget the designer sets on the sheet', async () => {
    const response = await t.http().patch(`/api/sheets/${sleep.id}`).set(bearer(tokens.designer)).send({ version: sleep.version, leakageBudget: { current: 1e-3, temperature: 85 } }).expect(200);
    expect(sheetSchema.parse(response.body).leakageBudget).toEqual({ current: 1e-3, temperature: 85 });
    const body = sheetLeakageSchema.parse((await t.http().get(`/api/sheets/${sleep.id}/leakage`).set(bearer(tokens.viewer)).expect(200)).body);
    expect(body.budgetTemperature).toBe(85);
    expect(body.withinBudget).toBe(true);
  });

  it('is refused to an outsider as if the sheet did not exist', async () => {
    expect((await t.http().get(`/api/sheets/${sleep.id}/leakage`).set(bearer(tokens.outsider)).expect(404)).body.code).toBe('SHEET_NOT_FOUND');
  });
});
