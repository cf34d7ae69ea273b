import { mkdtempSync, readdirSync, readFileSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { extname, join } from 'node:path';
import { JwtService } from '@nestjs/jwt';
import type { NestExpressApplication } from '@nestjs/platform-express';
import request from 'supertest';
import { createApp } from '../src/app.factory.js';
import { SIGNING_KEY_FILE } from '../src/auth/signing-key.js';
import { REPO_ROOT } from '../src/config/paths.js';
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from '../src/seed/demo-accounts.js';
import { testDatabaseUrl } from './helpers/test-database.js';

/** Every quoted string of 8 to 200 characters in the repository's own files: what a reader of the source could sign with. */
function stringsInTheSource(): string[] {
  const skip = new Set(['node_modules', 'dist', 'data', '.git', 'coverage', 'screenshots', 'package-lock.json']);
  const found = new Set<string>();
  const walk = (folder: string) => {
    for (const entry of readdirSync(folder, { withFileTypes: true })) {
      if (skip.has(entry.name)) continue;
      const path = join(folder, entry.name);
      if (entry.isDirectory()) walk(path);
      else if (['.ts', '.tsx', '.mjs', '.js', '.cjs', '.md', '.json', '.yml', ''].includes(extname(entry.name)) && statSync(path).size < 2_000_000) {
        for (const match of readFileSync(path, 'utf8').matchAll(/(['"`])((?:(?!\1)[^\\\n]|\\.){8,200})\1/g)) found.add(match[2]);
      }
    }
  };
  walk(REPO_ROOT);
  return [...found];
}

describe('the signing key of a server started without JWT_SECRET, as `npm start` starts it', () => {
  const dataDir = mkdtempSync(join(tmpdir(), 'channelwright-key-'));
  // What main.ts reads from a shell with nothing set but where to keep the data: development mode, demo seeded (its
  // characterisation, which would only load the machine while this runs, left out).
  const env: Record<string, string> = { DATA_DIR: dataDir, CLIENT_DIST: join(dataDir, 'no-client-build'), DEMO_CHARACTERISATION: 'false' };
  let app: NestExpressApplication;
  let adminId: string;
  const http = () => request(app.getHttpServer());

  beforeAll(async () => {
    // In postgres mode the database is PostgreSQL's, made for this DATA_DIR (main.ts would read DATABASE_URL).
    const database = await testDatabaseUrl(dataDir);
    if (database) env.DATABASE_URL = database.url;
    app = await createApp({ env, logger: ['error'] });
    const login = await http().post('/api/auth/login').send({ email: DEMO_ACCOUNTS.admin.email, password: DEMO_PASSWORD }).expect(200);
    adminId = login.body.user.id;
  });
  afterAll(async () => {
    await app?.close();
    rmSync(dataDir, { recursive: true, force: true });
  });

  it('refuses an admin token forged with any string written in the repository (401)', async () => {
    const strings = stringsInTheSource();
    expect(strings.length).toBeGreaterThan(1000);
    // An HS256 token verifies only under its own key, so no string of the source may be the server's key…
    const key = readFileSync(join(dataDir, SIGNING_KEY_FILE), 'utf8').trim();
    expect(strings.filter((text) => text.includes(key))).toEqual([]);
    // …and the server itself refuses tokens signed with strings shaped like a secret (no spaces, 16+ characters):
    // an evenly spread sample of 400 of them over HTTP (the check above already covers every string; the
    // sample keeps this test's time from growing with the repository).
    const shaped = strings.filter((text) => !/\s/.test(text) && text.length >= 16);
    expect(shaped.length).toBeGreaterThan(500);
    const step = Math.max(1, Math.floor(shaped.length / 400));
    const candidates = shaped.filter((_, index) => index % step === 0);
    const exp = Math.floor(Date.now() / 1000) + 3600;
    const statuses = new Map<number, number>();
    for (let start = 0; start < candidates.length; start += 25) {
      const batch = candidates.slice(start, start + 25);
      const answers = await Promise.all(
        batch.map(async (secret) => {
          const forged = new JwtService({ secret }).sign({ sub: adminId, exp }, { algorithm: 'HS256' });
          return (await http().get('/api/users').set('Authorization', `Bearer ${forged}`)).status;
        }),
      );
      for (const status of answers) statuses.set(status, (statuses.get(status) ?? 0) + 1);
    }
    expect(Object.fromEntries(statuses)).toEqual({ 401: candidates.length });
  }, 120_000);

  it('keeps a 256-bit key in DATA_DIR readable by its owner only (mode 0600)', () => {
    const path = join(dataDir, SIGNING_KEY_FILE);
    expect(statSync(path).mode & 0o777).toBe(0o600);
    expect(Buffer.from(readFileSync(path, 'utf8').trim(), 'base64url')).toHaveLength(32);
  });

  it('refuses a token without an expiry, even signed with the real key', async () => {
    const key = readFileSync(join(dataDir, SIGNING_KEY_FILE), 'utf8').trim();
    const endless = new JwtService({ secret: key }).sign({ sub: adminId }, { algorithm: 'HS256' });
    const response = await http().get('/api/users').set('Authorization', `Bearer ${endless}`).expect(401);
    expect(response.body.code).toBe('UNAUTHENTICATED');
    const expiring = new JwtService({ secret: key }).sign({ sub: adminId }, { algorithm: 'HS256', expiresIn: 60 });
    await http().get('/api/users').set('Authorization', `Bearer ${expiring}`).expect(200);
  });

  it('refuses a token signed with another algorithm than HS256', async () => {
    const key = readFileSync(join(dataDir, SIGNING_KEY_FILE), 'utf8').trim();
    const hs512 = new JwtService({ secret: key }).sign({ sub: adminId }, { algorithm: 'HS512', expiresIn: 60 });
    await http().get('/api/users').set('Authorization', `Bearer ${hs512}`).expect(401);
  });

  it('keeps the key over a restart, so tokens issued before it still work', async () => {
    const before = readFileSync(join(dataDir, SIGNING_KEY_FILE), 'utf8');
    const { body } = await http().post('/api/auth/login').send({ email: DEMO_ACCOUNTS.viewer.email, password: DEMO_PASSWORD }).expect(200);
    await app.close();
    app = await createApp({ env, logger: ['error'] });
    expect(readFileSync(join(dataDir, SIGNING_KEY_FILE), 'utf8')).toBe(before);
    expect(statSync(join(dataDir, SIGNING_KEY_FILE)).mode & 0o777).toBe(0o600);
    await http().get('/api/auth/me').set('Authorization', `Bearer ${body.accessToken}`).expect(200);
  });
});
