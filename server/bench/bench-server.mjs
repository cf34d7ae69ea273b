// What the server benchmarks share: a free port, and waiting until a started server answers its health check.
import { spawn } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';

export function freePort() {
  return new Promise((resolve) => {
    const server = createServer();
    server.listen(0, '127.0.0.1', () => {
      const { port } = server.address();
      server.close(() => resolve(port));
    });
  });
}

export async function waitForHealth(base) {
  for (let i = 0; i < 900; i++) {
    try {
      if ((await fetch(`${base}/api/health`)).ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error('the server did not become healthy');
}

/**
 * The built server (`mainJs`) with the invented demo seeded on a fresh DATA_DIR and a free port, the demo
 * characterisation off; resolves once it answers its health check. `stop()` kills it and deletes its data.
 */
export async function startDemoServer(mainJs, env = {}) {
  const dataDir = mkdtempSync(join(tmpdir(), 'channelwright-bench-'));
  const port = await freePort();
  const base = `http://127.0.0.1:${port}`;
  const server = spawn(process.execPath, [mainJs], {
    env: { ...process.env, PORT: String(port), DATA_DIR: dataDir, SEED_DEMO: 'true', NODE_ENV: 'development', DEMO_CHARACTERISATION: 'false', ...env },
    stdio: 'ignore',
  });
  const stop = () => {
    server.kill();
    rmSync(dataDir, { recursive: true, force: true });
  };
  try {
    await waitForHealth(base);
  } catch (error) {
    stop();
    throw error;
  }
  return { base, stop, pid: server.pid };
}

/** An access token of the demo designer on a server started from `mainJs`'s build. */
export async function demoDesignerToken(base, mainJs) {
  const { DEMO_ACCOUNTS, DEMO_PASSWORD } = await import(new URL('seed/demo-accounts.js', pathToFileURL(mainJs)).href);
  const response = await fetch(`${base}/api/auth/login`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ email: DEMO_ACCOUNTS.designer.email, password: DEMO_PASSWORD }) });
  if (!response.ok) throw new Error(`signing in the demo designer answered ${response.status}`);
  return (await response.json()).accessToken;
}
