// `npm run backup [-- <file>]`: a consistent online copy of DATA_DIR's database, safe while the server runs.
// Without a file name the copy goes to DATA_DIR/backups/channelwright-<UTC time>.sqlite. SQLite only: on PostgreSQL it
// refuses and names pg_dump.
import { join, resolve } from 'node:path';
import { ConfigError } from '../config/config-error.js';
import { loadConfig } from '../config/load-config.js';
import { backupDatabase } from './backup-database.js';

try {
  const config = loadConfig();
  if (config.databaseUrl !== undefined) {
    // SQLite's online backup API has no PostgreSQL counterpart here: PostgreSQL's own pg_dump takes a consistent copy.
    console.error('DATABASE_URL names a PostgreSQL database: npm run backup copies only the SQLite database in DATA_DIR.');
    console.error('Back up PostgreSQL with pg_dump, e.g. pg_dump --format=custom --file=channelwright.dump "$DATABASE_URL" (docs/operations.md).');
    process.exit(2);
  }
  const stamp = new Date().toISOString().replace(/[:.]/g, '-');
  const target = process.argv[2] ? resolve(process.argv[2]) : join(config.dataDir, 'backups', `channelwright-${stamp}.sqlite`);
  const result = await backupDatabase(config.dataDir, target);
  console.log(`Backed up ${result.pages} pages to ${result.path} (integrity ${result.integrity}).`);
  console.log('To restore: stop the server, remove channelwright.sqlite-wal and -shm in DATA_DIR, and copy this file to DATA_DIR/channelwright.sqlite.');
} catch (error) {
  console.error(error instanceof ConfigError || error instanceof Error ? error.message : error);
  process.exit(1);
}
