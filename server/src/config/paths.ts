import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';

// This file sits in src/config (tests) or dist/config (built), so both are two levels below the server package.
export const SERVER_ROOT = resolve(import.meta.dirname, '..', '..');
export const REPO_ROOT = resolve(SERVER_ROOT, '..');

export const SERVER_VERSION: string = JSON.parse(readFileSync(resolve(SERVER_ROOT, 'package.json'), 'utf8')).version;

/** Relative paths in the environment are taken from the repository root, whatever the working directory. */
export function fromRepoRoot(path: string): string {
  return resolve(REPO_ROOT, path);
}
