import { describe, expect, it } from 'vitest';
import request from 'supertest';
import { testApp } from '../../support/api-client';
import { ownerWithBuild, showWithClasses } from '../../support/event-factory';
import { checkPageVersionOnEveryRequest } from '../../support/page-cache';

checkPageVersionOnEveryRequest();

const FULL_UNTIL = '2030-03-01T17:00:00.000Z';

describe('before an owner pays: the refund rule and the places left in each class', () => {
  it('the public show page and its JSON say the refund rule in the show’s zone and the places left, an open offer holding its place', async () => {
    const { eventId, classIds, slug } = await showWithClasses({
      settings: { timeZone: 'Europe/Berlin', capacity: 10, entryFee: 2500, currency: 'EUR', refundRule: { fullRefundUntil: FULL_UNTIL, afterwardsPercent: 50 } },
      classes: [{ name: 'Hot rods', capacity: 2 }, { name: 'Customs' }, { name: 'Trucks', capacity: 20 }],
    });
    const owners = await Promise.all(['First rod', 'Second rod', 'Third rod'].map((t) => ownerWithBuild(t)));
    const entries = [];
    for (const o of owners) entries.push((await o.client.post(`/api/events/${eventId}/entries`, { buildId: o.build.id, classId: classIds[0] })).body.entry);
    expect(entries.map((e) => e.status)).toEqual(['awaiting_payment', 'awaiting_payment', 'waiting_list']);
    // The first withdraws: the third is offered the place, which it holds until the offer's deadline.
    expect((await owners[0]!.client.post(`/api/entries/${entries[0].id}/withdraw`, {})).status).toBe(200);

    const json = (await request(testApp()).get(`/api/public/events/${slug}`)).body.event;
    expect(json.refundRule).toEqual({ fullRefundUntil: FULL_UNTIL, afterwardsPercent: 50 });
    // Hot rods: 2 − (one unpaid + one open offer). Customs has no limit of its own: the show's 10 − 2 taken. Trucks: the show's room is the smaller.
    expect(json.classes.map((c: { name: string; placesLeft: number | null }) => [c.name, c.placesLeft])).toEqual([
      ['Hot rods', 0],
      ['Customs', 8],
      ['Trucks', 8],
    ]);

    const page = (await request(testApp()).get(`/e/${slug}`)).text;
    expect(page).toMatch(/Withdraw by Fri, 1 March 2030(,| at) 18:00 \(Europe\/Berlin\) for the whole fee back; after that, 50% of the fee back\./);
    expect(page).toMatch(/>Hot rods<\/a>.*?Full: new entries join the waiting list/);
    expect(page).toMatch(/>Customs<\/a>.*?8 places left/);
  });

  it('says when there is no limit and when a rule gives nothing back', async () => {
    const { slug } = await showWithClasses({ settings: { refundRule: { fullRefundUntil: null, afterwardsPercent: 0 } }, classes: [{ name: 'Open class' }, { name: 'Small class', capacity: 1 }] });
    const json = (await request(testApp()).get(`/api/public/events/${slug}`)).body.event;
    expect(json.classes.map((c: { placesLeft: number | null }) => c.placesLeft)).toEqual([null, 1]);
    const page = (await request(testApp()).get(`/e/${slug}`)).text;
    expect(page).toContain('No refund if you withdraw.');
    expect(page).toMatch(/>Open class<\/a>.*?No limit on places/);
    expect(page).toMatch(/>Small class<\/a>.*?1 place left/);
  });

  it('says nothing of places once the show no longer takes entries', async () => {
    const { organiser, eventId, slug } = await showWithClasses({ classes: [{ name: 'Open class' }, { name: 'Small class', capacity: 1 }] });
    expect((await organiser.client.post(`/api/events/${eventId}/lifecycle`, { action: 'close_registration' })).status).toBe(200);
    const page = (await request(testApp()).get(`/e/${slug}`)).text;
    expect(page).toMatch(/>Small class<\/a>/);
    expect(page).not.toMatch(/No limit on places|place left|places left|waiting list/);
  });
});
