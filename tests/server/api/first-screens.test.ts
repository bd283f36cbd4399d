import { describe, expect, it } from 'vitest';
import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import path from 'node:path';
import request from 'supertest';
import { testApp } from '../../support/api-client';
import { showWithClasses, signedIn } from '../../support/event-factory';
import { memberOf, step } from '../../support/show-day-factory';

import { judgeOf, scoreItem, showInJudging } from '../../support/judging-factory';
import { EARLY_SCRIPT_SOURCE } from '@server/first-screens/early-script';
import { APP_KEPT_HEADER } from '@server/first-screens/first-screen';

// The first screens the server draws on app addresses opened cold on a weak signal (server/first-screens/).
const root = (html: string) => html.slice(html.indexOf('<div id="root">'), html.indexOf('<noscript>'));
const early = (html: string) => /data-early-path="([^"]+)"/.exec(html)?.[1] ?? null;
const inlineScripts = (html: string) => [...html.matchAll(/<script>([\s\S]*?)<\/script>/g)].map((m) => m[1]!);
const scriptSrc = (res: request.Response) => /script-src ([^;]+)/.exec(String(res.headers['content-security-policy']))![1]!;
const sha256 = (text: string) => `'sha256-${createHash('sha256').update(text).digest('base64')}'`;

/** Every inline script the page carries is allowed by the page's own policy (by hash), and no page allows more. */
function expectPolicyFits(res: request.Response) {
  const scripts = inlineScripts(res.text);
  const allowed = scriptSrc(res).split(' ').filter((s) => s.startsWith("'sha256-"));
  expect(allowed).toEqual(scripts.map(sha256));
}

describe('the first screen the server draws before the app arrives', () => {
  it('is the sign-in form on /sign-in, the same for everyone, with its one script allowed by hash', async () => {
    const res = await request(testApp()).get('/sign-in').set('Accept-Encoding', 'identity');
    expect(res.status).toBe(200);
    expect(early(res.text)).toBe('/sign-in');
    expect(res.text).toContain('data-early-form="sign-in"');
    expect(res.text).toMatch(/<label>E-mail<input [^>]*type="email"[^>]*name="email"/);
    expect(res.text).toMatch(/<label>Password<input [^>]*type="password"[^>]*name="password"/);
    expect(root(res.text)).not.toContain('Opening…');
    expect(res.headers['cache-control']).toBe('no-cache');
    expect(inlineScripts(res.text)).toHaveLength(1);
    expect(scriptSrc(res)).toContain(EARLY_SCRIPT_SOURCE);
    expectPolicyFits(res);
  });

  it('is the gate’s number box for the gate staff of a show on show day only, kept out of shared caches', async () => {
    // A name with what a string replacement or the HTML would misread: it must come out as typed, escaped.
    const show = await showWithClasses({ settings: { name: 'Dusk $& Dawn <Meet>' } });
    const gate = await memberOf(show.eventId, 'gate', 'Gale Gatewood');
    const stranger = await signedIn({ name: 'No Role' });
    const address = `/gate/${show.eventId}`;

    // Before show day the gate is closed: the opening text, and the app says why.
    const closed = await gate.client.get(address).set('Accept-Encoding', 'identity');
    expect(closed.status).toBe(200);
    expect(early(closed.text)).toBeNull();
    expect(root(closed.text)).toContain('Opening…');
    expect(inlineScripts(closed.text)).toHaveLength(0);
    expectPolicyFits(closed);

    await step(show.organiser.client, show.eventId, 'close_registration', 'open_gate');
    const open = await gate.client.get(address).set('Accept-Encoding', 'identity');
    expect(early(open.text)).toBe(address);
    expect(open.text).toContain('<h1>Gate · Dusk $&amp; Dawn &lt;Meet&gt;</h1>');
    const box = /<input [^>]*name="number"[^>]*>/.exec(open.text)?.[0];
    expect(box).toContain('aria-label="Entry number"');
    expect(box).toContain('inputMode="numeric"');
    expect(open.headers['cache-control']).toBe('private, no-cache');
    expectPolicyFits(open);
    // The page still names the screen's chunks and first answer.
    expect(open.text).toContain(`<link rel="preload" as="fetch" crossorigin href="/api/events/${show.eventId}">`);

    // Through the gate's service worker the app is on the phone already: no drawing, nothing personal kept.
    expect(readFileSync(path.resolve(import.meta.dirname, '../../../client/public/offline-shell-sw.js'), 'utf8').toLowerCase()).toContain(`'${APP_KEPT_HEADER}': 'app-kept'`);
    const kept = await gate.client.get(address).set(APP_KEPT_HEADER, 'app-kept');
    expect(early(kept.text)).toBeNull();
    expect(kept.headers['cache-control']).toBe('no-cache');

    // The organiser may check in too; nobody else gets the box: not signed in, no role, another show's id.
    expect(early((await show.organiser.client.get(address)).text)).toBe(address);
    for (const res of [await request(testApp()).get(address), await stranger.client.get(address), await gate.client.get(`/gate/${show.eventId + 1000}`), await gate.client.get('/gate/99999999999'), await gate.client.get('/gate/0')]) {
      expect(res.status).toBe(200);
      expect(early(res.text)).toBeNull();
      expectPolicyFits(res);
    }
  });

  it('is a judge’s cars for that judge while the show is judged: each car’s state as the server holds it, then the cars still expected', async () => {
    const show = await showInJudging({ carsPerClass: 2, notArrived: 1 });
    const judge = await judgeOf(show.eventId, 'Jude Early');
    expect((await show.organiser.client.put(`/api/events/${show.eventId}/judges/${judge.user.id}/classes`, { allClasses: true })).status).toBe(200);
    const view = (await judge.client.get(`/api/events/${show.eventId}/judging/mine`)).body;
    const [first] = view.cars as Array<{ entryId: number; number: number; title: string }>;
    const sent = await judge.client.post(`/api/events/${show.eventId}/scores`, { scores: view.criteria.map((c: { id: number }) => scoreItem(first!.entryId, c.id, 5)) });
    expect(sent.status, JSON.stringify(sent.body)).toBe(200);

    const address = `/judge/${show.eventId}`;
    const res = await judge.client.get(address).set('Accept-Encoding', 'identity');
    expect(early(res.text)).toBe(address);
    expect(res.text).toContain(`My cars: 1 of ${view.cars.length} scored · 1 still expected`);
    expect(res.text).toContain(`<a href="/judge/${show.eventId}/cars/${first!.entryId}"><b>${first!.number}</b> ${first!.title} · `);
    expect(res.text).toMatch(/ · Scored<\/a>/);
    expect(res.text).toMatch(/ · Not yet<\/a>/);
    expect(res.text).toContain('Still expected at the gate');
    expect(res.headers['cache-control']).toBe('private, no-cache');
    expectPolicyFits(res);

    // The organiser, another show's judge address and nobody signed in: the app's own answer, no list.
    for (const other of [await show.organiser.client.get(address), await judge.client.get(`/judge/${show.eventId + 1000}`), await request(testApp()).get(address)]) {
      expect(early(other.text)).toBeNull();
      expectPolicyFits(other);
    }
  });

  it('is not drawn on the other app addresses, whose policy stays without any inline script', async () => {
    for (const address of ['/judge', '/judge/12/cars/3', '/builds', '/sign-in/extra', '/gate/12/more']) {
      const res = await request(testApp()).get(address).set('Accept-Encoding', 'identity');
      expect(res.status, address).toBe(200);
      expect(early(res.text), address).toBeNull();
      expect(scriptSrc(res), address).toBe("'self'");
    }
  });
});
