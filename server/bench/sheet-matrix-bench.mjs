// Benchmark (prints figures; never asserted in tests): POST /api/sheets/:id/corners on a sheet of 200 sized
// devices of the square-law and all-region models at every corner of BF180-G (5) × its minimum, nominal and
// maximum temperature (3) = 3,000 cells, answered to the last byte over HTTP; and GET /api/health p99 meanwhile.
// Target: the matrix under 200 ms.
// Usage: node bench/sheet-matrix-bench.mjs [path/to/main.js]  (default: this server's dist/main.js)
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { demoDesignerToken, startDemoServer } from './bench-server.mjs';

const here = dirname(fileURLToPath(import.meta.url));
const mainJs = resolve(process.argv[2] ?? join(here, '../dist/main.js'));
const DEVICES = 200;
const RUNS = 7;
const TARGET_MS = 200;

const { base, stop } = await startDemoServer(mainJs);

async function api(method, path, token, body) {
  const response = await fetch(`${base}${path}`, { method, headers: { 'content-type': 'application/json', authorization: `Bearer ${token}` }, body: body && JSON.stringify(body) });
  const text = await response.text();
  if (!response.ok) throw new Error(`${method} ${path} answered ${response.status}: ${text.slice(0, 300)}`);
  return { body: JSON.parse(text), bytes: text.length };
}
const percentile = (values, p) => [...values].sort((a, b) => a - b)[Math.min(values.length - 1, Math.floor(p * values.length))];

try {
  const token = await demoDesignerToken(base, mainJs);
  const processes = (await api('GET', '/api/processes', token)).body;
  const profile = processes.find((p) => p.name === 'BF180-G') ?? processes[0];
  const [project] = (await api('GET', '/api/projects', token)).body;
  const sheet = (await api('POST', `/api/projects/${project.id}/sheets`, token, { name: 'Matrix bench', processId: profile.id, model: 'all-region' })).body;
  for (let i = 0; i < DEVICES; i++) {
    const polarity = i % 2 === 0 ? 'nmos' : 'pmos';
    const constraint = i % 3 === 0 ? { vov: 0.15 + (i % 7) * 0.03 } : { gmId: 8 + (i % 11) };
    await api('POST', `/api/sheets/${sheet.id}/devices`, token, { name: `MB${i}`, polarity, id: (1 + (i % 13)) * 1e-6, l: (0.36 + (i % 9) * 0.2) * 1e-6, vds: 0.6, model: i % 4 === 0 ? 'square-law' : 'all-region', ...constraint });
  }
  const times = [];
  let cells = 0;
  let bytes = 0;
  const healthTimes = [];
  let measuring = true;
  const probe = (async () => {
    while (measuring) {
      const start = performance.now();
      await fetch(`${base}/api/health`);
      healthTimes.push(performance.now() - start);
      await new Promise((r) => setTimeout(r, 5));
    }
  })();
  for (let run = 0; run < RUNS; run++) {
    const start = performance.now();
    const answer = await api('POST', `/api/sheets/${sheet.id}/corners`, token, {});
    times.push(performance.now() - start);
    cells = answer.body.rows.reduce((n, row) => n + row.cells.length, 0);
    bytes = answer.bytes;
  }
  measuring = false;
  await probe;
  const median = percentile(times, 0.5);
  process.stdout.write(`\nSheet corner matrix: ${DEVICES} devices, ${cells.toLocaleString('en')} cells, ${(bytes / 1e6).toFixed(2)} MB of JSON (${mainJs}):\n`);
  process.stdout.write(`  POST /api/sheets/:id/corners to the last byte: median ${median.toFixed(0)} ms, best ${Math.min(...times).toFixed(0)} ms over ${RUNS} runs (target under ${TARGET_MS} ms) → ${median < TARGET_MS ? 'MET' : 'NOT MET'}\n`);
  process.stdout.write(`  GET /api/health meanwhile: p50 ${percentile(healthTimes, 0.5).toFixed(1)} ms, p99 ${percentile(healthTimes, 0.99).toFixed(1)} ms over ${healthTimes.length} requests\n`);
} finally {
  stop();
}
