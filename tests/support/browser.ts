import { afterAll, beforeAll } from 'vitest';
import { chromium, type Browser, type Page } from 'playwright-core';
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { existsSync } from 'node:fs';
import path from 'node:path';

export const CHROMIUM = '/usr/bin/chromium';
// Flags for a sandboxed root session on a machine with no outside network (see DEVELOPERS.md).
export const CHROMIUM_ARGS = ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'];

/** How long one browser action may wait: patient, because a busy two-core machine can take many seconds per step. */
export const BROWSER_ACTION_TIMEOUT_MS = 90_000;

export async function launchBrowser(): Promise<Browser> {
  if (!existsSync(CHROMIUM)) throw new Error(`${CHROMIUM} is missing: run the tests with \`npm test\`, which installs Debian's chromium.`);
  const browser = await chromium.launch({ executablePath: CHROMIUM, args: CHROMIUM_ARGS, timeout: 120_000 });
  // Every page and context made from this browser gets the patient limit instead of Playwright's 30 s.
  const newContext = browser.newContext.bind(browser);
  browser.newContext = async (options) => {
    const context = await newContext(options);
    context.setDefaultTimeout(BROWSER_ACTION_TIMEOUT_MS);
    return context;
  };
  const newPage = browser.newPage.bind(browser);
  browser.newPage = async (options) => {
    const page = await newPage(options);
    page.setDefaultTimeout(BROWSER_ACTION_TIMEOUT_MS);
    return page;
  };
  return browser;
}

/** The real server on a free loopback port, serving the built client (npm test builds it first). */
export async function startTestServer(): Promise<{ server: Server; baseUrl: string }> {
  if (!existsSync(path.resolve('dist/client/index.html'))) throw new Error('dist/client is missing: run `npm run build` or `npm test`.');
  const { listen } = await import('@server/index');
  const server = await listen(0, '127.0.0.1');
  const { port } = server.address() as AddressInfo;
  return { server, baseUrl: `http://127.0.0.1:${port}` };
}

export const SCREENSHOT_DIR = path.resolve('test-results/screenshots');

/**
 * For a browser test file: starts the test server and the browser before its tests and stops them
 * after. Read `env.browser` and `env.baseUrl` inside the tests.
 */
export function useBrowserAndServer(): { browser: Browser; server: Server; baseUrl: string } {
  const env = {} as { browser: Browser; server: Server; baseUrl: string };
  beforeAll(async () => {
    Object.assign(env, await startTestServer());
    env.browser = await launchBrowser();
  });
  afterAll(async () => {
    await env.browser?.close();
    await new Promise((r) => env.server?.close(r));
  });
  return env;
}

/** Signs in through the form, as a person would, and waits until the app has gone on to `next`. */
export async function signInInBrowser(page: Page, baseUrl: string, email: string, password: string, next = '/builds'): Promise<void> {
  await page.goto(`${baseUrl}/sign-in?next=${encodeURIComponent(next)}`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL(`${baseUrl}${next}`);
}
