import { apiErrorBodySchema, processFileSchema, processProfileSchema, type Problem } from '@channelwright/shared/schemas';
import { DEMO_ACCOUNTS } from '../src/seed/demo-accounts.js';
import { countLibraryRows, lineOf, processFixture } from './fixtures/processes/process-fixtures.js';
import { bearer, createTestApp, type TestApp } from './helpers/test-app.js';

describe('POST /api/processes/import', () => {
  let t: TestApp;
  let admin: string;

  beforeAll(async () => {
    t = await createTestApp();
    admin = await t.loginAs(DEMO_ACCOUNTS.admin.email);
  });
  afterAll(() => t.close());

  const upload = (file: Buffer, name: string, fields: Record<string, string> = {}) => {
    const request = t.http().post('/api/processes/import').set(bearer(admin));
    for (const [key, value] of Object.entries(fields)) request.field(key, value);
    return request.attach('file', file, name);
  };

  /** Uploads a broken file; expects 400 IMPORT_INVALID, nothing stored; returns the problems. */
  const refused = async (file: Buffer, name: string): Promise<Problem[]> => {
    const before = await countLibraryRows(t.dataSource);
    const response = await upload(file, name).expect(400);
    const body = apiErrorBodySchema.parse(response.body);
    expect(body).toMatchObject({ statusCode: 400, code: 'IMPORT_INVALID', field: 'file' });
    expect(body.message).toContain('nothing was stored');
    expect(await countLibraryRows(t.dataSource)).toEqual(before);
    return body.problems ?? [];
  };

  describe('good files', () => {
    it('imports our JSON file as a new profile with exactly its numbers', async () => {
      const fixture = processFixture('good-process.json');
      const response = await upload(fixture, 'good-process.json').expect(201);
      const profile = processProfileSchema.parse(response.body);
      const expected = processFileSchema.parse(JSON.parse(fixture.toString('utf8')));
      expect(profile).toMatchObject({ name: 'BF110-G', nodeClass: '110 nm', latestVersion: 1, version: { message: 'Imported from a file' } });
      expect(profile.version.definition).toEqual(expected.process);
    });

    it('imports the CSV, reading SI prefixes and units in the value or the unit cell', async () => {
      const response = await upload(processFixture('good-process.csv'), 'good-process.csv', { message: 'first import' }).expect(201);
      const { version, ...profile } = processProfileSchema.parse(response.body);
      expect(profile).toMatchObject({ name: 'BF160-G', nodeClass: '160 nm', vdd: 1.5, tnom: 27, corners: ['TT', 'FF', 'SS'] });
      expect(version.message).toBe('first import');
      const { nmos, pmos, corners, flavours, tempRange, description } = version.definition;
      expect(description).toBe("Invented demo data, not any foundry's process. A 160 nm-class test profile.");
      expect(tempRange).toEqual({ min: -40, max: 125 });
      // "310u" + "A/V²", "70 µA/V²" in the value cell, "3.6n" + "m" and "3.6" + "nm", "0.33" + "fF/µm", "-1" + "mV/K", "5m" + "V·µm".
      expect([nmos.kp, pmos.kp, nmos.tox, pmos.tox, nmos.cgdo, nmos.vtTc, pmos.vtTc, nmos.avt, pmos.avt]).toEqual([
        310e-6, 70e-6, 3.6e-9, 3.6e-9, 0.33e-9, -1e-3, -1.2e-3, 4e-9, 5e-9,
      ]);
      expect([nmos.lRef, pmos.lRef, pmos.ldiff, pmos.lmin, nmos.wgrid, nmos.jg, pmos.gamma]).toEqual([0.4e-6, 400e-9, 0.44e-6, 0.16e-6, 5e-9, 2e-6, 0.38]);
      // A unit starting with a digit ("1/V") must not run into the number.
      expect([nmos.lambda, pmos.lambda, nmos.muExp]).toEqual([0.09, 0.11, -1.5]);
      expect(pmos.jg).toBeUndefined();
      expect(corners.find((c) => c.name === 'FF')).toEqual({ name: 'FF', nmos: { dvt: -0.035, kpScale: 1.08 }, pmos: { dvt: -0.035, kpScale: 1.08 } });
      // A flavour starts from its polarity's parameters; its rows override them.
      expect(flavours).toEqual([
        { name: 'native', polarity: 'nmos', description: 'Native NMOS, depletion mode', params: { ...nmos, vt0: -0.1, gamma: 0.12, lmin: 0.5e-6, wmin: 0.5e-6 } },
      ]);
    });

    it('imports a file as a new version of a profile when given profileId and baseVersion, refusing a stale base', async () => {
      const exported = (await t.http().get('/api/processes?search=BF130-G').set(bearer(admin)).expect(200)).body[0];
      const file = processFileSchema.parse((await t.http().get(`/api/processes/${exported.id}/export`).set(bearer(admin)).expect(200)).body);
      file.process.nmos.vt0 = 0.37;
      const body = Buffer.from(JSON.stringify(file));
      const response = await upload(body, 'bf130.json', { profileId: exported.id, baseVersion: '1', message: 'vt0 from the new lot' }).expect(201);
      expect(response.body).toMatchObject({ id: exported.id, latestVersion: 2, version: { number: 2, message: 'vt0 from the new lot' } });
      const stale = await upload(body, 'bf130.json', { profileId: exported.id, baseVersion: '1' }).expect(409);
      expect(stale.body.code).toBe('STALE_EDIT');
      const halfTarget = await upload(body, 'bf130.json', { profileId: exported.id }).expect(400);
      expect(halfTarget.body).toMatchObject({ code: 'VALIDATION_FAILED', field: 'baseVersion' });
    });

    it('refuses a second profile of the same name with 409 PROCESS_NAME_TAKEN', async () => {
      const before = await countLibraryRows(t.dataSource);
      const response = await upload(processFixture('good-process.csv'), 'again.csv').expect(409);
      expect(response.body).toMatchObject({ code: 'PROCESS_NAME_TAKEN', field: 'name' });
      expect(await countLibraryRows(t.dataSource)).toEqual(before);
    });
  });

  describe('broken files: refused whole, every problem by row and field, nothing stored', () => {
    it('a kp given in volts: the unit cell of its row', async () => {
      const file = processFixture('wrong-unit.csv');
      const problems = await refused(file, 'wrong-unit.csv');
      expect(problems).toEqual([{ row: lineOf(file, 'kp,nmos,310u,V'), field: 'unit', message: expect.stringMatching(/kp \(nmos\) takes a transconductance parameter \(A\/V²\).*voltage/) }]);
    });

    it('a row without its polarity', async () => {
      const file = processFixture('missing-polarity.csv');
      expect(await refused(file, 'missing-polarity.csv')).toEqual([
        { row: lineOf(file, 'vt0,,0.44,V'), field: 'polarity', message: 'vt0: polarity is missing (nmos or pmos)' },
      ]);
    });

    it('text where a number belongs', async () => {
      const file = processFixture('text-in-number.csv');
      expect(await refused(file, 'text-in-number.csv')).toEqual([
        { row: lineOf(file, 'zero point four'), field: 'value', message: 'gamma (nmos): "zero point four" is not a number' },
      ]);
    });

    it('a parameter given twice', async () => {
      const file = processFixture('duplicated-parameter.csv');
      const second = lineOf(file, 'lambda,nmos,0.1,1/V');
      expect(await refused(file, 'duplicated-parameter.csv')).toEqual([
        { row: second, field: 'parameter', message: `lambda (nmos) is given twice (rows ${second - 1} and ${second}): keep one` },
      ]);
    });

    it('rows left out: named by the row to add', async () => {
      const problems = await refused(processFixture('missing-rows.csv'), 'missing-rows.csv');
      expect(problems).toEqual([
        { field: 'parameter', message: 'vdd is missing: add a row vdd,process,<value>,V' },
        { field: 'parameter', message: 'corner.FF.kpScale (pmos) is missing: add a row corner.FF.kpScale,pmos,<value>,' },
      ]);
    });

    it('an empty file', async () => {
      expect(await refused(processFixture('empty.csv'), 'empty.csv')).toEqual([{ row: 1, field: 'file', message: 'The file is empty' }]);
    });

    it('a byte-order mark and semicolons, both reported at row 1', async () => {
      const problems = await refused(processFixture('bom-semicolons.csv'), 'bom-semicolons.csv');
      expect(problems).toHaveLength(2);
      expect(problems[0]).toMatchObject({ row: 1, field: 'file', message: expect.stringContaining('byte-order mark') });
      expect(problems[1]).toMatchObject({ row: 1, field: 'header', message: expect.stringContaining('semicolons') });
    });

    it('JSON that does not parse: the line of the syntax error', async () => {
      const file = processFixture('bad-syntax.json');
      const problems = await refused(file, 'bad-syntax.json');
      expect(problems).toEqual([{ row: lineOf(file, '"kp": 0.00042'), field: 'file', message: expect.stringContaining('Not valid JSON') }]);
    });

    it('JSON with a value out of its range: the field', async () => {
      const problems = await refused(processFixture('out-of-range.json'), 'out-of-range.json');
      expect(problems).toEqual([{ field: 'process.nmos.kp', message: expect.stringContaining('kp must be in') }]);
    });

    it('a 5 MB file answers 413 PAYLOAD_TOO_LARGE with the error body', async () => {
      const before = await countLibraryRows(t.dataSource);
      const big = Buffer.concat([processFixture('good-process.csv'), Buffer.alloc(5 * 1024 * 1024, '#')]);
      const response = await upload(big, 'big.csv').expect(413);
      expect(apiErrorBodySchema.parse(response.body)).toMatchObject({ statusCode: 413, code: 'PAYLOAD_TOO_LARGE', field: 'file' });
      expect(await countLibraryRows(t.dataSource)).toEqual(before);
    });

    it('no file at all answers 400 FILE_REQUIRED', async () => {
      const response = await t.http().post('/api/processes/import').set(bearer(admin)).field('message', 'no file').expect(400);
      expect(response.body).toMatchObject({ code: 'FILE_REQUIRED', field: 'file' });
    });
  });
});
