// `npm run bench`: the benchmark scripts, which print figures (speed is never asserted in tests).
import { buildAll, ensureInstalled, log, runNpm } from './lib.mjs';

await ensureInstalled();
await buildAll();
let failures = 0;
for (const workspace of ['shared', 'server']) {
  log(`benchmarks of ${workspace}…`);
  if ((await runNpm(['run', 'bench', '-w', workspace, '--if-present'])) !== 0) failures += 1;
}
process.exit(failures === 0 ? 0 : 1);
