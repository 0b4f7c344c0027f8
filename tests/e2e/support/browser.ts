import path from 'node:path';
import { type Browser, type Page, chromium } from 'playwright-core';
import { afterAll, beforeAll } from 'vitest';

/** Where browser tests leave their screenshots and files for people to look at. */
export const artifactsDir = path.resolve(import.meta.dirname, '..', '..', '..', 'test-artifacts');

/** Launches the system Chromium (never a downloaded one); CHROMIUM_PATH overrides the default path. */
export function launchBrowser(): Promise<Browser> {
  return chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    headless: true,
    args: [
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
}

/** One browser for a test file: launched before its tests and closed after them. Returns a getter. */
export function browserForThisFile(): () => Browser {
  let browser: Browser | undefined;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });
  return () => {
    if (!browser) throw new Error('the browser for this test file is not running');
    return browser;
  };
}

/** Problems a page reported while it was open: console errors, uncaught exceptions, failed requests. */
export interface PageProblems {
  readonly consoleErrors: string[];
  readonly pageErrors: string[];
  readonly failedRequests: string[];
}

/** Starts recording console errors, uncaught page errors and failed or 4xx/5xx requests on `page`. */
export function recordPageProblems(page: Page): PageProblems {
  const problems: PageProblems = { consoleErrors: [], pageErrors: [], failedRequests: [] };
  page.on('console', (message) => {
    if (message.type() === 'error') problems.consoleErrors.push(message.text());
  });
  page.on('pageerror', (error) => problems.pageErrors.push(error.message));
  page.on('requestfailed', (request) =>
    problems.failedRequests.push(`${request.url()}: ${request.failure()?.errorText ?? 'failed'}`),
  );
  page.on('response', (response) => {
    if (response.status() >= 400)
      problems.failedRequests.push(`${response.url()}: HTTP ${response.status()}`);
  });
  return problems;
}
