import { copyFileSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { backupDatabase } from '../src/database/backup-database.js';
import { DATABASE_FILE_NAME } from '../src/database/data-source-options.js';
import { DEMO_ACCOUNTS } from '../src/seed/demo-accounts.js';
import { newSheet, nmosTargets, signInEveryone, wrenmoss } from './fixtures/sheets/sheet-fixtures.js';
import { bearer, createTestApp, type TestApp } from './helpers/test-app.js';

// SQLite's online backup (sqlite.org, "Using the SQLite Online Backup API", 2024) gives one committed state
// of a live database; restoring is putting that file back. These tests take a backup while the server
// writes, restore it into a new DATA_DIR and start a server on it.
describe('backup and restore of the embedded database', () => {
  let t: TestApp;
  const folders: string[] = [];
  const folder = () => {
    const path = mkdtempSync(join(tmpdir(), 'cw-backup-'));
    folders.push(path);
    return path;
  };

  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(async () => {
    await t.close();
    for (const path of folders) rmSync(path, { recursive: true, force: true });
  });

  it('syncs every commit to disk (synchronous = FULL), so an acknowledged sign-off survives a power loss', async () => {
    const [row] = await t.query('PRAGMA synchronous');
    expect(row.synchronous).toBe(2); // 0 OFF, 1 NORMAL, 2 FULL, 3 EXTRA (SQLite documentation, 2024)
  });

  it('takes a consistent copy while the server is writing, and a server started on the restored copy has every write made before it', async () => {
    const tokens = await signInEveryone(t);
    const project = await wrenmoss(t, tokens.designer);
    const profileId = (await t.http().get('/api/processes').set(bearer(tokens.designer))).body[0].id;
    const sheet = await newSheet(t, tokens.designer, project.id, profileId, 'Backed-up sheet');
    const before = [];
    for (const name of ['MB1', 'MB2', 'MB3']) before.push((await t.http().post(`/api/sheets/${sheet.id}/devices`).set(bearer(tokens.designer)).send(nmosTargets({ name })).expect(201)).body);

    // Writes keep arriving while the copy is taken; the copy holds a committed state, whole.
    const writing = Promise.all(['MW1', 'MW2', 'MW3', 'MW4'].map((name) => t.http().post(`/api/sheets/${sheet.id}/devices`).set(bearer(tokens.designer)).send(nmosTargets({ name }))));
    const target = join(folder(), 'copy.sqlite');
    const result = await backupDatabase(t.dataDir, target);
    await writing;
    expect(result).toMatchObject({ path: target, integrity: 'ok' });
    expect(result.pages).toBeGreaterThan(10);

    const restoredDir = folder();
    copyFileSync(target, join(restoredDir, DATABASE_FILE_NAME));
    const restored = await createTestApp({ dataDir: restoredDir, seed: false });
    try {
      const [check] = await restored.query('PRAGMA integrity_check');
      expect(check.integrity_check).toBe('ok');
      const token = await restored.loginAs(DEMO_ACCOUNTS.designer.email);
      const devices = (await restored.http().get(`/api/sheets/${sheet.id}`).set(bearer(token)).expect(200)).body.devices as Array<{ id: string; name: string; result: { w: number } | null }>;
      for (const device of before) expect(devices.find((d) => d.id === device.id)?.result?.w).toBe(device.result.w);
      // Any of the concurrent writes is either wholly there or absent: no device without its result.
      for (const device of devices) expect(device.result).not.toBeNull();
    } finally {
      await restored.close({ keepData: true });
    }
  });

  it('refuses to back up a folder that holds no database, writing nothing', async () => {
    const empty = folder();
    await expect(backupDatabase(empty, join(empty, 'copy.sqlite'))).rejects.toThrow(/no database to back up/);
  });
});
