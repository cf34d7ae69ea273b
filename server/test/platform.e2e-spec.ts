import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { apiErrorBodySchema, healthResponseSchema, publicConfigSchema } from '@channelwright/shared/schemas';
import { SERVER_VERSION } from '../src/config/paths.js';
import { createTestApp, type TestApp } from './helpers/test-app.js';

describe('the platform: health, config, errors, limits, headers, docs', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());

  it('GET /api/health is public and reports the version and the database', async () => {
    const response = await t.http().get('/api/health').expect(200);
    expect(healthResponseSchema.parse(response.body)).toEqual({ status: 'ok', version: SERVER_VERSION, db: 'ok' });
    expect(SERVER_VERSION).toMatch(/^\d+\.\d+\.\d+/);
  });

  it('GET /api/config is public and tells the client about sign-up and the demo', async () => {
    const response = await t.http().get('/api/config').expect(200);
    expect(publicConfigSchema.parse(response.body)).toEqual({ signupEnabled: true, demo: true, version: SERVER_VERSION });
  });

  it('answers an unknown API route with 404 ROUTE_NOT_FOUND in the error body', async () => {
    const response = await t.http().get('/api/no-such-thing').expect(404);
    expect(response.body).toEqual({ statusCode: 404, code: 'ROUTE_NOT_FOUND', message: expect.any(String) });
    const post = await t.http().post('/api/health').send({}).expect(404);
    expect(post.body.code).toBe('ROUTE_NOT_FOUND');
  });

  it('answers a body over 1 MB with 413 PAYLOAD_TOO_LARGE in the error body', async () => {
    const big = { email: 'a@b.example', password: 'x'.repeat(1024 * 1024 + 10) };
    const response = await t.http().post('/api/auth/login').send(big).expect(413);
    expect(apiErrorBodySchema.parse(response.body)).toEqual({ statusCode: 413, code: 'PAYLOAD_TOO_LARGE', message: expect.any(String) });
  });

  it('sends helmet security headers and no CORS permission to other origins', async () => {
    const response = await t.http().get('/api/health').set('Origin', 'https://elsewhere.example').expect(200);
    expect(response.headers['x-content-type-options']).toBe('nosniff');
    expect(response.headers['content-security-policy']).toContain("default-src 'self'");
    expect(response.headers['content-security-policy']).not.toContain('upgrade-insecure-requests');
    expect(response.headers['x-powered-by']).toBeUndefined();
    expect(response.headers['access-control-allow-origin']).toBeUndefined();
  });

  it('publishes an OpenAPI document whose request and response schemas come from the shared zod schemas', async () => {
    const response = await t.http().get('/api/docs-json').expect(200);
    const document = response.body;
    expect(document.openapi).toMatch(/^3\./);
    const login = document.paths['/api/auth/login'].post;
    const body = login.requestBody.content['application/json'].schema;
    expect(body.required).toEqual(expect.arrayContaining(['email', 'password']));
    expect(body.properties.email).toMatchObject({ type: 'string', maxLength: 254 });
    const ok = login.responses['200'].content['application/json'].schema;
    expect(Object.keys(ok.properties)).toEqual(['accessToken', 'user']);
    expect(document.paths['/api/users/{id}'].patch.requestBody.content['application/json'].schema.properties.role.enum).toEqual(['admin', 'member']);
    expect(document.components.schemas.ApiErrorBody.required).toEqual(['statusCode', 'code', 'message']);
    await t.http().get('/api/docs').expect(200).expect('Content-Type', /html/);
  });

  it('builds its schema from the migrations alone: every migration applied, every column of every entity there', async () => {
    const applied = await t.query('SELECT name FROM migrations ORDER BY id');
    expect(applied.length).toBe(t.dataSource.migrations.length);
    for (const entity of t.dataSource.entityMetadatas) {
      const columns = entity.columns.map((column) => `"${column.databaseName}"`).join(', ');
      await expect(t.query(`SELECT ${columns} FROM "${entity.tableName}" LIMIT 0`)).resolves.toEqual([]);
    }
  });
});

describe('serving the built client', () => {
  let t: TestApp;
  const indexHtml = '<!doctype html><title>Channelwright test build</title><div id="root"></div>';
  const clientDist = mkdtempSync(join(tmpdir(), 'channelwright-client-'));

  beforeAll(async () => {
    mkdirSync(join(clientDist, 'assets'));
    writeFileSync(join(clientDist, 'index.html'), indexHtml);
    writeFileSync(join(clientDist, 'assets', 'app.js'), 'console.log("built")');
    t = await createTestApp({ env: { CLIENT_DIST: clientDist } });
  });
  afterAll(async () => {
    await t.close();
    rmSync(clientDist, { recursive: true, force: true });
  });

  it('serves index.html at / and for client-side routes, and the built assets', async () => {
    expect((await t.http().get('/').expect(200)).text).toBe(indexHtml);
    expect((await t.http().get('/projects/123').expect(200)).text).toBe(indexHtml);
    expect((await t.http().get('/assets/app.js').expect(200)).text).toBe('console.log("built")');
  });

  it('still answers unknown API routes with the JSON error body, not the page', async () => {
    const response = await t.http().get('/api/nope').expect(404);
    expect(response.body.code).toBe('ROUTE_NOT_FOUND');
  });
});
