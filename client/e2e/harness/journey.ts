import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe } from 'vitest';
import { chromiumIsInstalled, launchBrowser, type JourneyBrowser } from './browser';
import { CHROMIUM_PATH } from './paths';
import { startProductServer, type ProductServer } from './product-server';

export interface Journey {
  /** The running product's address, e.g. http://127.0.0.1:41234. */
  readonly baseUrl: string;
  /** A new tab, signed out: cookies and storage of earlier tests are cleared first. */
  newPage: () => Promise<Page>;
}

/** The persistent profile is shared by a suite's tests, so each starts by forgetting the last one's session. */
async function freshPage(context: BrowserContext): Promise<Page> {
  await context.clearCookies();
  const page = await context.newPage();
  await page.goto('/favicon.svg');
  await page.evaluate(() => {
    window.localStorage.clear();
    window.sessionStorage.clear();
  });
  return page;
}

/**
 * Where chromium is missing, local runs skip the journeys and say so; under CI=true a missing
 * browser is an error, so a CI run can never pass without having driven the browser.
 */
function browserAvailability(): 'present' | 'skip' {
  if (chromiumIsInstalled()) return 'present';
  if (process.env.CI === 'true') {
    throw new Error(`CI=true but chromium is not installed at ${CHROMIUM_PATH}: the browser journeys cannot run.`);
  }
  console.warn(`Browser journeys skipped: chromium not found at ${CHROMIUM_PATH} (install it with apt-get install chromium).`);
  return 'skip';
}

/**
 * A suite of browser journeys against one freshly started product (its own port, its own data
 * folder with the invented demo data) and one headless chromium, both stopped afterwards.
 */
export function describeJourney(name: string, body: (journey: Journey) => void): void {
  const suite = browserAvailability() === 'present' ? describe : describe.skip;
  suite(name, () => {
    let server: ProductServer | undefined;
    let browser: JourneyBrowser | undefined;

    beforeAll(async () => {
      server = await startProductServer();
      browser = await launchBrowser(server.baseUrl);
    });

    afterAll(async () => {
      await browser?.close();
      await server?.stop();
    });

    const journey: Journey = {
      get baseUrl() {
        if (!server) throw new Error('The product server is not running');
        return server.baseUrl;
      },
      newPage: async () => {
        if (!browser) throw new Error('The browser is not running');
        return freshPage(browser.context);
      },
    };
    body(journey);
  });
}
