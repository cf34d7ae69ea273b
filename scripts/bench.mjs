// `npm run bench`: the benchmark scripts, which print figures (speed is never asserted in tests).
import { buildAll, ensureInstalled, log, run, runNpm } from './lib.mjs';

await ensureInstalled();
await buildAll();
let failures = 0;
for (const workspace of ['shared', 'server']) {
  log(`benchmarks of ${workspace}…`);
  if ((await runNpm(['run', 'bench', '-w', workspace, '--if-present'])) !== 0) failures += 1;
}
// Characterisation on ngspice (native and WebAssembly) and the table model: a few minutes on two cores.
log('benchmarks of characterisation and the table model…');
if ((await run(process.execPath, ['server/bench/characterisation-bench.mjs'])) !== 0) failures += 1;
// The same through the job system and the API: points per second of a job, /api/health meanwhile, the table model behind the API.
log('benchmarks of characterisation jobs and the table model behind the API…');
if ((await run(process.execPath, ['server/bench/characterisation-jobs-bench.mjs'])) !== 0) failures += 1;
process.exit(failures === 0 ? 0 : 1);
