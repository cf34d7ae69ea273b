import { join } from 'node:path';
import { createTestApp, type TestApp } from './helpers/test-app.js';

// SQLite's own settings; left out of the PostgreSQL pass (jest.postgres.config.js).
describe('the SQLite database', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp({ seed: false });
  });
  afterAll(() => t.close());

  it('keeps the database in DATA_DIR with WAL journal, foreign keys on and a busy timeout', async () => {
    const [journal] = await t.query('PRAGMA journal_mode');
    const [foreignKeys] = await t.query('PRAGMA foreign_keys');
    const [busy] = await t.query('PRAGMA busy_timeout');
    expect(journal.journal_mode).toBe('wal');
    expect(foreignKeys.foreign_keys).toBe(1);
    expect(busy.timeout).toBeGreaterThan(0);
    expect(t.dataSource.options.database).toBe(join(t.dataDir, 'channelwright.sqlite'));
  });

  // TypeORM's schema builder speaks SQLite's column types as the migrations write them; on PostgreSQL it would want
  // uuid ids and enum types where the migrations keep varchar ids and CHECKs (the platform test covers the columns there).
  it('builds its schema from the migrations alone: the entities need no further change', async () => {
    const pending = await t.dataSource.driver.createSchemaBuilder().log();
    expect(pending.upQueries.map((q) => q.query)).toEqual([]);
  });
});
