/**
 * The browser for the page tests: Debian's chromium driven by playwright-core,
 * launched once per test file with a fresh profile, every request that is not
 * the page file aborted (the page must work with no network), and every
 * console error and uncaught exception collected.
 */
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { chromium, type BrowserContext, type Page } from 'playwright-core';

/** The built page. */
export const PAGE_FILE = join(dirname(fileURLToPath(import.meta.url)), '..', 'dist', 'index.html');
/** Its file URL. */
export const PAGE_URL = pathToFileURL(PAGE_FILE).href;
/** Where the test run saves screenshots for review (gitignored). */
export const SCREENSHOTS = join(dirname(fileURLToPath(import.meta.url)), 'screenshots');

/** The chromium flags of LIBRARIES.md. */
export const CHROMIUM_ARGS = ['--headless', '--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run'];

/** A browser with one context, and what the pages said. */
export interface TestBrowser {
  readonly context: BrowserContext;
  /** Console errors and uncaught exceptions, in order. */
  readonly errors: string[];
  /** Requests that tried to leave the machine (all aborted). */
  readonly blocked: string[];
  /** A new page of the given size, with the collectors attached. */
  newPage(width: number, height: number): Promise<Page>;
  close(): Promise<void>;
}

/**
 * Launches chromium (`/usr/bin/chromium`, or CHROMIUM_PATH) with a fresh
 * profile folder and the network blocked.
 */
export async function launchBrowser(): Promise<TestBrowser> {
  const profile = mkdtempSync(join(tmpdir(), 'girth-web-profile-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    args: CHROMIUM_ARGS,
    acceptDownloads: true,
    viewport: { width: 390, height: 844 },
  });
  const errors: string[] = [];
  const blocked: string[] = [];
  await context.route('**/*', (route) => {
    const url = route.request().url();
    if (url.startsWith('file:') || url.startsWith('data:') || url.startsWith('blob:')) return route.continue();
    blocked.push(url);
    return route.abort();
  });
  const attach = (page: Page): void => {
    page.on('console', (m) => {
      if (m.type() === 'error') errors.push(`console: ${m.text()}`);
    });
    page.on('pageerror', (e) => errors.push(`exception: ${e.message}`));
  };
  for (const p of context.pages()) attach(p);
  context.on('page', attach);
  return {
    context,
    errors,
    blocked,
    async newPage(width, height) {
      const page = await context.newPage();
      await page.setViewportSize({ width, height });
      return page;
    },
    async close() {
      await context.close();
      rmSync(profile, { recursive: true, force: true });
    },
  };
}
