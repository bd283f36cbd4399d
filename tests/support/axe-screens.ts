import { readFileSync, readdirSync } from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { useBrowserAndServer, openSignedIn, keepScreenshot } from './browser';
import { AxeLedger, pagesOfTheServer, screensOfTheApp, ACCEPTED } from './axe';
import { describeShowSideWalk } from './show-side-walk';
import { screenNow } from './crawl';
import { judgedShow } from './results-factory';
import { showWithClasses, signedIn } from './event-factory';
import { createFullBuild } from './build-factory';
import { DEFAULT_PASSWORD } from './factories';
import { User } from '@server/models/user';
import { showAs, type Device } from './devices';

/**
 * Screens of the route tables that no visit checks, each with why. A new screen is not exempt: it
 * fails the coverage test by name until a walk or a visit below reaches it.
 */
const EXEMPT = new Map<string, string>([
  ['/shows/:id/gate', 'an old address that only redirects to /gate/:id, which is checked'],
  [`/c/_/oswald-600.woff2`, 'the font file of the public pages, not a page'],
  ['/c/:code/log.atom', 'the Atom feed of a build, read by feed readers, not a page'],
  ['/e/:slug/calendar.ics', 'the calendar file of a show, not a page'],
]);

/** Waits until the screen (the app's or the server's) has its heading and nothing says Loading. */
async function settled(page: Page): Promise<void> {
  await page.locator('h1').first().waitFor();
  await expect.poll(async () => (await page.evaluate(screenNow)).loading).toBe(0);
}

/**
 * Every screen of every role through axe on each of `devices`, in one pass: the show side inside the
 * show-side walk (each screen checked as the walk reaches it), then the screens the walk does not reach
 * (sign-in, builds, account, admin, the public pages) as anonymous, owner, organiser and site admin, one
 * context per role. A screen is opened once and checked on every device: drawn again at each size
 * (`showAs`), not loaded again. Each device keeps its own ledger, so a screen passes only when it passes
 * on every device. Last, every path of the client's route table and of the server's public pages must
 * have been checked on each device.
 */
export function describeAccessibility(devices: readonly [Device, ...Device[]]): void {
  // The show's page is the one screen whose panels are the role's (organisers run everything, judges
  // score, the gate checks in): it is checked for each role; every other screen once per device.
  const ledgers = new Map(devices.map((d) => [d, new AxeLedger(['/shows/:id'])]));
  describeShowSideWalk(devices, ledgers);
  const env = useBrowserAndServer();
  let data: Awaited<ReturnType<typeof seed>>;

  async function seed() {
    // A show with its results published; its organiser; the owner of one of its cars, with a full build too.
    const results = await judgedShow({ hotRods: ['Axe roadster'], customs: ['Axe coupe'] });
    for (const j of [0, 1]) {
      await results.score(j, 'Axe roadster', [8, 6, 4]);
      await results.score(j, 'Axe coupe', [9, 7, 5]);
    }
    expect((await results.publish(true)).status).toBe(200);
    const owner = results.car('Axe roadster').owner;
    const full = await createFullBuild(owner.user.id, { title: 'Axe night runner' });
    const open = await showWithClasses({ settings: { name: 'Axe Open Meet' } });
    const admin = await signedIn({ name: 'Axel Admin' });
    await User.update({ isSiteAdmin: true }, { where: { id: admin.user.id } });
    return { results, owner, full, open, admin };
  }

  beforeAll(async () => {
    data = await seed();
  });

  describe(`every screen through axe on ${devices.map((d) => `a ${d.name}`).join(' and on ')}`, () => {
    it('the screens the walk does not reach, as each role', { timeout: 150_000 }, async () => {
      const problems: string[] = [];
      let turn = 0;
      // One context per role. A server page is a page load; a screen of the app is opened inside the app
      // (its router follows the address, as on Back), so the app and axe stay loaded between screens.
      // The roles take turns at which device their context is made as (and opens the screens on).
      const context = async (role: string, email?: string, next = '/builds') => {
        const order = devices.map((_, i) => devices[(turn + i) % devices.length]!);
        turn += 1;
        const page = await (await env.browser.newContext({ ...order[0]!.options, bypassCSP: true })).newPage();
        if (email) await openSignedIn(page, env.baseUrl, email, DEFAULT_PASSWORD, next);
        // The screen on every device in turn, back on the first at the end.
        const check = async (shot?: string) => {
          for (const device of order) {
            await showAs(page, device);
            await settled(page).catch((e: Error) => problems.push(`on a ${device.name}: ${role} at ${page.url()}: did not settle: ${e.message.split('\n')[0]}`));
            problems.push(...(await ledgers.get(device)!.check(page, role)).map((p) => `on a ${device.name}: ${p}`));
            if (shot) await keepScreenshot(page, `axe-${device.name}-${shot}.png`, { fullPage: true });
          }
          await showAs(page, order[0]!);
        };
        return {
          page,
          check,
          load: async (path: string, shot?: string) => {
            await page.goto(`${env.baseUrl}${path}`);
            await check(shot);
          },
          go: async (path: string, shot?: string) => {
            // The screen before keeps its heading until the next one has loaded: wait for a new heading.
            await page.locator('h1').first().evaluate((h) => h.setAttribute('data-before', ''));
            await page.evaluate((to) => {
              history.pushState(null, '', to);
              dispatchEvent(new PopStateEvent('popstate'));
            }, path);
            await page.locator('h1:not([data-before])').first().waitFor();
            await check(shot);
          },
        };
      };
      const { results, owner, full, open, admin } = data;
      const anyone = await context('anonymous');
      await anyone.load('/', 'home');
      await anyone.load('/c');
      await anyone.load(`/c/${full.code}`, 'public-build');
      await anyone.load(`/c/${full.code}/log`);
      await anyone.load(`/c/${full.code}/asked`);
      await anyone.load(`/e/${open.slug}`, 'public-show');
      await anyone.load(`/e/${results.slug}`, 'public-results');
      await anyone.load('/sign-in', 'sign-in');
      for (const path of ['/sign-up', '/reset-password', '/reset-password?token=not-a-real-token', '/verify-email?token=not-a-real-token', '/invitations/not-a-real-token', '/no-such-screen']) await anyone.go(path);

      const ownerAt = await context('owner', owner.email);
      await ownerAt.check();
      await ownerAt.go(`/builds/${full.id}`, 'build-editor');
      await ownerAt.go(`/builds/${full.id}/card`, 'card-designer');
      await ownerAt.go('/account');
      await ownerAt.go('/entries', 'my-entries');
      await ownerAt.go(`/enter/${open.slug}`);
      await ownerAt.go('/judge');

      const organiserAt = await context('organiser of published results', results.organiser.email, `/shows/${results.eventId}`);
      await organiserAt.check('organiser-results');
      await organiserAt.go(`/shows/${results.eventId}/read-out`);
      await organiserAt.go('/shows/new');

      const adminAt = await context('site admin', admin.email, '/admin/accounts');
      await adminAt.check();
      await adminAt.go('/admin/mail');
      // A caught mail is opened from the list, as the admin would: its id is the newest mail's.
      const newest = await adminAt.page.locator('main a[href^="/admin/mail/"]').first().getAttribute('href');
      await adminAt.go(newest!);

      expect(problems).toEqual([]);
    });

    it('checked every screen of the app and every public page', () => {
      const app = screensOfTheApp();
      const pages = pagesOfTheServer();
      // The table was read: the screens every role starts from are in it.
      expect(app).toEqual(expect.arrayContaining(['/sign-in', '/builds/:id', '/shows/:id/entries', '/judge/:eventId/cars/:entryId', '/gate/:id']));
      expect(pages).toEqual(expect.arrayContaining(['/', '/c/:code', '/e/:slug']));
      const missing = Object.fromEntries(devices.map((d) => [d.name, { app: ledgers.get(d)!.missing(app, EXEMPT), pages: ledgers.get(d)!.missing(pages, EXEMPT) }]));
      expect(missing).toEqual(Object.fromEntries(devices.map((d) => [d.name, { app: [], pages: [] }])));
    });

    it('lays its screens out by width alone, so a screen drawn again at another size is what that device would load', () => {
      // A device switch in place (showAs) sets the size, mobile and touch, but leaves the hover and pointer
      // media features as the touch screen had them: a stylesheet or a screen that asked for them would be
      // checked on a desktop that is not one. Only width queries and (hover: hover) (styles for a pointer
      // resting on an element, which neither the walk nor axe does) are drawn alike both ways.
      const assets = path.resolve('dist/client/assets');
      const styles = [...readdirSync(assets).filter((f) => f.endsWith('.css')).map((f) => readFileSync(path.join(assets, f), 'utf8')), readFileSync(path.resolve('server/pages/page-styles.ts'), 'utf8')];
      const queries = [...new Set(styles.flatMap((css) => [...css.matchAll(/@media\s*([^{]+)\{/g)].map((m) => m[1]!.replace(/\s+/g, ''))))];
      expect(queries.length).toBeGreaterThan(0);
      expect(queries.filter((q) => !/^(notalland)?(\((min-width|max-width|width[<>]=?)[^()]*\)(and)?)+$/.test(q) && q !== '(hover:hover)')).toEqual([]);
      // Nor does a script: the client's own sources, and any library's media question in the built client.
      const own = readdirSync(path.resolve('client/src'), { recursive: true, encoding: 'utf8' }).filter((f) => /\.tsx?$/.test(f));
      const asks = own.filter((f) => /matchMedia|maxTouchPoints|ontouchstart|TouchEvent|\((any-)?(pointer|hover)\s*:/.test(readFileSync(path.resolve('client/src', f), 'utf8')));
      const built = readdirSync(assets).filter((f) => f.endsWith('.js') && /\((any-)?(pointer|hover)\s*:/.test(readFileSync(path.join(assets, f), 'utf8')));
      expect({ own: own.length > 50, asks, built }).toEqual({ own: true, asks: [], built: [] });
    });
  });

  afterAll(() => {
    for (const [device, axe] of ledgers) {
      console.log(
      `axe on a ${device.name}: ${axe.screens.size} screens in ${axe.checked.size} checks (the show page once per role), ${axe.paths.size} paths visited, ` +
        `${screensOfTheApp().length} app routes and ${pagesOfTheServer().length} public routes (${EXEMPT.size} exempt), ${axe.seconds.toFixed(1)} s in axe; ` +
        `${ACCEPTED.length} accepted exceptions` +
        `\nslowest: ${[...axe.timings].sort((a, b) => b[1] - a[1]).slice(0, 12).map(([k, t]) => `${k} ${t.toFixed(2)}`).join(', ')}` +
          (axe.minor.length ? `\nmoderate and minor findings (not failed):\n  ${[...new Set(axe.minor)].join('\n  ')}` : ''),
      );
    }
  });
}
