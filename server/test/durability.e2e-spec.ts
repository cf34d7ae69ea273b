import { spawn, type ChildProcess } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Database from 'better-sqlite3';
import { REPO_ROOT } from '../src/config/paths.js';
import { DATABASE_FILE_NAME } from '../src/database/data-source-options.js';
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from '../src/seed/demo-accounts.js';
import { TEST_JWT_SECRET } from './helpers/test-env.js';

// The built server (as `npm start` runs it) is killed with SIGKILL at random moments while three clients
// write devices and sheets; after each kill the database must pass PRAGMA integrity_check, and after each
// restart every write the server acknowledged with a 2xx must be there. SQLite's WAL with synchronous=FULL is
// what makes an acknowledged commit durable (SQLite documentation, "Write-Ahead Logging", 2024).
const MAIN_JS = join(REPO_ROOT, 'server/dist/main.js');
const KILLS = 20;
const CLIENTS = 3;

function freePort(): Promise<number> {
  return new Promise((resolve) => {
    const server = createServer();
    server.listen(0, '127.0.0.1', () => {
      const address = server.address();
      server.close(() => resolve(typeof address === 'object' && address ? address.port : 0));
    });
  });
}

/** A deterministic sequence in [0, 1) (a linear congruential generator, Numerical Recipes constants), so a failure can be re-run. */
function sequence(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
    return state / 2 ** 32;
  };
}

describe('durability: SIGKILL at random moments loses no acknowledged write', () => {
  const dataDir = mkdtempSync(join(tmpdir(), 'channelwright-durability-'));
  let server: ChildProcess | undefined;
  let base = '';
  afterAll(() => {
    server?.kill('SIGKILL');
    rmSync(dataDir, { recursive: true, force: true });
  });

  async function start(): Promise<void> {
    const port = await freePort();
    base = `http://127.0.0.1:${port}`;
    server = spawn(process.execPath, [MAIN_JS], {
      env: { ...process.env, PORT: String(port), DATA_DIR: dataDir, NODE_ENV: 'test', JWT_SECRET: TEST_JWT_SECRET, SEED_DEMO: 'true', DEMO_CHARACTERISATION: 'false', CLIENT_DIST: join(dataDir, 'no-client') },
      stdio: 'ignore',
    });
    for (let i = 0; i < 600; i++) {
      try {
        if ((await fetch(`${base}/api/health`)).ok) return;
      } catch {
        // not listening yet
      }
      await new Promise((resolve) => setTimeout(resolve, 50));
    }
    throw new Error('the server did not start');
  }

  async function kill(): Promise<void> {
    const running = server!;
    const exited = new Promise((resolve) => running.once('exit', resolve));
    running.kill('SIGKILL');
    await exited;
  }

  async function call(method: string, path: string, token: string | null, body?: unknown): Promise<{ status: number; body: { id?: string; accessToken?: string } & Record<string, unknown> }> {
    const response = await fetch(`${base}${path}`, { method, headers: { 'content-type': 'application/json', ...(token ? { authorization: `Bearer ${token}` } : {}) }, body: body === undefined ? undefined : JSON.stringify(body) });
    return { status: response.status, body: (await response.json()) as { id?: string; accessToken?: string } & Record<string, unknown> };
  }

  it(`keeps every acknowledged device and sheet through ${KILLS} kills, and the database intact after each`, async () => {
    expect(existsSync(MAIN_JS)).toBe(true);
    const random = sequence(20261202);
    await start();
    const token = (await call('POST', '/api/auth/login', null, { email: DEMO_ACCOUNTS.designer.email, password: DEMO_PASSWORD })).body.accessToken!;
    const [project] = (await (await fetch(`${base}/api/projects`, { headers: { authorization: `Bearer ${token}` } })).json()) as Array<{ id: string }>;
    const [profile] = (await (await fetch(`${base}/api/processes`, { headers: { authorization: `Bearer ${token}` } })).json()) as Array<{ id: string }>;
    const acknowledged = { sheets: new Set<string>(), devices: new Map<string, string>() };
    let sheetId = (await call('POST', `/api/projects/${project!.id}/sheets`, token, { name: 'Durability', processId: profile!.id })).body.id!;
    acknowledged.sheets.add(sheetId);

    for (let round = 0; round < KILLS; round++) {
      let writing = true;
      const writers = Array.from({ length: CLIENTS }, async (_, client) => {
        for (let n = 0; writing; n++) {
          try {
            if (n % 10 === 9) {
              const sheet = await call('POST', `/api/projects/${project!.id}/sheets`, token, { name: `Durability ${round}-${client}-${n}`, processId: profile!.id });
              if (sheet.status === 201) acknowledged.sheets.add(sheet.body.id!);
              continue;
            }
            const device = await call('POST', `/api/sheets/${sheetId}/devices`, token, { name: `M${round}_${client}_${n}`, polarity: 'nmos', id: 10e-6, l: 0.5e-6, vds: 0.6, vov: 0.2 });
            if (device.status === 201) acknowledged.devices.set(device.body.id!, sheetId);
          } catch {
            return; // the server is gone: whatever was not answered was not acknowledged
          }
        }
      });
      await new Promise((resolve) => setTimeout(resolve, 200 + random() * 1300));
      await kill();
      writing = false;
      await Promise.all(writers);

      const database = new Database(join(dataDir, DATABASE_FILE_NAME));
      try {
        expect({ round, integrity: database.pragma('integrity_check', { simple: true }) }).toEqual({ round, integrity: 'ok' });
      } finally {
        database.close();
      }
      await start();
      if (round % 5 === 4) sheetId = [...acknowledged.sheets].at(-1)!; // later rounds write into a sheet made under fire
    }

    const database = new Database(join(dataDir, DATABASE_FILE_NAME), { readonly: true });
    try {
      const devices = new Set((database.prepare('SELECT "id" FROM "devices"').all() as Array<{ id: string }>).map((row) => row.id));
      const sheets = new Set((database.prepare('SELECT "id" FROM "sheets"').all() as Array<{ id: string }>).map((row) => row.id));
      expect([...acknowledged.devices.keys()].filter((id) => !devices.has(id))).toEqual([]);
      expect([...acknowledged.sheets].filter((id) => !sheets.has(id))).toEqual([]);
    } finally {
      database.close();
    }
    process.stdout.write(`durability: ${KILLS} kills, ${acknowledged.devices.size} devices and ${acknowledged.sheets.size} sheets acknowledged, all present\n`);
    expect(acknowledged.devices.size).toBeGreaterThan(KILLS);
  }, 600_000);
});
