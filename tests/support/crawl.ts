import { expect } from 'vitest';
import type { Locator, Page } from 'playwright-core';
import { DEFAULT_PASSWORD } from './factories';
import { showAs, type Device } from './devices';

/** The shows a walk may enter (by id, and by the public slug the entry form uses). */
export type WalkedShow = { id: number; slug: string };

/**
 * A device the walk checks every screen on, and what else to look at there (`onScreen`: the
 * accessibility checks, which return their failing findings).
 */
export type WalkView = { device: Device; onScreen?: (page: Page) => Promise<string[]> };

/** What a walk found: every screen reached (by its path) and anything that broke on the way. */
/** `landedOn`: where sign-in with no `next` took the person (each role lands on its day). */
export type Walk = { landedOn: string; reached: string[]; problems: string[] };

/** The in-app links of the show side that a walk follows (files, the public pages and sign-out are left alone). */
const SHOW_SIDE = /^\/(shows|judge|gate|entries|enter|invitations)(\/|$)/;

/**
 * Records, for the life of the page, every script error and console error, so a walk can tell which
 * step each one came from.
 */
function watchForErrors(page: Page): string[] {
  const errors: string[] = [];
  page.on('pageerror', (err) => errors.push(`script error: ${err.message}`));
  // A 403 on /api/session is a CSRF token that went stale between two first visits' sessions: the
  // client renews it and sends the sign-in again at once (lib/api.ts), so nothing breaks for the person.
  const renewedToken = (url: string, status: number) => status === 403 && new URL(url).pathname === '/api/session';
  page.on('console', (msg) => {
    if (msg.type() !== 'error') return;
    if (/status of 403/.test(msg.text()) && msg.location().url && renewedToken(msg.location().url, 403)) return;
    errors.push(`console error: ${msg.text()}`);
  });
  // The console names the status but not the address: say which request the product made and was refused.
  page.on('response', (res) => {
    if (res.status() >= 400 && !renewedToken(res.url(), res.status())) errors.push(`refused: ${res.request().method()} ${new URL(res.url()).pathname} answered ${res.status()}`);
  });
  return errors;
}

/**
 * What the screen shows now, read in one look at the page (a walk settles every screen on each device:
 * Playwright's role queries took a third of the walk): how many status lines say Loading, and the
 * headings, each by the roles' own rules (a status is `role="status"` or an `<output>`, a heading h1–h6
 * or `role="heading"`; nothing hidden or under `aria-hidden` counts).
 */
export function screenNow(): { loading: number; headings: string[] } {
  const shown = (el: Element) => el.checkVisibility({ visibilityProperty: true }) && !el.closest('[aria-hidden="true"]');
  const words = (el: Element) => (el.textContent ?? '').replace(/\s+/g, ' ').trim();
  const loading = [...document.querySelectorAll('[role="status"], output')].filter((el) => shown(el) && /^Loading/.test(words(el))).length;
  const headings = [...document.querySelectorAll('h1, h2, h3, h4, h5, h6, [role="heading"]')].filter(shown).map(words);
  return { loading, headings };
}

/** Waits until the screen has stopped loading, then says what is wrong with it, if anything. */
async function settle(page: Page): Promise<string | null> {
  await page.locator('main h1').first().waitFor();
  let now = { loading: 0, headings: [] as string[] };
  await expect.poll(async () => (now = await page.evaluate(screenNow)).loading).toBe(0);
  if (now.headings.some((h) => /this screen broke/i.test(h))) return 'the screen broke (error boundary)';
  // The app's own not-found screen says "Nothing parked here" (client/src/app/not-found-page.tsx).
  if (now.headings.some((h) => /not found|nothing parked here/i.test(h))) return 'a link led to a page that is not there';
  return null;
}

/**
 * The show-side links on the screen now, in page order, each once: the lists, and the screens of the
 * walk's own shows (the test database holds every other test's shows too; a walk of them all would
 * grow with the suite, not with the product).
 */
async function showSideLinks(page: Page, shows: readonly WalkedShow[]): Promise<string[]> {
  const hrefs = await page.locator('main a[href], nav a[href]').evaluateAll((as) => as.filter((a) => !a.hasAttribute('download')).map((a) => a.getAttribute('href') ?? ''));
  const ours = (h: string) => {
    const id = /^\/(?:shows|judge)\/(\d+)/.exec(h)?.[1];
    const slug = /^\/enter\/([^/?#]+)/.exec(h)?.[1];
    if (id !== undefined) return shows.some((s) => s.id === Number(id));
    if (slug !== undefined) return shows.some((s) => s.slug === slug);
    return true;
  };
  return [...new Set(hrefs.filter((h) => SHOW_SIDE.test(h) && ours(h)))];
}

/** Marks the screen's heading before a navigation; returns its words. */
async function markScreen(page: Page): Promise<string | null> {
  return page.evaluate(() => {
    const h = document.querySelector('main h1');
    h?.setAttribute('data-walked-from', '');
    return h?.textContent ?? null;
  });
}

/**
 * The address changes before the router has drawn the next screen (it renders in a transition): waits
 * until the heading is a new one or says something else, so a screen is never judged by the one before.
 * Two screens of one route with the same words keep their heading element: after 5 s the walk goes on.
 */
async function nextScreen(page: Page, before: string | null): Promise<void> {
  const drawn = (words: string | null) => {
    const h = document.querySelector('main h1');
    return h !== null && (!h.hasAttribute('data-walked-from') || h.textContent !== words);
  };
  await page.waitForFunction(drawn, before, { timeout: 5_000 }).catch(() => undefined);
}

/**
 * Signs in through the form and walks the show side as a person would: from the "Shows" link, every
 * show-side link on each screen is clicked (depth first, each path once), each screen checked once it
 * has loaded, then the browser's Back button is pressed and the screen before is checked again.
 *
 * The walk goes on the first of `views` (the page must have been made as that device); at every stop
 * the screen is drawn again as each other device (`showAs`: re-drawn, not loaded again) and checked
 * there too, and each link is first tried there (Playwright's trial click: visible, enabled, not
 * covered) before it is clicked on the first, so one walk proves for every device what a walk on each
 * would have. Each problem names its device.
 */
export async function walkShowSide(
  page: Page,
  baseUrl: string,
  email: string,
  opts: { shows: readonly WalkedShow[]; views: readonly [WalkView, ...WalkView[]]; maxScreens?: number },
): Promise<Walk> {
  const errors = watchForErrors(page);
  const problems: string[] = [];
  const reached: string[] = [];
  const visited = new Set<string>();
  const maxScreens = opts.maxScreens ?? 30;
  const [first, ...others] = opts.views;

  /** Checks the screen on every device; with `look`, also runs each device's `onScreen`. Ends on the first device. */
  const check = async (where: string, look: boolean) => {
    for (const view of opts.views) {
      await showAs(page, view.device);
      const on = `on a ${view.device.name}`;
      const wrong = await settle(page);
      const seen = errors.splice(0);
      if (wrong) problems.push(`${on}: ${where}: ${wrong}`);
      for (const e of seen) problems.push(`${on}: ${where}: ${e}`);
      if (look && view.onScreen) for (const p of await view.onScreen(page)) problems.push(`${on}: ${p}`);
    }
    await showAs(page, first.device);
  };
  /** Clicks a link on the first device, once a trial click has found it clickable on each of the others. */
  const click = async (link: Locator) => {
    for (const view of others) {
      await showAs(page, view.device);
      await link.click({ trial: true }).catch((e: Error) => {
        throw new Error(`on a ${view.device.name}, a link the walk follows cannot be clicked: ${e.message}`);
      });
    }
    await showAs(page, first.device);
    await link.click();
  };

  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(DEFAULT_PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL((u) => !u.pathname.startsWith('/sign-in'));
  const landedOn = new URL(page.url()).pathname;
  // The landing screen is looked at too when each screen is (`onScreen`: the accessibility checks).
  if (opts.views.some((v) => v.onScreen)) await check(`landing at ${landedOn}`, true);
  // The judge's and the gate's phone screens have no site menu: from there the walk opens the shows by address.
  if (landedOn.startsWith('/judge') || landedOn.startsWith('/gate')) await page.goto(`${baseUrl}/shows`);
  else await click(page.locator('nav').getByRole('link', { name: 'Shows', exact: true }));
  await page.waitForURL(`${baseUrl}/shows`);

  const visit = async (path: string, depth: number): Promise<void> => {
    visited.add(path);
    reached.push(path);
    await check(`at ${path}`, true);
    if (depth >= 4) return;
    for (const href of await showSideLinks(page, opts.shows)) {
      if (visited.has(href) || reached.length >= maxScreens) continue;
      let before = await markScreen(page);
      await click(page.locator(`main a[href="${href}"], nav a[href="${href}"]`).first());
      await page.waitForURL((u) => u.pathname + u.search === href);
      await nextScreen(page, before);
      await visit(href, depth + 1);
      before = await markScreen(page);
      await page.goBack();
      await page.waitForURL((u) => u.pathname + u.search === path);
      await nextScreen(page, before);
      await check(`back at ${path} from ${href}`, false);
    }
  };
  await visit('/shows', 0);
  return { landedOn, reached, problems };
}
