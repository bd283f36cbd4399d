import { beforeAll, describe, expect, it } from 'vitest';
import { useBrowserAndServer } from './browser';
import { walkShowSide, type WalkedShow, type WalkView } from './crawl';
import type { Device } from './devices';
import { showWithClasses, signedIn } from './event-factory';
import { enter, memberOf, step } from './show-day-factory';
import { judgeOf, showInJudging } from './judging-factory';
import { confirmEntryPayment } from '@server/services/entries/entries';
import { User } from '@server/models/user';
import type { AxeLedger } from './axe';

type Person = { role: string; email: string };

/**
 * Every role reaches every screen of the show side by clicking the product's own links (never by
 * typing an address), forward and back, and nothing breaks on the way: no error boundary, no script or
 * console error. Screens that share a cached answer are reached one after the other here, which is how
 * two shapes under one cache key were found breaking. Each role walks once for all `devices`: the
 * roles take turns at which device the walk clicks on (and signs in with), and every screen is drawn
 * again and checked on each other device (`walkShowSide`). With `axe` (a ledger per device), every
 * screen of each role's walk is also checked for accessibility on each device (tests/support/axe.ts).
 */
export function describeShowSideWalk(devices: readonly [Device, ...Device[]], axe?: ReadonlyMap<Device, AxeLedger>): void {
  const onEvery = devices.map((d) => `a ${d.name}`).join(' and on ');
  const env = useBrowserAndServer();
  const people: Person[] = [];
  const shows: WalkedShow[] = [];

  beforeAll(async () => {
    // A show on its day, gate open: paid and unpaid cars, a co-organiser and a gate person.
    const onTheDay = await showWithClasses({ settings: { name: 'Walkabout Show' }, classes: [{ name: 'Hot rods' }, { name: 'Customs' }] });
    const paid = await enter(onTheDay.eventId, onTheDay.classIds[0]!, 'Walked roadster');
    await confirmEntryPayment(paid.entry.id, 'ref-walk');
    await enter(onTheDay.eventId, onTheDay.classIds[1]!, 'Walked coupe');
    await step(onTheDay.organiser.client, onTheDay.eventId, 'close_registration', 'open_gate');
    const co = await memberOf(onTheDay.eventId, 'organiser', 'Cora Organiser');
    const gate = await memberOf(onTheDay.eventId, 'gate', 'Gil Gatekeeper');
    // A show being judged, with a judge of every class; the owner of its cars.
    const judged = await showInJudging();
    const judge = await judgeOf(judged.eventId);
    expect((await judged.organiser.client.put(`/api/events/${judged.eventId}/judges/${judge.user.id}/classes`, { allClasses: true })).status).toBe(200);
    const admin = await signedIn({ name: 'Ada Admin' });
    await User.update({ isSiteAdmin: true }, { where: { id: admin.user.id } });
    shows.push({ id: onTheDay.eventId, slug: onTheDay.slug }, { id: judged.eventId, slug: judged.slug });
    people.push(
      { role: 'organiser', email: onTheDay.organiser.email },
      { role: 'co-organiser', email: co.email },
      { role: 'gate', email: gate.email },
      { role: 'judge', email: judge.email },
      { role: 'owner', email: judged.owner.email },
      { role: 'site admin', email: admin.email },
    );
  });

  describe('the show side, walked by every role through its own links', () => {
    // Six walks, and with axe a check of each new screen: longer than the project's minute, never stuck (each action has its 20 s).
    it(`breaks no screen on ${onEvery}`, { timeout: 150_000 }, async () => {
      const walks: string[] = [];
      const landings: Record<string, string> = {};
      // Every role walks before the findings are shown, so one run lists them all.
      const found: string[] = [];
      for (const [turn, person] of people.entries()) {
        // The devices in turn: the first is the one this role signs in and clicks on.
        const order = devices.map((_, i) => devices[(turn + i) % devices.length]!);
        const context = await env.browser.newContext({ ...order[0]!.options, bypassCSP: axe !== undefined });
        // A co-organiser sees what the organiser sees: axe looks at those screens once, as the organiser.
        const views = order.map((device): WalkView => {
          const ledger = person.role === 'co-organiser' ? undefined : axe?.get(device);
          return { device, onScreen: ledger && ((page) => ledger.check(page, person.role)) };
        });
        const { landedOn, reached, problems } = await walkShowSide(await context.newPage(), env.baseUrl, person.email, { shows, views: views as [WalkView, ...WalkView[]] });
        await context.close();
        found.push(...problems.map((p) => `${person.role}: ${p}`));
        landings[person.role] = landedOn;
        walks.push(`${person.role}: ${reached.join(' ')}`);
      }
      expect(found).toEqual([]);
      // Each role lands on its day: the organisers on the show's Today, the gate on the scanner, the judge on their cars.
      const [onTheDay, judged] = shows as [WalkedShow, WalkedShow];
      expect(landings).toEqual({
        organiser: `/shows/${onTheDay.id}`,
        'co-organiser': `/shows/${onTheDay.id}`,
        gate: `/gate/${onTheDay.id}`,
        judge: `/judge/${judged.id}`,
        owner: '/builds',
        'site admin': '/admin/accounts',
      });
      // The walks reached the screens of each role's day, not only the list of shows.
      const of = (role: string) => walks.find((w) => w.startsWith(`${role}:`)) ?? '';
      expect(of('organiser')).toMatch(/\/shows\/\d+ .*\/shows\/\d+\/entries/);
      expect(of('organiser')).toMatch(/\/gate\/\d+/);
      expect(of('co-organiser')).toMatch(/\/shows\/\d+\/entries/);
      expect(of('gate')).toMatch(/\/gate\/\d+/);
      expect(of('judge')).toMatch(/\/judge\/\d+/);
    });
  });
}
