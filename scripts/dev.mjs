// `npm run dev`: the Vite dev server with hot reload, proxying /api to the Nest server in watch mode.
import { spawn } from 'node:child_process';
import { buildAll, ensureInstalled, log, root } from './lib.mjs';

await ensureInstalled();
await buildAll();
const npm = process.platform === 'win32' ? 'npm.cmd' : 'npm';
const children = [
  spawn(npm, ['exec', '-w', 'shared', '--', 'tsc', '-b', '--watch', '--preserveWatchOutput'], { cwd: root, stdio: 'inherit' }),
  spawn(npm, ['run', 'dev', '-w', 'server'], { cwd: root, stdio: 'inherit' }),
  spawn(npm, ['run', 'dev', '-w', 'client'], { cwd: root, stdio: 'inherit' }),
];
log('dev servers: client with hot reload at http://localhost:5173, API at http://localhost:3000/api');
const stop = () => {
  for (const child of children) child.kill('SIGTERM');
  process.exit(0);
};
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
