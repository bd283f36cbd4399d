import { waitingListWords } from '@shared/words';
import type { EntryTableRow } from '@shared/schemas/show-day';
import { describe, expect, it, vi } from 'vitest';
import { Op } from 'sequelize';
import { AuditLine } from '@server/models/audit-line';
import { Entry } from '@server/models/entry';
import { Event } from '@server/models/event';
import { createBuild } from '../../support/build-factory';
import { ownerWithBuild, showWithClasses, signedIn } from '../../support/event-factory';
import { countMail, waitForMail, waitForMailAbout } from '../../support/mailbox';
import { confirmEntryPayment } from '@server/services/entries/entries';
import { startOfferSweepWorker } from '@server/jobs/offer-sweep';
import { jobQueue, OFFER_SWEEP_CRON, OFFER_SWEEP_QUEUE } from '@server/jobs/queue';

const DAY = 86400_000;

describe('registration rules', () => {
  it('enters a published build: a number, awaiting payment for a paid show, an audit line and a mail', async () => {
    const { eventId, classIds, organiser } = await showWithClasses();
    const owner = await ownerWithBuild('Channelled roadster');
    const res = await owner.client.post(`/api/events/${eventId}/entries`, { buildId: owner.build.id, classId: classIds[1] });
    expect(res.status).toBe(201);
    expect(res.body.entry).toMatchObject({ number: 1, status: 'awaiting_payment', feeAmount: 2500, currency: 'EUR', className: 'Customs', buildTitle: 'Channelled roadster' });
    expect(res.body.entry.event.id).toBe(eventId);
    const mail = await waitForMail(owner.email);
    expect(mail.subject).toMatch(/Entry received/);
    expect(mail.text).toMatch(/number 1/);
    expect(mail.text).toMatch(/€25\.00/);
    const line = await AuditLine.findOne({ where: { entryId: res.body.entry.id } });
    expect(line).toMatchObject({ actorId: owner.user.id, action: 'entry_created', after: { status: 'awaiting_payment', number: 1 } });
    const list = await organiser.client.get(`/api/events/${eventId}/entries`);
    expect(list.body.entries.map((e: { buildTitle: string; ownerName: string }) => [e.buildTitle, e.ownerName])).toEqual([['Channelled roadster', 'Owen Ownerly']]);
  });

  it('confirms at once in a free show', async () => {
    const { eventId, classIds } = await showWithClasses({ settings: { entryFee: 0 } });
    const owner = await ownerWithBuild();
    const res = await owner.client.post(`/api/events/${eventId}/entries`, { buildId: owner.build.id, classId: classIds[0] });
    expect(res.body.entry).toMatchObject({ status: 'confirmed', number: 1, feeAmount: 0 });
  });

  it('refuses, with the reason: outside the window, unpublished or someone else’s build, twice, a class of another show, and a draft show', async () => {
    const now = Date.now();
    const notYet = await showWithClasses({ settings: { registrationOpensAt: new Date(now + DAY).toISOString() } });
    const owner = await ownerWithBuild();
    const early = await owner.client.post(`/api/events/${notYet.eventId}/entries`, { buildId: owner.build.id, classId: notYet.classIds[0] });
    expect(early.status).toBe(409);
    expect(early.body.error.message).toMatch(/not opened yet/);

    const closed = await showWithClasses();
    await Event.update({ registrationOpensAt: new Date(now - 3 * DAY), registrationClosesAt: new Date(now - DAY) }, { where: { id: closed.eventId } });
    const late = await owner.client.post(`/api/events/${closed.eventId}/entries`, { buildId: owner.build.id, classId: closed.classIds[0] });
    expect(late.status).toBe(409);
    expect(late.body.error.message).toMatch(/closed/);

    const draft = await showWithClasses({ open: false });
    const notOpen = await owner.client.post(`/api/events/${draft.eventId}/entries`, { buildId: owner.build.id, classId: draft.classIds[0] });
    expect(notOpen.status).toBe(409);
    expect(notOpen.body.error.message).toMatch(/not taking entries/);

    const { eventId, classIds } = await showWithClasses();
    const unpublished = await createBuild(owner.user.id, { published: false });
    const draftBuild = await owner.client.post(`/api/events/${eventId}/entries`, { buildId: unpublished.id, classId: classIds[0] });
    expect(draftBuild.status).toBe(400);
    expect(draftBuild.body.error.fields.buildId).toMatch(/Publish/);

    const stranger = await ownerWithBuild();
    // Someone else's build is answered as a missing one: ids cannot be probed by entering them.
    const notMine = await owner.client.post(`/api/events/${eventId}/entries`, { buildId: stranger.build.id, classId: classIds[0] });
    const noSuch = await owner.client.post(`/api/events/${eventId}/entries`, { buildId: 2_000_000_000, classId: classIds[0] });
    expect([notMine.status, notMine.body.error.fields]).toEqual([400, { buildId: 'No such build.' }]);
    expect([noSuch.status, noSuch.body.error.fields]).toEqual([400, { buildId: 'No such build.' }]);

    expect((await owner.client.post(`/api/events/${eventId}/entries`, { buildId: owner.build.id, classId: classIds[0] })).status).toBe(201);
    const twice = await owner.client.post(`/api/events/${eventId}/entries`, { buildId: owner.build.id, classId: classIds[1] });
    expect(twice.status).toBe(409);
    expect(twice.body.error.fields.buildId).toMatch(/Already entered/);

    const another = await ownerWithBuild();
    const foreignClass = await another.client.post(`/api/events/${eventId}/entries`, { buildId: another.build.id, classId: notYet.classIds[0] });
    expect(foreignClass.status).toBe(400);
    expect(foreignClass.body.error.fields.classId).toBeDefined();
    const missing = await another.client.post(`/api/events/${eventId}/entries`, {});
    expect(Object.keys(missing.body.error.fields).sort()).toEqual(['buildId', 'classId']);
  });

  it('gives 50 registrations fired at once the numbers 1…50, no gaps and no twins', async () => {
    const { eventId, classIds } = await showWithClasses({ settings: { entryFee: 0 } });
    const owner = await signedIn();
    const builds = await Promise.all(Array.from({ length: 50 }, (_, i) => createBuild(owner.user.id, { title: `Car ${i + 1}`, published: true })));
    const results = await Promise.all(builds.map((b, i) => owner.client.post(`/api/events/${eventId}/entries`, { buildId: b.id, classId: classIds[i % 2] })));
    expect(results.map((r) => r.status)).toEqual(Array(50).fill(201));
    const numbers = (await Entry.findAll({ where: { eventId }, attributes: ['number'] })).map((e) => e.number).sort((a, b) => a! - b!);
    expect(numbers).toEqual(Array.from({ length: 50 }, (_, i) => i + 1));
  });
});

describe('capacity and the waiting list', () => {
  it('puts entries past a full class on the waiting list in order, offers a freed place to the first by e-mail, and passes it on when the offer lapses', async () => {
    const { eventId, classIds, organiser } = await showWithClasses({ classes: [{ name: 'Small class', capacity: 1 }, { name: 'Open class' }] });
    const [first, second, third] = [await ownerWithBuild('Holder'), await ownerWithBuild('Second'), await ownerWithBuild('Third')];
    const enter = (o: typeof first) => o.client.post(`/api/events/${eventId}/entries`, { buildId: o.build.id, classId: classIds[0] });
    const held = (await enter(first)).body.entry;
    const w1 = (await enter(second)).body.entry;
    const w2 = (await enter(third)).body.entry;
    expect(held).toMatchObject({ status: 'awaiting_payment', number: 1 });
    expect(w1).toMatchObject({ status: 'waiting_list', number: null, waitingPosition: 1 });
    expect(w2).toMatchObject({ status: 'waiting_list', number: null, waitingPosition: 2 });
    await waitForMailAbout(second.email, /Waiting list/);
    await waitForMailAbout(third.email, /Waiting list/);
    // The open class still has room.
    const other = await ownerWithBuild();
    expect((await other.client.post(`/api/events/${eventId}/entries`, { buildId: other.build.id, classId: classIds[1] })).body.entry.number).toBe(2);

    // The holder withdraws: the first in line is offered the place, with a deadline, by e-mail.
    expect((await first.client.post(`/api/entries/${held.id}/withdraw`)).status).toBe(200);
    await waitForMailAbout(second.email, /A place is free/);
    const offered = (await second.client.get('/api/entries')).body.entries[0];
    expect(offered.offerExpiresAt).not.toBeNull();
    expect(new Date(offered.offerExpiresAt).getTime()).toBeGreaterThan(Date.now() + 47 * 3600_000);
    expect(await countMail(third.email)).toBe(1); // only the waiting-list notice
    // The organiser's table (and the detail it opens) shows the offer with the deadline the owner sees.
    const rows = (await organiser.client.get(`/api/events/${eventId}/entry-table`)).body.rows as EntryTableRow[];
    const offeredRow = rows.find((r) => r.id === w1.id)!;
    expect(offeredRow).toMatchObject({ status: 'waiting_list', offerExpiresAt: offered.offerExpiresAt });
    expect(waitingListWords(offeredRow, 'Europe/Berlin')).toMatch(/^Place offered, until \w{3} \d{1,2} \w{3}, \d{2}:\d{2}$/);
    const stillWaiting = rows.find((r) => r.id === w2.id)!;
    expect(stillWaiting.offerExpiresAt).toBeNull();
    expect(waitingListWords(stillWaiting, 'Europe/Berlin')).toBe(`#${stillWaiting.waitingPosition}`);

    // A newcomer cannot take the offered place.
    const newcomer = await ownerWithBuild();
    expect((await newcomer.client.post(`/api/events/${eventId}/entries`, { buildId: newcomer.build.id, classId: classIds[0] })).body.entry.status).toBe('waiting_list');

    // The offer lapses (deadline moved into the past): read lazily, the place goes to the next in line.
    await Entry.update({ offerExpiresAt: new Date(Date.now() - 1000) }, { where: { id: w1.id } });
    const lapsed = await second.client.post(`/api/entries/${w1.id}/accept-offer`);
    expect(lapsed.status).toBe(409);
    expect((await second.client.get('/api/entries')).body.entries[0].status).toBe('withdrawn');
    await waitForMailAbout(third.email, /A place is free/);
    const accepted = await third.client.post(`/api/entries/${w2.id}/accept-offer`);
    expect(accepted.status).toBe(200);
    expect(accepted.body.entry).toMatchObject({ status: 'awaiting_payment', number: 3, offerExpiresAt: null });
    const trail = (await organiser.client.get(`/api/events/${eventId}/audit?entryId=${w1.id}`)).body.audit.map((l: { action: string }) => l.action);
    expect(trail).toEqual(['offer_lapsed', 'place_offered', 'entry_created']);
  });

  it('the periodic sweep lapses offers (reading them writes nothing), and a show-wide capacity counts every class', async () => {
    const { eventId, classIds, organiser } = await showWithClasses({ settings: { capacity: 1, entryFee: 0 } });
    const a = await ownerWithBuild();
    const b = await ownerWithBuild();
    const c = await ownerWithBuild();
    const ea = (await a.client.post(`/api/events/${eventId}/entries`, { buildId: a.build.id, classId: classIds[0] })).body.entry;
    const eb = (await b.client.post(`/api/events/${eventId}/entries`, { buildId: b.build.id, classId: classIds[1] })).body.entry;
    const ec = (await c.client.post(`/api/events/${eventId}/entries`, { buildId: c.build.id, classId: classIds[0] })).body.entry;
    expect([ea.status, eb.status, ec.status]).toEqual(['confirmed', 'waiting_list', 'waiting_list']);
    await a.client.post(`/api/entries/${ea.id}/withdraw`);
    expect((await Entry.findByPk(eb.id))!.offerExpiresAt).not.toBeNull();
    await Entry.update({ offerExpiresAt: new Date(Date.now() - 1000) }, { where: { id: eb.id } });
    // Reading the show's entries, as its organiser or as the entrant, changes nothing: no GET writes.
    const auditBefore = await AuditLine.count({ where: { eventId } });
    expect((await b.client.get('/api/entries')).status).toBe(200);
    expect((await organiser.client.get(`/api/events/${eventId}/entry-table`)).status).toBe(200);
    expect((await organiser.client.get(`/api/events/${eventId}/entries.csv`)).status).toBe(200);
    expect((await organiser.client.get(`/api/events/${eventId}/entries`)).status).toBe(200);
    expect((await Entry.findByPk(eb.id))!.status).toBe('waiting_list');
    expect(await AuditLine.count({ where: { eventId } })).toBe(auditBefore);
    // The minute's scheduled sweep (stored as a schedule; here the job is sent at once) runs with nobody reading the show.
    const queue = jobQueue();
    await queue.start();
    expect((await queue.boss.getSchedules()).find((s) => s.name === OFFER_SWEEP_QUEUE)).toMatchObject({ cron: OFFER_SWEEP_CRON });
    await startOfferSweepWorker(queue);
    await queue.send(OFFER_SWEEP_QUEUE, {});
    await vi.waitFor(async () => expect((await Entry.findByPk(eb.id))!.status).toBe('withdrawn'));
    expect((await Entry.findByPk(ec.id))!.offerExpiresAt).not.toBeNull();
  });
});

describe('withdrawal, refunds and payment', () => {
  it('records the refund the show’s rule gives: in full before the date, the percentage after', async () => {
    const { eventId, classIds, organiser } = await showWithClasses();
    const early = await ownerWithBuild();
    const late = await ownerWithBuild();
    const e1 = (await early.client.post(`/api/events/${eventId}/entries`, { buildId: early.build.id, classId: classIds[0] })).body.entry;
    const e2 = (await late.client.post(`/api/events/${eventId}/entries`, { buildId: late.build.id, classId: classIds[0] })).body.entry;
    await confirmEntryPayment(e1.id, 'pay_test_1');
    await confirmEntryPayment(e2.id, 'pay_test_2', { amount: 2500 });
    const w1 = await early.client.post(`/api/entries/${e1.id}/withdraw`);
    expect(w1.body.entry).toMatchObject({ status: 'withdrawn', refundDue: 2500 });
    await waitForMailAbout(early.email, /€25\.00 back/);
    // Past the full-refund date: 50 % by this show's rule; withdrawn by the organiser.
    await Event.update({ refundRule: { fullRefundUntil: new Date(Date.now() - DAY).toISOString(), afterwardsPercent: 50 } }, { where: { id: eventId } });
    const w2 = await organiser.client.post(`/api/entries/${e2.id}/withdraw`);
    expect(w2.body.entry).toMatchObject({ status: 'withdrawn', refundDue: 1250 });
    await waitForMailAbout(late.email, /organiser withdrew/);
    expect((await AuditLine.findOne({ where: { entryId: e2.id, action: 'withdrawn_by_organiser' } }))?.actorId).toBe(organiser.user.id);
    expect((await early.client.post(`/api/entries/${e1.id}/withdraw`)).status).toBe(409);
  });

  it('lists the owner’s shows still to come first, soonest first, and the shows that are over after them, latest first', async () => {
    const owner = await ownerWithBuild('Three-show coupe');
    const shows = [await showWithClasses(), await showWithClasses(), await showWithClasses()];
    for (const s of shows) expect((await owner.client.post(`/api/events/${s.eventId}/entries`, { buildId: owner.build.id, classId: s.classIds[0] })).status).toBe(201);
    // Dated (and the two past ones finished) directly: walking two shows through judging is not what this checks.
    const [coming, overLongAgo, overLately] = shows.map((s) => s.eventId) as [number, number, number];
    const dated = (days: number) => {
      const start = Date.now() + days * DAY;
      return { startsAt: new Date(start), endsAt: new Date(start + 3600_000), registrationOpensAt: new Date(start - 30 * DAY), registrationClosesAt: new Date(start - DAY) };
    };
    await Event.update(dated(20), { where: { id: coming } });
    await Event.update({ status: 'results_published', ...dated(-90) }, { where: { id: overLongAgo } });
    await Event.update({ status: 'archived', ...dated(-10) }, { where: { id: overLately } });
    const mine = (await owner.client.get('/api/entries')).body.entries as Array<{ event: { id: number } }>;
    expect(mine.map((e) => e.event.id)).toEqual([coming, overLately, overLongAgo]);
  });

  it('confirmEntryPayment confirms once; the same reference again changes nothing', async () => {
    const { eventId, classIds } = await showWithClasses();
    const owner = await ownerWithBuild();
    const entry = (await owner.client.post(`/api/events/${eventId}/entries`, { buildId: owner.build.id, classId: classIds[0] })).body.entry;
    const first = await confirmEntryPayment(entry.id, 'pay_ref_A');
    const again = await confirmEntryPayment(entry.id, 'pay_ref_A');
    expect(first.changed).toBe(true);
    expect(again.changed).toBe(false);
    await expect(confirmEntryPayment(entry.id, 'pay_ref_B')).rejects.toThrow(/another payment reference/);
    const mine = (await owner.client.get('/api/entries')).body.entries[0];
    expect(mine).toMatchObject({ status: 'confirmed', paymentRef: 'pay_ref_A' });
    expect(await AuditLine.count({ where: { entryId: entry.id, action: 'payment_confirmed' } })).toBe(1);
  });

  it('keeps entries to their owner and the show’s organisers', async () => {
    const { eventId, classIds } = await showWithClasses();
    const owner = await ownerWithBuild();
    const entry = (await owner.client.post(`/api/events/${eventId}/entries`, { buildId: owner.build.id, classId: classIds[0] })).body.entry;
    const stranger = await signedIn();
    const otherOrganiser = await showWithClasses();
    // An entry of a show they have no part in does not exist for them, exactly like a missing one.
    const missing = await stranger.client.post('/api/entries/99999999/withdraw');
    const foreign = await stranger.client.post(`/api/entries/${entry.id}/withdraw`);
    expect([foreign.status, foreign.body]).toEqual([404, missing.body]);
    expect((await otherOrganiser.organiser.client.post(`/api/entries/${entry.id}/withdraw`)).status).toBe(404);
    expect((await stranger.client.get('/api/entries')).body.entries).toEqual([]);
    expect((await owner.client.get(`/api/events/${eventId}/entries`)).status).toBe(404);
  });
});

describe('a build entered in a show that is not over', () => {
  it('cannot be deleted, and the owner is told why; after withdrawal it can', async () => {
    const { eventId, classIds } = await showWithClasses({ settings: { name: 'Harvest Run' } });
    const owner = await ownerWithBuild();
    const entry = (await owner.client.post(`/api/events/${eventId}/entries`, { buildId: owner.build.id, classId: classIds[0] })).body.entry;
    const refused = await owner.client.delete(`/api/builds/${owner.build.id}`);
    expect(refused.status).toBe(409);
    expect(refused.body.error.message).toMatch(/entered in Harvest Run/);
    await owner.client.post(`/api/entries/${entry.id}/withdraw`);
    expect((await owner.client.delete(`/api/builds/${owner.build.id}`)).status).toBe(204);
  });

  it('can be deleted once the show is over', async () => {
    const { eventId, classIds } = await showWithClasses();
    const owner = await ownerWithBuild();
    await owner.client.post(`/api/events/${eventId}/entries`, { buildId: owner.build.id, classId: classIds[0] });
    await Event.update({ status: 'results_published' }, { where: { id: eventId } });
    expect((await owner.client.delete(`/api/builds/${owner.build.id}`)).status).toBe(204);
    expect(await Entry.count({ where: { eventId, buildId: { [Op.eq]: owner.build.id } } })).toBe(0);
  });
});
