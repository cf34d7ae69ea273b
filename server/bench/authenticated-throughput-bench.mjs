// Benchmark (prints figures; never asserted in tests): throughput and latency at 64 connections of
// GET /api/health (no token), POST /api/compute/size (a token, a stored process version, the engine) and a
// sheet read (a token, project access, the sheet with its devices), one after the other on one server.
// Targets: compute/size at ≥ 60 % of health's throughput with p99 under 25 ms; the sheet read at ≥ 40 %.
// Usage: node bench/authenticated-throughput-bench.mjs [path/to/main.js]  (default: this server's dist/main.js)
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import autocannon from 'autocannon';
import { demoDesignerToken, startDemoServer } from './bench-server.mjs';

const here = dirname(fileURLToPath(import.meta.url));
const mainJs = resolve(process.argv[2] ?? join(here, '../dist/main.js'));
const CONNECTIONS = 64;
const SECONDS = 10;

const { base, stop } = await startDemoServer(mainJs);

async function api(method, path, token, body) {
  const response = await fetch(`${base}${path}`, { method, headers: { 'content-type': 'application/json', ...(token ? { authorization: `Bearer ${token}` } : {}) }, body: body && JSON.stringify(body) });
  if (!response.ok) throw new Error(`${method} ${path} answered ${response.status}: ${await response.text()}`);
  return response.json();
}

const load = (options) => autocannon({ url: base, connections: CONNECTIONS, duration: SECONDS, ...options });
const line = (name, result) =>
  `  ${name.padEnd(28)} ${result.requests.average.toFixed(0).padStart(6)} req/s  p50 ${String(result.latency.p50).padStart(4)} ms  p99 ${String(result.latency.p99).padStart(4)} ms  errors ${result.errors + result.non2xx}`;

try {
  const accessToken = await demoDesignerToken(base, mainJs);
  const [profile] = await api('GET', '/api/processes', accessToken);
  const [project] = await api('GET', '/api/projects', accessToken);
  const [sheet] = await api('GET', `/api/projects/${project.id}/sheets`, accessToken);
  const size = { processId: profile.id, polarity: 'nmos', id: 10e-6, l: 0.5e-6, gmId: 12, vds: 0.6 };
  await api('POST', '/api/compute/size', accessToken, size);
  const headers = { 'content-type': 'application/json', authorization: `Bearer ${accessToken}` };

  const health = await load({ requests: [{ method: 'GET', path: '/api/health' }] });
  const compute = await load({ requests: [{ method: 'POST', path: '/api/compute/size', headers, body: JSON.stringify(size) }] });
  const read = await load({ requests: [{ method: 'GET', path: `/api/sheets/${sheet.id}`, headers }] });
  // Mixed: each connection reads the demo sheet four times, then adds a device (sized and stored, audited) to a sheet
  // of its own kind: one write in five, as a team editing while others review.
  const full = await api('GET', `/api/sheets/${sheet.id}`, accessToken);
  const target = full.devices.find((d) => d.targets?.polarity === 'nmos')?.targets ?? full.devices[0].targets;
  const scratch = await api('POST', `/api/projects/${project.id}/sheets`, accessToken, { name: `Bench writes ${Date.now()}`, processId: full.process.profileId, processVersion: full.process.version });
  let written = 0;
  const addDevice = {
    method: 'POST',
    path: `/api/sheets/${scratch.id}/devices`,
    headers,
    setupRequest: (request) => ({ ...request, body: JSON.stringify({ ...target, name: `MB${++written}` }) }),
  };
  const sheetRead = { method: 'GET', path: `/api/sheets/${sheet.id}`, headers };
  const mixed = await load({ requests: [sheetRead, sheetRead, sheetRead, sheetRead, addDevice] });

  const ratio = (result) => result.requests.average / health.requests.average;
  process.stdout.write(`\nAuthenticated requests at ${CONNECTIONS} connections, ${SECONDS} s each (${mainJs}):\n`);
  process.stdout.write(`${line('GET /api/health', health)}\n${line('POST /api/compute/size', compute)}\n${line(`GET /api/sheets/:id (${sheet.name})`, read)}\n${line('mixed: 4 reads, 1 device added', mixed)}\n`);
  process.stdout.write(`  compute/size: ratio ${ratio(compute).toFixed(2)} (target ≥ 0.60), p99 ${compute.latency.p99} ms (target < 25 ms) → ${ratio(compute) >= 0.6 && compute.latency.p99 < 25 ? 'MET' : 'NOT MET'}\n`);
  process.stdout.write(`  sheet read: ratio ${ratio(read).toFixed(2)} (target ≥ 0.40) → ${ratio(read) >= 0.4 ? 'MET' : 'NOT MET'}\n`);
  const stored = await api('GET', `/api/sheets/${scratch.id}/devices`, accessToken);
  process.stdout.write(`  mixed read/write: ratio ${ratio(mixed).toFixed(2)} to health (no target set), ${written} devices sent, ${stored.length} stored (every acknowledged write must be there)\n`);
} finally {
  stop();
}
