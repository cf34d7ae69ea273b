// `npm run backup [-- <file>]`: a consistent copy of DATA_DIR's database, taken while the server runs
// (SQLite's online backup API). Builds what is stale first; the copy is checked with PRAGMA integrity_check.
import { buildAll, ensureInstalled, root, run } from './lib.mjs';
import { join } from 'node:path';

await ensureInstalled();
await buildAll();
const code = await run(process.execPath, [join(root, 'server/dist/database/run-backup.js'), ...process.argv.slice(2)]);
process.exit(code);
