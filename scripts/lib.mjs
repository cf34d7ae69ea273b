// Helpers shared by the root scripts (start, test, build, dev, bench).
// Plain Node built-ins only: these scripts must run on a fresh clone before `npm ci`.
import { spawn } from 'node:child_process';
import { createHash } from 'node:crypto';
import { existsSync, readFileSync, readdirSync, statSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

export const root = join(dirname(fileURLToPath(import.meta.url)), '..');
const npm = process.platform === 'win32' ? 'npm.cmd' : 'npm';

export function log(message) {
  process.stdout.write(`\x1b[36m[channelwright]\x1b[0m ${message}\n`);
}

/** Runs a command in the repository root; resolves with its exit code (never throws on failure). */
export function run(command, args, options = {}) {
  return new Promise((resolve) => {
    const child = spawn(command, args, { cwd: root, stdio: 'inherit', env: process.env, ...options });
    child.on('exit', (code, signal) => resolve(signal ? 1 : (code ?? 1)));
    child.on('error', (error) => {
      process.stderr.write(`${command}: ${error.message}\n`);
      resolve(1);
    });
  });
}

export async function runOrExit(command, args, options) {
  const code = await run(command, args, options);
  if (code !== 0) {
    process.stderr.write(`\n${command} ${args.join(' ')} failed with exit code ${code}\n`);
    process.exit(code);
  }
}

export function runNpm(args, options) {
  return run(npm, args, options);
}

const stampFile = join(root, 'node_modules', '.channelwright-install-stamp');

function lockfileHash() {
  return createHash('sha256').update(readFileSync(join(root, 'package-lock.json'))).digest('hex');
}

/** Installs dependencies with `npm ci` when node_modules is missing or the lockfile changed since. */
export async function ensureInstalled() {
  const hash = lockfileHash();
  if (existsSync(stampFile) && readFileSync(stampFile, 'utf8').trim() === hash) return;
  log('installing dependencies (npm ci; the first time takes a couple of minutes: better-sqlite3 compiles)…');
  const code = await runNpm(['ci', '--no-audit', '--no-fund']);
  if (code !== 0) process.exit(code);
  writeFileSync(stampFile, hash);
}

function newestMtime(path) {
  if (!existsSync(path)) return 0;
  const stat = statSync(path);
  if (!stat.isDirectory()) return stat.mtimeMs;
  let newest = 0;
  for (const entry of readdirSync(path)) {
    if (entry === 'node_modules' || entry === 'dist') continue;
    newest = Math.max(newest, newestMtime(join(path, entry)));
  }
  return newest;
}

/** True when `output` is missing or older than any file under `inputs` (paths relative to the root). */
export function isStale(output, inputs) {
  const outputPath = join(root, output);
  if (!existsSync(outputPath)) return true;
  const built = statSync(outputPath).mtimeMs;
  return inputs.some((input) => newestMtime(join(root, input)) > built);
}

/** Builds shared, server and client, skipping each part that is already up to date. */
export async function buildAll() {
  const sharedInputs = ['shared/src', 'shared/package.json', 'shared/tsconfig.json', 'tsconfig.base.json'];
  if (isStale('shared/dist/.build-stamp', sharedInputs)) {
    log('building shared (device engine, units, schemas)…');
    await runOrExit(npm, ['run', 'build', '-w', 'shared']);
    writeFileSync(join(root, 'shared/dist/.build-stamp'), new Date().toISOString());
  }
  const serverInputs = ['server/src', 'server/package.json', 'server/tsconfig.build.json', 'shared/dist/.build-stamp'];
  if (isStale('server/dist/.build-stamp', serverInputs)) {
    log('building server…');
    await runOrExit(npm, ['run', 'build', '-w', 'server']);
    writeFileSync(join(root, 'server/dist/.build-stamp'), new Date().toISOString());
  }
  const clientInputs = ['client/src', 'client/index.html', 'client/vite.config.ts', 'client/package.json', 'client/public', 'shared/dist/.build-stamp'];
  if (isStale('client/dist/.build-stamp', clientInputs)) {
    log('building client…');
    await runOrExit(npm, ['run', 'build', '-w', 'client']);
    writeFileSync(join(root, 'client/dist/.build-stamp'), new Date().toISOString());
  }
}
