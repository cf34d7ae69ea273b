// Benchmark (prints figures; never asserted in tests): the JavaScript a browser must fetch before the first
// page can render — the entry script of the built index.html and every chunk it preloads — gzipped at level 9.
// Target: under 250 kB. Run after `vite build` (npm run bench builds first).
import { readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { gzipSync } from 'node:zlib';

const dist = join(dirname(fileURLToPath(import.meta.url)), '../dist');
const TARGET_KB = 250;
const html = readFileSync(join(dist, 'index.html'), 'utf8');
const files = [...html.matchAll(/<(?:script[^>]*\ssrc|link[^>]*rel="modulepreload"[^>]*\shref)="([^"]+\.js)"/g)].map((match) => match[1]);
let total = 0;
process.stdout.write('\nClient: JavaScript loaded before the first page renders (gzip -9):\n');
for (const file of files) {
  const bytes = gzipSync(readFileSync(join(dist, file.replace(/^\//, ''))), { level: 9 }).length;
  total += bytes;
  process.stdout.write(`  ${file.padEnd(44)} ${(bytes / 1000).toFixed(1).padStart(7)} kB\n`);
}
process.stdout.write(`  total ${(total / 1000).toFixed(1)} kB (target under ${TARGET_KB} kB) → ${total / 1000 < TARGET_KB ? 'MET' : 'NOT MET'}\n`);
