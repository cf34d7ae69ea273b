import { createHash } from 'node:crypto';
import { apiErrorBodySchema } from '@channelwright/shared/schemas';
import { DEMO_ACCOUNTS } from '../src/seed/demo-accounts.js';
import { bearer, createTestApp, type TestApp } from './helpers/test-app.js';
import { TEST_DATABASE_ENGINE } from './helpers/test-database.js';

// A corpus of malformed requests against every route that takes a JSON body (found in the server's own
// OpenAPI document, so a new route joins the corpus by itself) and against the uploads. Every answer must be
// a 4xx with the error body, never a 5xx, and a refused request must leave every table exactly as it was.
// The bad values are common practice for API robustness testing (no source): wrong JSON types, numbers
// written as text (NaN, Infinity), out-of-range magnitudes, empty and oversized text, unicode, SQL and markup.

type Post = ReturnType<ReturnType<TestApp['http']>['post']>;
type JsonSchema = { type?: string; enum?: unknown[]; properties?: Record<string, JsonSchema>; required?: string[]; anyOf?: JsonSchema[] };
interface Operation {
  method: 'post' | 'put' | 'patch';
  path: string;
  schema: JsonSchema;
}

/** Values a field of this JSON type must refuse: never a valid value of it. */
const WRONG_TYPE: Record<string, unknown[]> = {
  number: ['NaN', 'Infinity', '-Infinity', '1e3x', '', {}, [], true],
  integer: ['NaN', 'Infinity', '12abc', 2.5, {}, [], false],
  string: [42, {}, [], true],
  boolean: ['yes', 1, {}, []],
  object: ['text', 42, [], true],
  array: ['text', 42, {}, true],
};
/** Values that may or may not be valid for a field (a range, or text): any answer but a 5xx, and a refusal writes nothing. */
const EDGE: Record<string, unknown[]> = {
  number: [-1, 0, 1e308, -1e308, 5e-324, null],
  integer: [-1, 0, 2 ** 53, null],
  string: ['', ' ', 'Ω µ 漢字 🙂 \u202e', "'; DROP TABLE users; --", '<script>alert(1)</script><img src=x onerror=alert(1)>', 'x'.repeat(20_000), null],
  boolean: [null],
  object: [{}, null],
  array: [[], null],
};

const typeOf = (schema: JsonSchema | undefined): string => schema?.type ?? (schema?.enum ? 'string' : (schema?.anyOf?.find((s) => s.type && s.type !== 'null')?.type ?? 'object'));

describe('a corpus of malformed requests', () => {
  let t: TestApp;
  let tokens: { admin: string; designer: string; reviewer: string };
  const ids: Record<string, string> = {};
  const counts = { requests: 0, refused: 0, accepted: 0 };

  beforeAll(async () => {
    t = await createTestApp();
    tokens = {
      admin: await t.loginAs(DEMO_ACCOUNTS.admin.email),
      designer: await t.loginAs(DEMO_ACCOUNTS.designer.email),
      reviewer: await t.loginAs(DEMO_ACCOUNTS.reviewer.email),
    };
    const get = async (path: string, token = tokens.designer) => (await t.http().get(path).set(bearer(token)).expect(200)).body;
    const [project] = await get('/api/projects');
    const [sheet] = await get(`/api/projects/${project.id}/sheets`);
    const full = await get(`/api/sheets/${sheet.id}`);
    const [process] = await get('/api/processes', tokens.admin);
    const revision = (await t.http().post(`/api/sheets/${sheet.id}/revisions`).set(bearer(tokens.designer)).send({ message: 'Corpus baseline' }).expect(201)).body;
    const users = await get('/api/users', tokens.admin);
    Object.assign(ids, { project: project.id, sheet: sheet.id, device: full.devices[0].id, process: process.id, revision: revision.id, user: users.find((u: { email: string }) => u.email === DEMO_ACCOUNTS.viewer.email).id });
  });
  afterAll(() => t.close());

  /**
   * A digest of every row of every table: equal digests, nothing written. Mail is delivered in the background
   * after the request that queued it: the outbox counts by its rows (a refused request queues none), not by
   * their delivery state, and the local mail sink's received copies are left out.
   */
  async function digest(): Promise<string> {
    const postgres = TEST_DATABASE_ENGINE === 'postgres';
    const tables: Array<{ name: string }> = await t.query(
      postgres
        ? `SELECT "table_name" AS "name" FROM "information_schema"."tables" WHERE "table_schema" = current_schema() AND "table_type" = 'BASE TABLE' AND "table_name" <> 'received_mail' ORDER BY "table_name"`
        : `SELECT "name" FROM sqlite_master WHERE "type" = 'table' AND "name" NOT LIKE 'sqlite_%' AND "name" <> 'received_mail' ORDER BY "name"`,
    );
    const hash = createHash('sha256');
    for (const { name } of tables) {
      const columns = name === 'outbox_messages' ? '"id"' : '*';
      // Storage order, stable while nothing is written: SQLite's rowid, PostgreSQL's ctid.
      hash.update(name).update(JSON.stringify(await t.query(`SELECT ${columns} FROM "${name}" ORDER BY ${postgres ? 'ctid' : 'rowid'}`)));
    }
    return hash.digest('hex');
  }

  /** The path with its parameters filled by real rows, so the request gets past "not found" to the body checks. */
  function concrete(path: string): string {
    return path
      .replace(/^\/api\/projects\/\{id\}/, `/api/projects/${ids.project}`)
      .replace(/^\/api\/sheets\/\{id\}/, `/api/sheets/${ids.sheet}`)
      .replace(/\{deviceId\}/, ids.device!)
      .replace(/^\/api\/processes\/\{id\}/, `/api/processes/${ids.process}`)
      .replace(/^\/api\/revisions\/\{id\}/, `/api/revisions/${ids.revision}`)
      .replace(/^\/api\/users\/\{id\}/, `/api/users/${ids.user}`)
      .replace(/\{userId\}/, ids.user!)
      .replace(/\{[^}]+\}/g, '00000000-0000-4000-8000-000000000000');
  }

  /**
   * A valid body for the routes where one is simple to write: each bad value then replaces one field of a
   * request that would otherwise be accepted, so it is that field's check that answers. Other routes get the
   * field alone.
   */
  const validBodies = (): Record<string, Record<string, unknown>> => {
    const device = { polarity: 'nmos', id: 10e-6, l: 0.5e-6, vds: 0.6 };
    return {
      'post /api/compute/size': { processId: ids.process, ...device, gmId: 12 },
      'post /api/compute/sweep': { processId: ids.process, ...device, vov: 0.2, hold: 'id', sweep: { param: 'vov', from: 0.05, to: 0.4, points: 11 } },
      'post /api/compute/corners': { processId: ids.process, polarity: 'nmos', l: 0.5e-6, vds: 0.6, w: 2e-6, bias: 'current', id: 10e-6 },
      'post /api/processes/derive': { tox: 4e-9, substrateDoping: 1e23 },
      'post /api/projects': { name: 'Corpus project' },
      'post /api/projects/{id}/sheets': { name: 'Corpus sheet', processId: ids.process },
      'post /api/projects/{id}/members': { email: 'corpus@fenwick.example', role: 'viewer' },
      'post /api/sheets/{id}/devices': { name: 'MC1', ...device, vov: 0.2 },
      'post /api/sheets/{id}/revisions': { message: 'Corpus revision' },
      'post /api/revisions/{id}/comments': { body: 'Corpus comment' },
    };
  };

  const tokenFor = (path: string) => (/^\/api\/(users|processes|characterisations|admin)/.test(path) ? tokens.admin : tokens.designer);

  /** Sends one request; checks: no 5xx; a 4xx carries the error body and wrote nothing. Returns the status. */
  async function send(operation: Operation, body: unknown, raw = false): Promise<number> {
    const before = await digest();
    const request = t.http()[operation.method](concrete(operation.path)).set(bearer(tokenFor(operation.path)));
    const response = raw ? await request.set('Content-Type', 'application/json').send(body as string) : await request.send(body as object);
    counts.requests += 1;
    const where = `${operation.method.toUpperCase()} ${operation.path} with ${JSON.stringify(body)?.slice(0, 120)}`;
    expect({ where, status: response.status < 500 }).toEqual({ where, status: true });
    if (response.status >= 400) {
      counts.refused += 1;
      expect({ where, body: apiErrorBodySchema.safeParse(response.body).success }).toEqual({ where, body: true });
      expect({ where, unchanged: (await digest()) === before }).toEqual({ where, unchanged: true });
    } else counts.accepted += 1;
    return response.status;
  }

  it('answers every malformed JSON body with a 4xx and the error body, never a 5xx, and writes nothing when it refuses', async () => {
    const document = (await t.http().get('/api/docs-json').expect(200)).body as { paths: Record<string, Record<string, { requestBody?: { content?: Record<string, { schema?: JsonSchema }> } }>> };
    const operations: Operation[] = [];
    for (const [path, methods] of Object.entries(document.paths)) {
      for (const [method, operation] of Object.entries(methods)) {
        const schema = operation.requestBody?.content?.['application/json']?.schema;
        if (schema && (method === 'post' || method === 'put' || method === 'patch')) operations.push({ method, path, schema });
      }
    }
    expect(operations.length).toBeGreaterThan(20);

    const valid = validBodies();
    for (const operation of operations) {
      const properties = Object.entries(operation.schema.properties ?? {});
      const base = valid[`${operation.method} ${operation.path}`] ?? {};
      // The valid body is accepted as it is, so a refusal below is the changed field's.
      if (Object.keys(base).length > 0) {
        const status = await send(operation, base);
        expect({ route: operation.path, accepted: status >= 200 && status < 300 }).toEqual({ route: operation.path, accepted: true });
      }
      // The body as a whole: not an object, not JSON, an unknown field alone.
      for (const body of [[], 'text', 42]) expect(await send(operation, JSON.stringify(body), true)).toBeGreaterThanOrEqual(400);
      expect(await send(operation, '{"unterminated": ', true)).toBe(400);
      if ((operation.schema.required ?? []).length > 0) expect(await send(operation, {})).toBeGreaterThanOrEqual(400);
      expect(await send(operation, { surelyNotAField: 1 })).toBeGreaterThanOrEqual(400);
      // Each field with a value of the wrong type (refused), and with edge values (never a 5xx).
      for (const [name, schema] of properties) {
        const type = typeOf(schema);
        for (const value of WRONG_TYPE[type] ?? []) expect(await send(operation, { ...base, [name]: value })).toBeGreaterThanOrEqual(400);
        for (const value of EDGE[type] ?? []) await send(operation, { ...base, [name]: value });
      }
    }
    // Printed so the closing note can quote it; the assertions above already hold for each request.
    process.stdout.write(`bad-input corpus: ${counts.requests} requests over ${operations.length} routes, ${counts.refused} refused, ${counts.accepted} accepted (edge values that are valid)\n`);
    expect(counts.requests).toBeGreaterThan(300);
  }, 900_000);

  it('refuses a body over the 1 MB limit with 413 and the error body', async () => {
    const response = await t.http().post('/api/projects').set(bearer(tokens.designer)).send({ name: 'Big', description: 'x'.repeat(1_100_000) });
    expect(response.status).toBe(413);
    expect(apiErrorBodySchema.parse(response.body)).toMatchObject({ statusCode: 413 });
  });

  it('refuses broken uploads to the process import with a 4xx naming the problem, and stores nothing', async () => {
    const upload = async (build: (request: Post) => PromiseLike<{ status: number; body: unknown }>) => {
      const before = await digest();
      const response = await build(t.http().post('/api/processes/import').set(bearer(tokens.admin)));
      expect(response.status).toBeGreaterThanOrEqual(400);
      expect(response.status).toBeLessThan(500);
      expect(apiErrorBodySchema.safeParse(response.body).success).toBe(true);
      expect(await digest()).toBe(before);
    };
    const csv = (text: string, name = 'profile.csv') => (request: Post) => request.attach('file', Buffer.from(text, 'utf8'), name);
    await upload((request) => request.send({}));
    await upload(csv(''));
    await upload(csv('\ufeffparameter;polarity;value;unit\n\n"vt0";nmos;"0,45";V\n'));
    await upload(csv('parameter,polarity,value,unit\nvt0,nmos,NaN,V\nkp,nmos,Infinity,A/V^2\n'));
    await upload(csv('parameter,polarity,value,unit\n"vt0,nmos,0.45,V\n'));
    await upload(csv('{"format": "not ours"}', 'profile.json'));
    await upload(csv('<?xml version="1.0"?><process/>', 'profile.xml'));
    await upload(csv('x'.repeat(3_000_000)));
    await upload((request) => request.set('Content-Type', 'multipart/form-data; boundary=nothing').send('--nothing\r\nbroken'));
  });
});
