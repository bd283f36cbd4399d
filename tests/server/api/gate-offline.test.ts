import { Event } from '@server/models/event';
import { describe, expect, it } from 'vitest';
import { randomUUID } from 'node:crypto';
import { gateScanOf, numberedCardAddress } from '@shared/gate';
import { pdfText, rasterize, readQr } from '../../support/pdf';
import { AuditLine } from '@server/models/audit-line';
import { Build } from '@server/models/build';
import { Entry } from '@server/models/entry';
import { confirmEntryPayment } from '@server/services/entries/entries';
import { showWithClasses } from '../../support/event-factory';
import { enter, enterAs, memberOf, step } from '../../support/show-day-factory';

/** A show on show day: No. 1 paid, No. 2 unpaid, No. 3 paid; two gate phones. */
async function showDay(settings: Record<string, unknown> = {}) {
  const show = await showWithClasses({ settings, classes: [{ name: 'Hot rods' }, { name: 'Customs', capacity: 3 }] });
  const first = await enter(show.eventId, show.classIds[0]!, 'Paid roadster', { vin: 'VIN-NOT-FOR-GATE', ownerPhone: '+49 555 0199' });
  await confirmEntryPayment(first.entry.id, 'ref-1');
  const second = await enterAs(first.owner, show.eventId, show.classIds[0]!, 'Unpaid coupe');
  const third = await enterAs(first.owner, show.eventId, show.classIds[1]!, 'Paid custom');
  await confirmEntryPayment(third.entry.id, 'ref-3');
  await step(show.organiser.client, show.eventId, 'close_registration', 'open_gate');
  const gateA = await memberOf(show.eventId, 'gate', 'Gate A');
  const gateB = await memberOf(show.eventId, 'gate', 'Gate B');
  return { ...show, first, second, third, gateA, gateB };
}

const binary = (r: import('superagent').Response, cb: (err: Error | null, body: Buffer) => void) => {
  const chunks: Buffer[] = [];
  r.on('data', (c: Buffer) => chunks.push(c));
  r.on('end', () => cb(null, Buffer.concat(chunks)));
};

const queued = (number: number, sequence: number, takeCash = false, at = new Date(Date.now() - 60_000).toISOString()) => ({ clientId: randomUUID(), sequence, number, takeCash, at });

describe('the gate with no signal', () => {
  it('gives the phone every numbered entry with public fields only', async () => {
    const s = await showDay();
    const res = await s.gateA.client.get(`/api/events/${s.eventId}/gate/roster`);
    expect(res.status).toBe(200);
    expect(res.body.show).toMatchObject({ id: s.eventId, name: 'Autumn Field Meet', checkIn: true });
    expect(res.body.entries.map((e: { number: number; payment: string }) => [e.number, e.payment])).toEqual([[1, 'paid'], [2, 'unpaid'], [3, 'paid']]);
    expect(res.body.entries[0]).toMatchObject({ buildCode: s.first.owner.build.code, title: 'Paid roadster', className: 'Hot rods', status: 'confirmed' });
    expect(JSON.stringify(res.body)).not.toMatch(/VIN-NOT-FOR-GATE|555 0199|@example\.test|Owen/);
    expect((await s.first.owner.client.get(`/api/events/${s.eventId}/gate/roster`)).status).toBe(404);
  });

  it('applies each queued check-in once: a replay changes nothing and cash is recorded once', async () => {
    const s = await showDay();
    const deviceId = randomUUID();
    const batch = [queued(1, 1), queued(2, 2, true), queued(3, 3)];
    const sent = await s.gateA.client.post(`/api/events/${s.eventId}/gate/sync`, { deviceId, checkIns: batch });
    expect(sent.status).toBe(200);
    expect(sent.body.results.map((r: { number: number; outcome: string; cashTaken: boolean }) => [r.number, r.outcome, r.cashTaken])).toEqual([[1, 'checked_in', false], [2, 'checked_in', true], [3, 'checked_in', false]]);
    // The car arrived when the phone says, not when the signal came back.
    expect((await Entry.findByPk(s.first.entry.id))!.checkedInAt!.toISOString()).toBe(new Date(batch[0]!.at).toISOString());

    const replay = await s.gateA.client.post(`/api/events/${s.eventId}/gate/sync`, { deviceId, checkIns: batch });
    expect(replay.body.results.map((r: { outcome: string }) => r.outcome)).toEqual(['checked_in', 'checked_in', 'checked_in']);
    for (const e of [s.first, s.second, s.third]) expect(await AuditLine.count({ where: { entryId: e.entry.id, action: 'checked_in' } })).toBe(1);
    expect(await AuditLine.count({ where: { entryId: s.second.entry.id, action: 'marked_paid' } })).toBe(1);
    expect(await Entry.findByPk(s.second.entry.id)).toMatchObject({ status: 'checked_in', paidAmount: 2500 });
  });

  it('tells the second gate a car was checked in twice, with both times, and keeps the first', async () => {
    const s = await showDay();
    const firstAt = new Date(Date.now() - 10 * 60_000).toISOString();
    const laterAt = new Date(Date.now() - 5 * 60_000).toISOString();
    await s.gateA.client.post(`/api/events/${s.eventId}/gate/sync`, { deviceId: randomUUID(), checkIns: [queued(2, 1, true, firstAt)] });
    const twice = await s.gateB.client.post(`/api/events/${s.eventId}/gate/sync`, { deviceId: randomUUID(), checkIns: [queued(2, 1, true, laterAt)] });
    expect(twice.body.results[0]).toMatchObject({ outcome: 'already_checked_in', checkedInAt: firstAt, at: laterAt, cashTaken: false });
    expect(twice.body.results[0].message).toMatch(/^No\. 2 was checked in twice: first at \d\d:\d\d \(kept\), and at \d\d:\d\d on this phone\. It was paid already: hand the cash back\.$/);
    expect(await AuditLine.count({ where: { entryId: s.second.entry.id, action: 'marked_paid' } })).toBe(1);
    expect((await Entry.findByPk(s.second.entry.id))!.checkedInAt!.toISOString()).toBe(firstAt);
  });

  it('refuses an unpaid car queued without cash and a number the show does not have, with the reasons', async () => {
    const s = await showDay();
    const res = await s.gateA.client.post(`/api/events/${s.eventId}/gate/sync`, { deviceId: randomUUID(), checkIns: [queued(2, 1), queued(99, 2)] });
    expect(res.body.results.map((r: { outcome: string; message: string }) => [r.outcome, r.message])).toEqual([
      ['refused', 'Entry 2 is not paid yet. Take the fee in cash to check it in.'],
      ['refused', 'No entry number 99 in this show.'],
    ]);
    expect((await Entry.findByPk(s.second.entry.id))!.status).toBe('awaiting_payment');
    expect((await s.gateA.client.post(`/api/events/${s.eventId}/gate/sync`, { deviceId: 'not-an-id', checkIns: [queued(1, 1)] })).status).toBe(400);
  });
});

describe('a card of another show at the gate', () => {
  it('is refused by the name of its show, even when the same car is entered here, naming nothing private', async () => {
    const here = await showDay();
    const other = await showWithClasses({ settings: { name: 'Spring Valley Run' } });
    // The same car is entered in the other show too, where it has another number.
    const build = await Build.findByPk(here.first.owner.build.id);
    const elsewhere = await here.first.owner.client.post(`/api/events/${other.eventId}/entries`, { buildId: build!.id, classId: other.classIds[0] });
    expect(elsewhere.status).toBe(201);
    const card = numberedCardAddress('http://localhost', build!.code, (await Event.findByPk(other.eventId))!.slug, elsewhere.body.entry.number);
    const res = await here.gateA.client.get(`/api/events/${here.eventId}/gate/lookup?code=${encodeURIComponent(card)}`);
    expect(res.body.card).toEqual({
      entry: null,
      problem: 'other_show',
      message: 'This card is for Spring Valley Run, not this one. The car is entered here as No. 1: type that number.',
      canCheckIn: false,
      canTakeCash: false,
    });
    // This show's own card of the car still brings it up.
    const own = await here.gateA.client.get(`/api/events/${here.eventId}/gate/lookup?code=${encodeURIComponent(numberedCardAddress('http://localhost', build!.code, (await Event.findByPk(here.eventId))!.slug, 1))}`);
    expect(own.body.card).toMatchObject({ problem: null, entry: { number: 1, title: 'Paid roadster' } });
  });

  it('the owner’s card for an entry and the show’s numbered card carry the show and number in their QR code', async () => {
    const s = await showDay();
    const pdf = await s.first.owner.client.get(`/api/entries/${s.first.entry.id}/card.pdf`).buffer(true).parse(binary);
    expect(pdf.status).toBe(200);
    expect(gateScanOf(readQr(rasterize(pdf.body as Buffer, 150))!.data)).toEqual({ code: s.first.owner.build.code, showSlug: (await Event.findByPk(s.eventId))!.slug, number: 1 });
    const printed = await s.gateA.client.get(`/api/events/${s.eventId}/gate/cards/3`).buffer(true).parse(binary);
    expect(gateScanOf(readQr(rasterize(printed.body as Buffer, 150))!.data)).toEqual({ code: s.third.build.code, showSlug: (await Event.findByPk(s.eventId))!.slug, number: 3 });
  });
});

describe('walk-ups at the gate', () => {
  it('enters a car on the spot: a number, paid in cash, checked in, with a printable card; refused once the class is full', async () => {
    const s = await showDay();
    const res = await s.gateA.client.post(`/api/events/${s.eventId}/gate/walk-ups`, { title: 'Walk-up wagon', entrantName: 'Wanda Walker', email: 'wanda@example.test', classId: s.classIds[1] });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body.card).toMatchObject({ problem: 'already_checked_in', entry: { number: 4, title: 'Walk-up wagon', className: 'Customs', status: 'checked_in', payment: 'paid' } });
    expect(JSON.stringify(res.body)).not.toMatch(/Wanda|wanda@/);
    const entry = await Entry.findByPk(res.body.card.entry.id, { include: [{ model: Build, as: 'build' }] });
    expect(entry).toMatchObject({ paidAmount: 2500, walkUpName: 'Wanda Walker', walkUpEmail: 'wanda@example.test', ownerId: s.organiser.user.id });
    expect(entry!.build!.published).toBe(false);
    expect((await AuditLine.findAll({ where: { entryId: entry!.id }, order: [['id', 'ASC']] })).map((l) => [l.action, l.actorId])).toEqual([
      ['entry_created', s.gateA.user.id],
      ['marked_paid', s.gateA.user.id],
      ['checked_in', s.gateA.user.id],
    ]);

    const card = await s.gateA.client.get(`/api/events/${s.eventId}/gate/cards/4`).buffer(true).parse(binary);
    expect(card.status).toBe(200);
    expect(card.headers['content-type']).toBe('application/pdf');
    expect((await pdfText(card.body as Buffer)).replace(/\s+/g, ' ')).toMatch(/AUTUMN FIELD MEET.*Customs/is);

    // Customs holds 3: the third custom and the walk-up, then one more, and the next is refused.
    expect((await s.gateA.client.post(`/api/events/${s.eventId}/gate/walk-ups`, { title: 'Second walk-up', entrantName: 'W. Two', classId: s.classIds[1] })).status).toBe(201);
    const full = await s.gateA.client.post(`/api/events/${s.eventId}/gate/walk-ups`, { title: 'Too late', entrantName: 'W. Three', classId: s.classIds[1] });
    expect(full.status).toBe(409);
    expect(full.body.error.message).toBe('No place left in Customs: a walk-up cannot be entered.');
    expect(await Entry.count({ where: { eventId: s.eventId } })).toBe(5);

    const bad = await s.gateA.client.post(`/api/events/${s.eventId}/gate/walk-ups`, { title: '', entrantName: 'X', classId: s.classIds[0] });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.title).toMatch(/required/);
    expect((await s.first.owner.client.post(`/api/events/${s.eventId}/gate/walk-ups`, { title: 'Sneaky', entrantName: 'X', classId: s.classIds[0] })).status).toBe(404);
  });
});
