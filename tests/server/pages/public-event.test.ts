import { describe, expect, it } from 'vitest';
import request from 'supertest';
import { testApp } from '../../support/api-client';
import { createFullBuild } from '../../support/build-factory';
import { showWithClasses, signedIn } from '../../support/event-factory';
import { confirmEntryPayment } from '@server/services/entries/entries';
import { checkPageVersionOnEveryRequest } from '../../support/page-cache';


checkPageVersionOnEveryRequest();
describe('the public show page /e/<slug>', () => {
  it('shows name, dates in the show’s zone, venue, fee in the currency’s decimals, classes and confirmed entries linking to their pages; nothing private', async () => {
    const { eventId, classIds, slug, organiser } = await showWithClasses({
      settings: { name: 'Dry Lake Gathering', timeZone: 'America/Chicago', startsAt: '2027-06-12T14:00:00.000Z', endsAt: '2027-06-13T22:00:00.000Z', registrationOpensAt: new Date(Date.now() - 86400_000).toISOString(), registrationClosesAt: '2027-06-01T00:00:00.000Z', refundRule: { fullRefundUntil: null, afterwardsPercent: 0 }, entryFee: 3000, currency: 'JPY' },
    });
    const owner = await signedIn({ name: 'Private Person' });
    const build = await createFullBuild(owner.user.id, { title: 'Salt-flat coupe', vin: 'VINSECRET123', plate: 'PLATE-777', ownerPhone: '+1 555 0100', ownerAddress: '1 Secret Lane' });
    const unpaid = await createFullBuild(owner.user.id, { title: 'Unpaid wagon' });
    const e1 = (await owner.client.post(`/api/events/${eventId}/entries`, { buildId: build.id, classId: classIds[1] })).body.entry;
    await owner.client.post(`/api/events/${eventId}/entries`, { buildId: unpaid.id, classId: classIds[0] });
    await confirmEntryPayment(e1.id, 'pay_page_1');

    const page = await request(testApp()).get(`/e/${slug}`);
    expect(page.status).toBe(200);
    expect(page.headers['content-type']).toMatch(/html/);
    expect(page.headers['cache-control']).toMatch(/public, max-age=30/);
    expect(page.text).not.toMatch(/<script/i);
    expect(page.text).toContain('Dry Lake Gathering');
    expect(page.text).toMatch(/Sat, 12 June 2027(,| at) 09:00/); // 14:00 UTC is 09:00 in Chicago (CDT, UTC−5)
    expect(page.text).toContain('America/Chicago');
    expect(page.text).toContain('¥3,000');
    expect(page.text).toContain('The old airfield');
    expect(page.text).toMatch(/<span class="n">1<\/span><a href="http:\/\/127\.0\.0\.1:3999\/c\/[A-Z0-9]+">Salt-flat coupe<\/a>/);
    expect(page.text).not.toContain('Unpaid wagon');
    for (const secret of ['VINSECRET123', 'PLATE-777', '555 0100', 'Secret Lane', owner.email, 'Private Person', organiser.email]) expect(page.text).not.toContain(secret);
    expect(Buffer.byteLength(page.text)).toBeLessThan(20_000);
    const again = await request(testApp()).get(`/e/${slug}`).set('If-None-Match', page.headers.etag!);
    expect(again.status).toBe(304);

    const json = await request(testApp()).get(`/api/public/events/${slug}`);
    expect(json.body.event).toMatchObject({ name: 'Dry Lake Gathering', feeText: '¥3,000', entryFee: 3000, currency: 'JPY', takingEntries: true });
    expect(json.body.event.classes[1].entries).toEqual([{ number: 1, title: 'Salt-flat coupe', url: `http://127.0.0.1:3999/c/${build.code}` }]);
    for (const secret of ['VINSECRET123', 'PLATE-777', owner.email, 'Private Person', organiser.email]) expect(JSON.stringify(json.body)).not.toContain(secret);

    const ics = await request(testApp()).get(`/e/${slug}/calendar.ics`);
    expect(ics.headers['content-type']).toMatch(/text\/calendar/);
    expect(ics.text).toMatch(/BEGIN:VCALENDAR/);
    expect(ics.text).toMatch(/DTSTART:20270612T140000Z/);
    expect(ics.text).toMatch(/DTEND:20270613T220000Z/);
    expect(ics.text).toMatch(/SUMMARY:Dry Lake Gathering/);

    // The car's own page names the show it is entered in while the show is on.
    const carPage = await request(testApp()).get(`/c/${build.code}`);
    expect(carPage.text).toMatch(/id="show-entry"/);
    expect(carPage.text).toContain('Dry Lake Gathering');
    expect(carPage.text).toContain('Class: Customs');
    expect(carPage.text).toContain('Entry 1');
    const unpaidPage = await request(testApp()).get(`/c/${unpaid.code}`);
    expect(unpaidPage.text).not.toMatch(/id="show-entry"/);
  });

  it('answers 404 for a draft show, an unknown address and a malformed one', async () => {
    const { slug } = await showWithClasses({ open: false });
    for (const path of [`/e/${slug}`, '/e/no-such-show', '/e/..%2F..', `/e/${slug}/calendar.ics`]) expect((await request(testApp()).get(path)).status).toBe(404);
    expect((await request(testApp()).get(`/api/public/events/${slug}`)).status).toBe(404);
  });
});
