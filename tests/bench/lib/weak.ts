// One bar of signal, measured in Chromium: Chrome DevTools Protocol network emulation at 400 kbit/s
// each way with 400 ms added to every round trip, a phone's viewport, a fresh context (empty cache)
// per page. Reads the browser's own paint timings: first contentful paint ("first text") and the
// last largest-contentful-paint entry, and, for app screens, when the screen's main control shows.
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';
import { CHROMIUM, CHROMIUM_ARGS } from '../../support/browser';

export const WEAK_LINK = { kbitPerSecond: 400, rttMs: 400 };
const PHONE = { viewport: { width: 390, height: 844 }, deviceScaleFactor: 2, isMobile: true, hasTouch: true };

export type WeakPage = {
  name: string;
  path: string;
  kind: 'public' | 'signed-in';
  /** Signed in (through the API, before the throttled load) as this person. */
  as?: { email: string; password: string };
  /** What a person waits for on an app screen: the page is usable once it shows. */
  usable?: (page: Page) => Promise<void>;
  /**
   * The same, as a test the page runs on every frame from its start (a JavaScript expression): the time is read
   * in the page at the frame the control arrives, not when the bench's own wait returns (up to 0.5 s later).
   */
  usableWhen?: string;
  /** What the person then does at once, and the answer they wait for (timed from the same start). */
  answer?: (page: Page) => Promise<void>;
  /** Also measure a second load once the page's service worker (this scope) is active. */
  workerScope?: string;
};
export type WeakTiming = { name: string; kind: WeakPage['kind']; warm: boolean; fcp: number; lcp: number; usable: number | null; answered?: number | null; error?: string };

const LCP_WATCH = `window.__lcp = 0; try { new PerformanceObserver((l) => { for (const e of l.getEntries()) window.__lcp = e.startTime; }).observe({ type: 'largest-contentful-paint', buffered: true }); } catch {}`;

async function throttle(context: BrowserContext, page: Page): Promise<void> {
  const cdp = await context.newCDPSession(page);
  await cdp.send('Network.enable');
  const bytesPerSecond = (WEAK_LINK.kbitPerSecond * 1000) / 8;
  await cdp.send('Network.emulateNetworkConditions', { offline: false, latency: WEAK_LINK.rttMs, downloadThroughput: bytesPerSecond, uploadThroughput: bytesPerSecond });
}

/** Records in `window.__usableAt` the first frame at which `expression` holds. */
const usableWatch = (expression: string) =>
  `window.__usableAt = 0; (function frame() { try { if (${expression}) { window.__usableAt = performance.now(); return; } } catch {} requestAnimationFrame(frame); })();`;

async function timings(page: Page, usable: WeakPage['usable'], answer?: WeakPage['answer']): Promise<{ fcp: number; lcp: number; usable: number | null; answered: number | null }> {
  let usableAt: number | null = null;
  let answeredAt: number | null = null;
  if (usable) {
    await usable(page);
    // The page's own frame time when it has one; else when the bench's wait returned.
    usableAt = await page.evaluate(() => (window as unknown as { __usableAt?: number }).__usableAt || performance.now());
  }
  if (answer) {
    await answer(page);
    answeredAt = await page.evaluate(() => performance.now());
  }
  await page.waitForLoadState('load');
  await page.waitForTimeout(300); // a last LCP entry may follow the load event by a frame or two
  return page.evaluate((u) => {
    const fcp = performance.getEntriesByName('first-contentful-paint')[0]?.startTime ?? NaN;
    return { fcp, lcp: (window as unknown as { __lcp: number }).__lcp || NaN, usable: u.usable, answered: u.answered };
  }, { usable: usableAt, answered: answeredAt });
}

async function signIn(context: BrowserContext, base: string, who: { email: string; password: string }): Promise<void> {
  const session = await context.request.get(`${base}/api/session`);
  const { csrfToken } = (await session.json()) as { csrfToken: string };
  const res = await context.request.post(`${base}/api/session`, { data: who, headers: { 'x-csrf-token': csrfToken } });
  if (res.status() !== 200) throw new Error(`sign-in for the weak-link run answered ${res.status()}`);
}

export async function launch(): Promise<Browser> {
  return chromium.launch({ executablePath: CHROMIUM, args: CHROMIUM_ARGS, timeout: 120_000 });
}

/** Each page loaded once on the weak link in a fresh context; with `workerScope`, again once its worker is active. */
export async function measureWeakLink(browser: Browser, base: string, pages: WeakPage[]): Promise<WeakTiming[]> {
  const out: WeakTiming[] = [];
  for (const p of pages) {
    const context = await browser.newContext(PHONE);
    context.setDefaultTimeout(60_000);
    try {
      if (p.as) await signIn(context, base, p.as);
      await context.addInitScript(LCP_WATCH);
      if (p.usableWhen) await context.addInitScript(usableWatch(p.usableWhen));
      const page = await context.newPage();
      await throttle(context, page);
      await page.goto(`${base}${p.path}`, { waitUntil: 'commit' });
      out.push({ name: p.name, kind: p.kind, warm: false, ...(await timings(page, p.usable, p.answer)) });
      if (p.workerScope) {
        const scope = p.workerScope;
        const deadline = Date.now() + 60_000;
        while ((await page.evaluate(async (s) => (await navigator.serviceWorker.getRegistration(s))?.active?.state ?? 'none', scope)) !== 'activated') {
          if (Date.now() > deadline) throw new Error(`the service worker of ${scope} never became active`);
          await page.waitForTimeout(200);
        }
        await page.waitForLoadState('networkidle'); // the worker has fetched the shell's assets
        await page.goto(`${base}${p.path}`, { waitUntil: 'commit' });
        out.push({ name: p.name, kind: p.kind, warm: true, ...(await timings(page, p.usable)) });
      }
    } catch (err) {
      out.push({ name: p.name, kind: p.kind, warm: false, fcp: NaN, lcp: NaN, usable: null, error: (err as Error).message.split('\n')[0] });
    } finally {
      await context.close();
    }
  }
  return out;
}
