import { fileURLToPath } from 'node:url';

/** The repository root, whence the built product is started. */
export const REPO_ROOT = fileURLToPath(new URL('../../../', import.meta.url));
export const SERVER_ENTRY = fileURLToPath(new URL('../../../server/dist/main.js', import.meta.url));
export const CLIENT_BUILD = fileURLToPath(new URL('../../dist/index.html', import.meta.url));
/** Git-ignored; each journey step leaves a picture here. */
export const SCREENSHOT_DIR = fileURLToPath(new URL('../screenshots/', import.meta.url));
export const CHROMIUM_PATH = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';
