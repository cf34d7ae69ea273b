import { BF180G, cornerMatrixRows, matrixColumns } from '@channelwright/shared/device';
import { cornersResponseSchema, sheetCornersResponseSchema, sheetSchema, type Sheet, type SheetCornersResponse } from '@channelwright/shared/schemas';
import { newSheet, nmosTargets, processByName, signInEveryone, wrenmoss, type Tokens } from './fixtures/sheets/sheet-fixtures.js';
import { bearer, createTestApp, type TestApp } from './helpers/test-app.js';

describe('POST /api/sheets/:id/corners', () => {
  let t: TestApp;
  let tokens: Tokens;
  let sheet: Sheet;
  let bf180: { id: string; version: number };
  let matrix: SheetCornersResponse;

  const post = (body: object, token = tokens.designer, sheetId = sheet.id) => t.http().post(`/api/sheets/${sheetId}/corners`).set(bearer(token)).send(body);

  beforeAll(async () => {
    t = await createTestApp();
    tokens = await signInEveryone(t);
    const project = await wrenmoss(t, tokens.designer);
    bf180 = await processByName(t, tokens.designer, 'BF180-G');
    const created = await newSheet(t, tokens.designer, project.id, bf180.id, 'Corners');
    const bodies = [
      nmosTargets({ name: 'MN', limits: [{ figure: 'headroom', min: 0.05 }] }),
      nmosTargets({ name: 'MP', polarity: 'pmos', vds: 0.3, vov: undefined, gmId: 12, multiplier: 2, limits: [{ figure: 'headroom', min: 0.05 }, { figure: 'gmId', min: 11 }] }),
      nmosTargets({ name: 'MX', gmId: 40, vov: undefined }),
    ];
    for (const body of bodies) await t.http().post(`/api/sheets/${created.id}/devices`).set(bearer(tokens.designer)).send(body).expect(201);
    sheet = sheetSchema.parse((await t.http().get(`/api/sheets/${created.id}`).set(bearer(tokens.designer)).expect(200)).body);
    matrix = sheetCornersResponseSchema.parse((await post({}).expect(200)).body);
  });
  afterAll(() => t.close());

  it('covers every corner of the process at its range minimum, nominal and maximum, and skips a device without a result', () => {
    expect(matrix.columns.map((c) => `${c.corner}@${c.temperature}`)).toEqual(['TT', 'FF', 'SS', 'FS', 'SF'].flatMap((c) => [-40, 27, 125].map((temperature) => `${c}@${temperature}`)));
    expect(matrix.rows.map((r) => r.name)).toEqual(['MN', 'MP']);
    expect(matrix.skipped).toEqual([{ deviceId: sheet.devices[2].id, name: 'MX', reason: expect.stringContaining('Not sized') }]);
  });

  it('has in every cell what POST /api/compute/corners answers for that device, corner and temperature', async () => {
    for (const row of matrix.rows) {
      const device = sheet.devices.find((d) => d.id === row.deviceId)!;
      const single = cornersResponseSchema.parse(
        (
          await t
            .http()
            .post('/api/compute/corners')
            .set(bearer(tokens.designer))
            .send({ processId: bf180.id, polarity: device.targets.polarity, w: device.result!.w, l: device.result!.l, vds: device.result!.vds, bias: 'current', id: device.result!.id })
            .expect(200)
        ).body,
      );
      row.cells.forEach((cell, index) => {
        const point = single.points.find((p) => p.corner === matrix.columns[index].corner && p.temperature === matrix.columns[index].temperature)!;
        expect(cell.values.vgs).toBe(point.op!.vgs);
        expect(cell.values.gm).toBe(point.op!.gm);
        expect(cell.values.gmId).toBe(point.op!.gmId);
        expect(cell.values.intrinsicGain).toBe(point.op!.intrinsicGain);
        expect(cell.values.headroom).toBe(point.op!.vds - point.op!.vdsat);
      });
    }
  });

  it('marks the worst cell of each row: the least margin to a limit, failing cells marked', () => {
    const mp = matrix.rows.find((r) => r.name === 'MP')!;
    const margins = mp.cells.map((cell) => (cell.values.headroom as number) - 0.05);
    const worst = mp.worst.headroom!;
    expect(worst.column).toBe(margins.indexOf(Math.min(...margins)));
    expect(worst.status).toBe(margins[worst.column] < 0 ? 'fail' : margins[worst.column] < 0.005 ? 'tight' : 'ok');
    for (const cell of mp.cells) expect(cell.status.gmId).toBe((cell.values.gmId as number) < 11 ? 'fail' : (cell.values.gmId as number) < 12.1 ? 'tight' : 'ok');
    // Without a limit, VGS is worst where it is highest (slow, cold for this current).
    const vgs = mp.cells.map((c) => c.values.vgs as number);
    expect(mp.worst.vgs?.column).toBe(vgs.indexOf(Math.max(...vgs)));
  });

  it('checks one device on its own (the device page), and holds VGS with ±10 % supply when asked', async () => {
    const one = sheetCornersResponseSchema.parse((await post({ deviceIds: [sheet.devices[0].id], bias: 'voltage', vddTolerance: 0.1, temperatures: [85] }).expect(200)).body);
    expect(one.rows.map((r) => r.name)).toEqual(['MN']);
    expect(one.columns.length).toBe(5 * 4 * 3);
    expect(new Set(one.columns.map((c) => c.vdd))).toEqual(new Set([1.62, 1.8, 1.98].map((v) => expect.closeTo(v, 12)) as never));
    const tt27 = one.columns.findIndex((c) => c.corner === 'TT' && c.temperature === 27 && Math.abs(c.vdd - 1.8) < 1e-12);
    expect(one.rows[0].cells[tt27].values.idChange as number).toBeCloseTo(0, 9);
    expect(one.rows[0].worst.idChange).not.toBeNull();
  });

  it('gives the same matrix from the worker threads as inline for a sheet too large for the event loop', async () => {
    const project = await wrenmoss(t, tokens.designer);
    const big = await newSheet(t, tokens.designer, project.id, bf180.id, 'Forty devices');
    for (let i = 0; i < 40; i++) {
      await t.http().post(`/api/sheets/${big.id}/devices`).set(bearer(tokens.designer)).send(nmosTargets({ name: `M${i}`, id: (i + 1) * 1e-6, polarity: i % 2 ? 'pmos' : 'nmos' })).expect(201);
    }
    const answer = sheetCornersResponseSchema.parse((await post({}, tokens.viewer, big.id).expect(200)).body);
    expect(answer.rows.length * answer.columns.length).toBeGreaterThan(300);
    const stored = sheetSchema.parse((await t.http().get(`/api/sheets/${big.id}`).set(bearer(tokens.viewer)).expect(200)).body);
    const inline = cornerMatrixRows(
      BF180G,
      bf180.id,
      stored.devices.map((d) => ({ polarity: d.targets.polarity, model: d.result!.model, w: d.result!.w, l: d.result!.l, vds: d.result!.vds, vsb: d.result!.vsb, reference: { id: d.result!.id, vgs: d.result!.vgs }, limits: [] })),
      'current',
      matrixColumns(BF180G, {}),
    );
    expect(answer.rows.map((r) => ({ cells: r.cells, worst: r.worst }))).toEqual(inline);
  });

  it('answers 404 for a device of another sheet, 400 naming a bad field, and 404 to an outsider', async () => {
    expect((await post({ deviceIds: ['nope'] }).expect(404)).body).toMatchObject({ code: 'DEVICE_NOT_FOUND', field: 'deviceIds' });
    expect((await post({ vddTolerance: 0.9 }).expect(400)).body).toMatchObject({ code: 'VALIDATION_FAILED', field: 'vddTolerance' });
    expect((await post({ corners: ['XX'] }).expect(400)).body).toMatchObject({ code: 'UNKNOWN_CORNER' });
    expect((await post({}, tokens.outsider).expect(404)).body.code).toBe('SHEET_NOT_FOUND');
  });
});
