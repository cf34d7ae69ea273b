import { existsSync } from 'node:fs';
import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type BrowserContext } from 'playwright-core';
import { CHROMIUM_PATH } from './paths';

export interface JourneyBrowser {
  context: BrowserContext;
  close: () => Promise<void>;
}

// Quiet, offline-friendly chromium: no GPU, no sandbox (containers), no calls home.
const CHROMIUM_ARGS = [
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--no-first-run',
];

export const chromiumIsInstalled = (): boolean => existsSync(CHROMIUM_PATH);

/** Debian's chromium, headless, with a fresh profile that is deleted afterwards. */
export async function launchBrowser(baseURL: string): Promise<JourneyBrowser> {
  const profileDir = await mkdtemp(join(tmpdir(), 'channelwright-journey-profile-'));
  const context = await chromium.launchPersistentContext(profileDir, {
    executablePath: CHROMIUM_PATH,
    headless: true,
    args: CHROMIUM_ARGS,
    baseURL,
    viewport: { width: 1280, height: 800 },
    colorScheme: 'light',
    locale: 'en-GB',
  });
  context.setDefaultTimeout(15_000);
  return {
    context,
    close: async () => {
      await context.close();
      await rm(profileDir, { recursive: true, force: true });
    },
  };
}
