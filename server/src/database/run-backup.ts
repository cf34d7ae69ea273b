// `npm run backup [-- <file>]`: a consistent online copy of DATA_DIR's database, safe while the server runs.
// Without a file name the copy goes to DATA_DIR/backups/channelwright-<UTC time>.sqlite. SQLite only: on PostgreSQL it
// refuses and names pg_dump.
import { join, resolve } from 'node:path';
import { ConfigError } from '../config/config-error.js';
import { loadConfig } from '../config/load-config.js';
import { backupDatabase, backupRefusal } from './backup-database.js';

try {
  const config = loadConfig();
  const refusal = backupRefusal(config);
  if (refusal !== undefined) {
    console.error(refusal);
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
