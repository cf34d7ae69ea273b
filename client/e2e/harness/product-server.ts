import { spawn, type ChildProcess } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { existsSync } from 'node:fs';
import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { setTimeout as sleep } from 'node:timers/promises';
import { findFreePort } from './free-port';
import { CLIENT_BUILD, REPO_ROOT, SERVER_ENTRY } from './paths';

export interface ProductServer {
  baseUrl: string;
  dataDir: string;
  /** Everything the server printed, for failure messages. */
  output: () => string;
  stop: () => Promise<void>;
}

const START_TIMEOUT_MS = 60_000;
const STOP_GRACE_MS = 5_000;

function assertBuilt(): void {
  const missing = [SERVER_ENTRY, CLIENT_BUILD].filter((file) => !existsSync(file));
  if (missing.length > 0) {
    throw new Error(`The product is not built (missing ${missing.join(', ')}). Run \`npm run build\` at the repository root first.`);
  }
}

async function waitForHealth(baseUrl: string, child: ChildProcess, output: () => string): Promise<void> {
  const deadline = Date.now() + START_TIMEOUT_MS;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) {
      throw new Error(`The server exited with code ${child.exitCode} before it was healthy:\n${output()}`);
    }
    try {
      const response = await fetch(`${baseUrl}/api/health`);
      if (response.ok) return;
    } catch {
      // Not listening yet.
    }
    await sleep(200);
  }
  throw new Error(`The server did not answer /api/health within ${START_TIMEOUT_MS / 1000} s:\n${output()}`);
}

function stopProcess(child: ChildProcess): Promise<void> {
  if (child.exitCode !== null || child.signalCode !== null) return Promise.resolve();
  return new Promise((resolve) => {
    const force = setTimeout(() => child.kill('SIGKILL'), STOP_GRACE_MS);
    child.once('exit', () => {
      clearTimeout(force);
      resolve();
    });
    child.kill('SIGTERM');
  });
}

/**
 * Starts the built product (`node server/dist/main.js`) on a free port with a fresh data folder
 * and the invented demo data, and resolves once `/api/health` answers.
 */
export async function startProductServer(): Promise<ProductServer> {
  assertBuilt();
  const port = await findFreePort();
  const dataDir = await mkdtemp(join(tmpdir(), 'channelwright-journey-data-'));
  const baseUrl = `http://127.0.0.1:${port}`;
  const child = spawn(process.execPath, [SERVER_ENTRY], {
    cwd: REPO_ROOT,
    env: {
      ...process.env,
      PORT: String(port),
      DATA_DIR: dataDir,
      SEED_DEMO: 'true',
      NODE_ENV: 'test',
      JWT_SECRET: randomBytes(32).toString('hex'),
    },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let log = '';
  child.stdout?.on('data', (chunk: Buffer) => (log += chunk.toString()));
  child.stderr?.on('data', (chunk: Buffer) => (log += chunk.toString()));
  const output = () => log;

  try {
    await waitForHealth(baseUrl, child, output);
  } catch (error) {
    await stopProcess(child);
    await rm(dataDir, { recursive: true, force: true });
    throw error;
  }

  return {
    baseUrl,
    dataDir,
    output,
    stop: async () => {
      await stopProcess(child);
      await rm(dataDir, { recursive: true, force: true });
    },
  };
}
