import { afterEach, beforeAll } from 'vitest';
import { chromium, type Browser, type BrowserContext, type Locator, type Page } from 'playwright-core';
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { existsSync } from 'node:fs';
import path from 'node:path';

export const CHROMIUM = '/usr/bin/chromium';
// Flags for a sandboxed root session on a machine with no outside network (see DEVELOPERS.md).
export const CHROMIUM_ARGS = ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'];

/** How long one browser action may wait: the browser journeys run on their own after the API tests, so a step that takes longer is stuck. */
export const BROWSER_ACTION_TIMEOUT_MS = 20_000;

/** `onContext` hears of every context made from this browser (`newPage` makes one of its own too). */
export async function launchBrowser({ onContext }: { onContext?: (context: BrowserContext) => void } = {}): Promise<Browser> {
  if (!existsSync(CHROMIUM)) throw new Error(`${CHROMIUM} is missing: run the tests with \`npm test\`, which installs Debian's chromium.`);
  const browser = await chromium.launch({ executablePath: CHROMIUM, args: CHROMIUM_ARGS, timeout: 120_000 });
  // Every page and context made from this browser gets the run's limit instead of Playwright's 30 s.
  const newContext = browser.newContext.bind(browser);
  browser.newContext = async (options) => {
    const context = await newContext(options);
    context.setDefaultTimeout(BROWSER_ACTION_TIMEOUT_MS);
    onContext?.(context);
    return context;
  };
  const newPage = browser.newPage.bind(browser);
  browser.newPage = async (options) => {
    const page = await newPage(options);
    page.setDefaultTimeout(BROWSER_ACTION_TIMEOUT_MS);
    onContext?.(page.context());
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

/** Screenshots are for people to look at, not for the run to assert on: kept only with PLACARD_SCREENSHOTS=1. */
export const KEEP_SCREENSHOTS = process.env.PLACARD_SCREENSHOTS === '1';

/** Saves a picture of a page or an element under test-results/screenshots when asked for (see KEEP_SCREENSHOTS). */
export async function keepScreenshot(target: Page | Locator, name: string, options: { fullPage?: boolean } = {}): Promise<void> {
  if (!KEEP_SCREENSHOTS) return;
  await target.screenshot({ path: path.join(SCREENSHOT_DIR, name), ...options });
}

type BrowserAndServer = { browser: Browser; server: Server; baseUrl: string };

// One server and one Chromium per test worker: the browser project runs without per-file isolation,
// so every file of a worker shares them; the process's exit ends both.
let shared: Promise<BrowserAndServer> | undefined;
const contextsOfThisTest = new Set<BrowserContext>();

async function startShared(): Promise<BrowserAndServer> {
  // Every page or context a test opens is remembered, so it is closed when that test ends.
  const [{ server, baseUrl }, browser] = await Promise.all([startTestServer(), launchBrowser({ onContext: (c) => contextsOfThisTest.add(c) })]);
  return { server, baseUrl, browser };
}

/**
 * For a browser test file: the worker's test server and browser, started once. Read `env.browser`
 * and `env.baseUrl` inside the tests. Whatever a test opened is closed after it, so each test begins
 * with fresh contexts (no cookies, storage or pages of another test).
 */
export function useBrowserAndServer(): BrowserAndServer {
  const env = {} as BrowserAndServer;
  beforeAll(async () => {
    shared ??= startShared();
    Object.assign(env, await shared);
  });
  afterEach(async () => {
    const open = [...contextsOfThisTest];
    contextsOfThisTest.clear();
    await Promise.all(open.map((c) => c.close().catch(() => undefined)));
  });
  return env;
}

/**
 * Signs in with the API the sign-in form uses (GET then POST /api/session with the CSRF token), in the
 * page's own context so the browser holds the session cookie, then opens `next`: for journeys that are
 * not about signing in, which need not load and fill the sign-in screen first. Journeys about signing
 * in (auth, password reset, where each role lands, a turned-off account) use `signInInBrowser`.
 */
export async function openSignedIn(page: Page, baseUrl: string, email: string, password: string, next = '/builds'): Promise<void> {
  const session = await page.request.get(`${baseUrl}/api/session`);
  const { csrfToken } = (await session.json()) as { csrfToken: string };
  const signedIn = await page.request.post(`${baseUrl}/api/session`, { data: { email, password }, headers: { 'x-csrf-token': csrfToken } });
  if (!signedIn.ok()) throw new Error(`${email} could not sign in: ${signedIn.status()} ${await signedIn.text()}`);
  if (!((await signedIn.json()) as { user: unknown }).user) throw new Error(`${email} is not signed in after POST /api/session`);
  await page.goto(`${baseUrl}${next}`);
}

/** Signs in through the form, as a person would, and waits until the app has gone on to `next`. */
export async function signInInBrowser(page: Page, baseUrl: string, email: string, password: string, next = '/builds'): Promise<void> {
  await page.goto(`${baseUrl}/sign-in?next=${encodeURIComponent(next)}`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL(`${baseUrl}${next}`);
}
