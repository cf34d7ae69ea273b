// `npm run build`: install when needed, then build shared, server and client (each only when stale).
import { buildAll, ensureInstalled } from './lib.mjs';

await ensureInstalled();
await buildAll();
