import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { brotliDecompressSync } from 'node:zlib';
import { publicPageCache } from '@server/pages/page-cache';
import { PUBLIC_EVENT_ENTRIES_PER_PAGE } from '@shared/schemas/public-event';
import { testApp } from '../../support/api-client';
import { bigShow } from '../../support/big-show';
import { listenApp, rawGet } from '../../support/raw-http';
import { checkPageVersionOnEveryRequest } from '../../support/page-cache';

checkPageVersionOnEveryRequest();

/** The numbers listed on a page, in order. */
const numbersOn = (html: string) => [...html.matchAll(/<span class="n">(\d+)<\/span><a href/g)].map((m) => Number(m[1]));

describe('the public show page of a big show: paged and searchable without script', () => {
  let big: Awaited<ReturnType<typeof bigShow>>;
  let small: Awaited<ReturnType<typeof bigShow>>;
  let server: Awaited<ReturnType<typeof listenApp>>;
  beforeAll(async () => {
    big = await bigShow(5000);
    small = await bigShow(60);
    server = await listenApp();
  }, 30_000);
  afterAll(() => server?.close());

  it('sends a first view of under 30 KB compressed at 5,000 cars, no bigger than a 60-car show’s, listing the first page by class', async () => {
    const first = await rawGet(`${server.baseUrl}/e/${big.slug}`, { 'Accept-Encoding': 'br, gzip' });
    expect(first.status).toBe(200);
    expect(first.headers['content-encoding']).toBe('br');
    expect(first.body.length).toBeLessThan(30_000);
    const html = brotliDecompressSync(first.body).toString('utf8');
    expect(html).not.toMatch(/<script/i);
    // The first page: the first 50 cars of the first class (numbers 1, 4, 7, …), then the pager.
    expect(numbersOn(html)).toEqual(Array.from({ length: PUBLIC_EVENT_ENTRIES_PER_PAGE }, (_, i) => 1 + 3 * i));
    expect(html).toContain('5,000 cars');
    expect(html).toMatch(/Hot rods<\/a><span class="muted">1,667 cars/);
    expect(html).toMatch(/Trucks<\/a><span class="muted">1,666 cars/);
    expect(html).toMatch(new RegExp(`<a href="/e/${big.slug}\\?page=2#entries">Next →</a>`));
    expect(html).toMatch(/<form class="find" role="search" action="\/e\/[^"]+" method="get">/);

    // The page costs what it shows: the same 50 cars from a 60-car show weigh about the same.
    const few = await rawGet(`${server.baseUrl}/e/${small.slug}`, { 'Accept-Encoding': 'br' });
    expect(first.body.length).toBeLessThan(few.body.length * 1.2);
  });

  it('lists page 2 of one class, a search by title or number, and a search within a class, each with the right cars', async () => {
    const customs = big.classIds[1]!;
    const page2 = await request(testApp()).get(`/e/${big.slug}?class=${customs}&page=2`);
    expect(page2.status).toBe(200);
    // Customs hold numbers 2, 5, 8, …; page 2 starts at its 51st car.
    expect(numbersOn(page2.text)).toEqual(Array.from({ length: 50 }, (_, i) => 2 + 3 * (50 + i)));
    expect(page2.text).toContain('1,667 cars in Customs · 51–100 shown, page 2 of 34');
    expect(page2.text).toMatch(/<a href="\/e\/[^"?]+\?class=\d+#entries" aria-current="page">Customs<\/a>/);
    expect(page2.text).toMatch(new RegExp(`href="/e/${big.slug}\\?class=${customs}&amp;page=3#entries">Next`));

    const byTitle = await request(testApp()).get(`/e/${big.slug}?q=salt+ROADSTER`);
    expect(numbersOn(byTitle.text)).toEqual([4321]);
    expect(byTitle.text).toContain('1 car matches “salt ROADSTER”');
    expect(byTitle.text).toMatch(/<input id="find-q" type="search"[^>]* name="q"[^>]* value="salt ROADSTER"\/>/);

    const byNumber = await request(testApp()).get(`/e/${big.slug}?q=4321&class=`);
    expect(numbersOn(byNumber.text)).toEqual([4321]);

    // Number 4321 is a Hot rod ((4321 − 1) mod 3 = 0): searched in Trucks it is not there.
    const inClass = await request(testApp()).get(`/e/${big.slug}?q=4321&class=${big.classIds[2]}`);
    expect(numbersOn(inClass.text)).toEqual([]);
    expect(inClass.text).toContain('No car matches “4321” in Trucks.');

    // A wildcard typed by a person is a plain character: "Field car 1_" matches no title.
    expect(numbersOn((await request(testApp()).get(`/e/${big.slug}?q=${encodeURIComponent('car 1_')}`)).text)).toEqual([]);

    const checkedIn = await request(testApp()).get(`/e/${big.slug}?q=Field+car+30&class=${big.classIds[2]}`);
    expect(checkedIn.text).toMatch(/<span class="n">30<\/span><a href="[^"]+">Field car 30<\/a><span class="here">On the field<\/span>/);
  });

  it('keeps the shown pages in the cache and never a search; answers a list it cannot read with a 400 naming the field', async () => {
    await request(testApp()).get(`/e/${big.slug}?page=3`).expect(200);
    await request(testApp()).get(`/e/${big.slug}?q=Teal`).expect(200);
    expect(publicPageCache.get(`e|${big.slug}||3`)).toBeDefined();
    expect(publicPageCache.get(`e|${big.slug}||1`)).toBeDefined();
    expect(publicPageCache.keys().filter((k) => k.includes('Teal'))).toEqual([]);

    const beyond = await request(testApp()).get(`/e/${big.slug}?page=500`);
    expect(beyond.status).toBe(200);
    expect(beyond.text).toContain('There is no car on page 500.');
    // A page past the last is answered but not kept: the cache holds only pages that exist.
    expect(publicPageCache.get(`e|${big.slug}||500`)).toBeUndefined();

    for (const [query, field] of [
      ['page=two', 'page'],
      ['page=0', 'page'],
      ['class=x', 'class'],
      [`q=${'a'.repeat(81)}`, 'q'],
      ['q=a&q=b', 'q'],
    ] as const) {
      const bad = await request(testApp()).get(`/e/${big.slug}?${query}`);
      expect(bad.status, query).toBe(400);
      expect(bad.text, query).toContain(`${field}:`);
    }
    const otherShowsClass = await request(testApp()).get(`/e/${big.slug}?class=${small.classIds[0]}`);
    expect(otherShowsClass.text).toContain('That class is not one of this show’s.');
    expect(numbersOn(otherShowsClass.text)).toEqual([]);
  });
});
