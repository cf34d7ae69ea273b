import { parseModelCard } from '@channelwright/shared/model-card';
import { apiErrorBodySchema, modelCardCheckSchema, processDiffSchema, processFileSchema, processProfileSchema, storedModelCardSchema } from '@channelwright/shared/schemas';
import { createHash } from 'node:crypto';
import { DEMO_ACCOUNTS } from '../src/seed/demo-accounts.js';
import { countLibraryRows } from './fixtures/processes/process-fixtures.js';
import { createCardProfile, TEST_CARD_250, test250Definition } from './helpers/characterisation.js';
import { bearer, createTestApp, type TestApp } from './helpers/test-app.js';

// Model cards on process versions: uploaded through the import flow, parsed (never trusted), stored re-emitted with
// their hash and mapping; refused whole, with every problem's line, when anything in them is outside the subset.

describe('model cards on process versions', () => {
  let t: TestApp;
  let admin: string;
  let designer: string;
  let profileId: string;

  beforeAll(async () => {
    t = await createTestApp();
    admin = await t.loginAs(DEMO_ACCOUNTS.admin.email);
    designer = await t.loginAs(DEMO_ACCOUNTS.designer.email);
    const created = await t.http().post('/api/processes').set(bearer(admin)).send({ definition: test250Definition('T250-cards') }).expect(201);
    profileId = created.body.id;
  });
  afterAll(() => t.close());

  const upload = (token: string, text: string | Buffer, name: string, fields: Record<string, string> = {}) => {
    const request = t.http().post('/api/processes/import').set(bearer(token));
    for (const [key, value] of Object.entries(fields)) request.field(key, value);
    return request.attach('file', Buffer.isBuffer(text) ? text : Buffer.from(text), name);
  };
  const latest = async () => processProfileSchema.parse((await t.http().get(`/api/processes/${profileId}`).set(bearer(admin)).expect(200)).body);

  it('stores an uploaded card as a new version of the base version\'s process, with the re-emitted text, its SHA-256 and a mapping guessed from the names', async () => {
    const base = await latest();
    const response = await upload(admin, TEST_CARD_250, 'test-250nm.lib', { profileId, baseVersion: String(base.latestVersion), message: 'BSIM4 card from the test lot' }).expect(201);
    const profile = processProfileSchema.parse(response.body);
    expect(profile).toMatchObject({ latestVersion: base.latestVersion + 1, version: { message: 'BSIM4 card from the test lot', definition: base.version.definition } });
    const card = storedModelCardSchema.parse((await t.http().get(`/api/processes/${profileId}/model-card`).set(bearer(designer)).expect(200)).body);
    expect(card.sha256).toBe(createHash('sha256').update(card.text).digest('hex'));
    expect(profile.version.modelCard).toMatchObject({ sha256: card.sha256, bytes: Buffer.byteLength(card.text) });
    expect(profile.version.modelCardSha256).toBe(card.sha256);
    expect(card.mapping).toEqual({ corners: { TT: 'tt', FF: 'ff', SS: 'ss' }, devices: [{ model: 'tn25', polarity: 'nmos' }, { model: 'tp25', polarity: 'pmos' }] });
    expect(card.sections.map((s) => [s.name, s.models.map((m) => `${m.name}/${m.polarity}/${m.level}`)])).toEqual([
      ['tt', ['tn25/nmos/54', 'tp25/pmos/54']],
      ['ff', ['tn25/nmos/54', 'tp25/pmos/54']],
      ['ss', ['tn25/nmos/54', 'tp25/pmos/54']],
    ]);
    // The stored text is ours: none of the upload's comment lines, the same statements when read again.
    expect(card.text).not.toContain('INVENTED TEST DATA');
    expect(parseModelCard(card.text)).toEqual(parseModelCard(TEST_CARD_250));
  });

  it('refuses a card with a .control block, an .include and an .option, listing each refused line, and stores nothing', async () => {
    const before = await countLibraryRows(t.dataSource);
    const base = await latest();
    const card = ['* invented', '.model n1 nmos level=54 vth0=0.4', '.control', 'shell rm -rf /', '.endc', '.include /etc/passwd', '.option reltol=1e-2'].join('\n');
    const response = await upload(admin, card, 'evil.lib', { profileId, baseVersion: String(base.latestVersion) }).expect(400);
    const body = apiErrorBodySchema.parse(response.body);
    expect(body).toMatchObject({ code: 'MODEL_CARD_REFUSED', field: 'card' });
    expect(body.message).toContain('nothing was stored');
    expect(body.problems?.map((p) => p.row)).toEqual([3, 4, 5, 6, 7]);
    expect(body.problems?.[0].message).toMatch(/\.control/);
    expect(await countLibraryRows(t.dataSource)).toEqual(before);
  });

  it('refuses a card written wrongly (a value that is not a number) with MODEL_CARD_INVALID and its line', async () => {
    const base = await latest();
    const response = await upload(admin, '* invented\n.model n1 nmos level=54\n+ vth0=abc', 'bad.lib', { profileId, baseVersion: String(base.latestVersion) }).expect(400);
    expect(apiErrorBodySchema.parse(response.body)).toMatchObject({ code: 'MODEL_CARD_INVALID', problems: [{ row: 3, field: 'card' }] });
  });

  it('answers a 3 MB card with 413 PAYLOAD_TOO_LARGE and stores nothing', async () => {
    const before = await countLibraryRows(t.dataSource);
    const big = Buffer.alloc(3 * 1024 * 1024, '* invented padding line of a very large card\n');
    const response = await upload(admin, big, 'big.lib', { profileId, baseVersion: '1' }).expect(413);
    expect(apiErrorBodySchema.parse(response.body)).toMatchObject({ statusCode: 413, code: 'PAYLOAD_TOO_LARGE', field: 'file' });
    expect(await countLibraryRows(t.dataSource)).toEqual(before);
  });

  it('refuses a mapping naming a model the card lacks or a corner the process lacks, each entry named, nothing stored', async () => {
    const before = await countLibraryRows(t.dataSource);
    const base = await latest();
    const mapping = JSON.stringify({ corners: { TT: 'tt', XX: 'ss' }, devices: [{ model: 'nope', polarity: 'nmos' }] });
    const response = await upload(admin, TEST_CARD_250, 'card.lib', { profileId, baseVersion: String(base.latestVersion), mapping }).expect(400);
    const body = apiErrorBodySchema.parse(response.body);
    expect(body.code).toBe('MODEL_CARD_MAPPING_INVALID');
    expect(body.problems?.map((p) => p.field)).toEqual(['mapping.corners.XX', 'mapping.devices.0.model']);
    expect(await countLibraryRows(t.dataSource)).toEqual(before);
    const notJson = await upload(admin, TEST_CARD_250, 'card.lib', { profileId, baseVersion: String(base.latestVersion), mapping: '{corners' }).expect(400);
    expect(notJson.body).toMatchObject({ code: 'VALIDATION_FAILED', field: 'mapping' });
  });

  it('needs a profile and base version for a card alone, and a maintainer', async () => {
    const alone = await upload(admin, TEST_CARD_250, 'card.lib').expect(400);
    expect(alone.body).toMatchObject({ code: 'VALIDATION_FAILED', field: 'profileId' });
    const base = await latest();
    const forbidden = await upload(designer, TEST_CARD_250, 'card.lib', { profileId, baseVersion: String(base.latestVersion) }).expect(403);
    expect(forbidden.body.code).toBe('NOT_PROCESS_MAINTAINER');
  });

  it('checks a card without storing it: its sections and a guessed mapping, or its problems by line', async () => {
    const before = await countLibraryRows(t.dataSource);
    const check = modelCardCheckSchema.parse((await t.http().post('/api/processes/model-cards/check').set(bearer(admin)).field('profileId', profileId).attach('file', Buffer.from(TEST_CARD_250), 'c.lib').expect(200)).body);
    expect(check).toMatchObject({ ok: true, problems: [], card: { mapping: { corners: { TT: 'tt', FF: 'ff', SS: 'ss' } } } });
    const refused = modelCardCheckSchema.parse((await t.http().post('/api/processes/model-cards/check').set(bearer(admin)).field('profileId', profileId).attach('file', Buffer.from('.model n nmos level=54\n.include x'), 'c.lib').expect(200)).body);
    expect(refused).toMatchObject({ ok: false, card: null, problems: [{ line: 2, field: 'card' }] });
    expect(await countLibraryRows(t.dataSource)).toEqual(before);
  });

  it('keeps the card across an edit of the definition, removes it with modelCard null, and shows both in the diff', async () => {
    const base = await latest();
    expect(base.version.modelCard).not.toBeNull();
    const edited = { ...base.version.definition, description: 'tnom kept, description edited' };
    const kept = processProfileSchema.parse((await t.http().put(`/api/processes/${profileId}`).set(bearer(admin)).send({ baseVersion: base.latestVersion, definition: edited }).expect(200)).body);
    expect(kept.version.modelCard?.sha256).toBe(base.version.modelCard?.sha256);
    const removed = processProfileSchema.parse((await t.http().put(`/api/processes/${profileId}`).set(bearer(admin)).send({ baseVersion: kept.latestVersion, definition: edited, modelCard: null }).expect(200)).body);
    expect(removed.version.modelCard).toBeNull();
    const diff = processDiffSchema.parse((await t.http().get(`/api/processes/${profileId}/diff`).set(bearer(admin)).expect(200)).body);
    expect(diff.changes).toContainEqual(expect.objectContaining({ path: 'modelCard.sha256', group: 'modelCard', kind: 'removed' }));
    expect((await t.http().get(`/api/processes/${profileId}/model-card`).set(bearer(admin)).expect(404)).body.code).toBe('PROCESS_HAS_NO_MODEL_CARD');
  });

  it('exports a version with its card and imports it back as a new profile with the same card', async () => {
    const source = await createCardProfile(t, admin, 'T250-export');
    const file = processFileSchema.parse((await t.http().get(`/api/processes/${source.id}/export`).set(bearer(admin)).expect(200)).body);
    expect(file.modelCard?.mapping?.devices).toHaveLength(2);
    file.process.name = 'T250-reimported';
    const imported = processProfileSchema.parse((await upload(admin, JSON.stringify(file), 'copy.json').expect(201)).body);
    expect(imported.version.modelCard?.sha256).toBe(source.version.modelCard?.sha256);
  });

  it('never lets a stored version\'s card change (the immutability trigger covers it)', async () => {
    await expect(t.query(`UPDATE "process_versions" SET "modelCard" = 'x' WHERE "modelCard" IS NOT NULL`)).rejects.toThrow(/immutable/);
  });

  it('gives the invented demo processes their invented cards, mapped to every corner and device', async () => {
    const list = (await t.http().get('/api/processes?search=BF180-G').set(bearer(admin)).expect(200)).body;
    const card = storedModelCardSchema.parse((await t.http().get(`/api/processes/${list[0].id}/model-card`).set(bearer(admin)).expect(200)).body);
    expect(card.mapping.corners).toEqual({ TT: 'tt', FF: 'ff', SS: 'ss', FS: 'fs', SF: 'sf' });
    expect(card.mapping.devices).toContainEqual({ model: 'bfn18na', polarity: 'nmos', flavour: 'native' });
  });
});
