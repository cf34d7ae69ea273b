// `npm start`: from a fresh clone to the running product with demo data.
// Installs dependencies when needed, builds what is stale, then starts the one NestJS process that
// runs the migrations, seeds the invented demo data into an empty database and serves client + API.
import { buildAll, ensureInstalled, log, root, run } from './lib.mjs';
import { join } from 'node:path';

await ensureInstalled();
await buildAll();
log('starting the server (migrations and demo seed run at start-up)…');
const code = await run(process.execPath, [join(root, 'server/dist/main.js')]);
process.exit(code);
