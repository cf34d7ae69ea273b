// Benchmark (prints figures; never asserted in tests): GET /api/health latency while 8 clients sign in at
// once with random e-mails, the load that stalled the server when passwords were hashed on the event loop.
// Target: health p99 under 100 ms. Each sign-in comes from its own address (X-Forwarded-For behind
// TRUST_PROXY=1, addresses of the benchmarking range 198.18.0.0/15, RFC 2544), so the per-address limit
// does not answer 429 before the password is hashed: this measures the hashing, not the throttle.
// Usage: node bench/sign-in-bench.mjs [path/to/main.js]  (default: this server's dist/main.js)
import { spawn } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { freePort, waitForHealth } from './bench-server.mjs';
import autocannon from 'autocannon';

const here = dirname(fileURLToPath(import.meta.url));
const mainJs = resolve(process.argv[2] ?? join(here, '../dist/main.js'));
const SIGN_IN_CLIENTS = 8;
const SECONDS = 20;
const TARGET_P99_MS = 100;



const randomAddress = () => `198.${18 + (randomBytes(1)[0] & 1)}.${randomBytes(1)[0]}.${randomBytes(1)[0]}`;

const dataDir = mkdtempSync(join(tmpdir(), 'channelwright-bench-'));
const port = await freePort();
const base = `http://127.0.0.1:${port}`;
const server = spawn(process.execPath, [mainJs], {
  env: { ...process.env, PORT: String(port), DATA_DIR: dataDir, SEED_DEMO: 'true', NODE_ENV: 'development', TRUST_PROXY: '1' },
  stdio: 'ignore',
});
try {
  await waitForHealth(base);
  const signIns = autocannon({
    url: base,
    connections: SIGN_IN_CLIENTS,
    duration: SECONDS + 2,
    requests: [
      {
        method: 'POST',
        path: '/api/auth/login',
        setupRequest: (request) => ({
          ...request,
          headers: { 'content-type': 'application/json', 'x-forwarded-for': randomAddress() },
          body: JSON.stringify({ email: `nobody-${randomBytes(6).toString('hex')}@bench.example`, password: 'not-the-password' }),
        }),
      },
    ],
  });
  await new Promise((r) => setTimeout(r, 1000)); // let the sign-ins fill the hashing queue first
  const health = await autocannon({ url: `${base}/api/health`, connections: 1, duration: SECONDS });
  const load = await signIns;
  const p99 = health.latency.p99;
  process.stdout.write(`\nGET /api/health while ${SIGN_IN_CLIENTS} clients sign in with random e-mails (${SECONDS} s, ${mainJs}):\n`);
  process.stdout.write(`  health: ${health.requests.average.toFixed(1)} req/s, latency p50 ${health.latency.p50} ms, p99 ${p99} ms, max ${health.latency.max} ms (${health.non2xx} not 2xx)\n`);
  const statuses = Object.entries(load.statusCodeStats ?? {}).map(([code, { count }]) => `${count}×${code}`).join(', ');
  process.stdout.write(`  sign-ins: ${load.requests.total} answered (${statuses}), p50 ${load.latency.p50} ms, p99 ${load.latency.p99} ms\n`);
  process.stdout.write(`  target: health p99 under ${TARGET_P99_MS} ms → ${p99 < TARGET_P99_MS ? 'MET' : 'NOT MET'}\n`);
} finally {
  server.kill('SIGTERM');
  rmSync(dataDir, { recursive: true, force: true });
}
