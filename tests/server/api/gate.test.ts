import { describe, expect, it } from 'vitest';
import { QueryTypes } from 'sequelize';
import { sequelize } from '@server/db/sequelize';
import { AuditLine } from '@server/models/audit-line';
import { Entry } from '@server/models/entry';
import { confirmEntryPayment } from '@server/services/entries/entries';
import { createBuild } from '../../support/build-factory';
import { showWithClasses } from '../../support/event-factory';
import { enter, enterAs, memberOf, step } from '../../support/show-day-factory';

/** A show on show day with one paid, one unpaid, one withdrawn and one waiting entry, and its gate staff. */
async function showDay() {
  const show = await showWithClasses({ classes: [{ name: 'Hot rods', capacity: 3 }, { name: 'Customs' }] });
  const { eventId, classIds, organiser } = show;
  const paid = await enter(eventId, classIds[0]!, 'Paid roadster', { ownerPhone: '+49 555 0101', vin: 'VIN-NOT-FOR-GATE' });
  await confirmEntryPayment(paid.entry.id, 'ref-paid');
  const unpaid = await enterAs(paid.owner, eventId, classIds[0]!, 'Unpaid coupe');
  const withdrawn = await enterAs(paid.owner, eventId, classIds[1]!, 'Withdrawn wagon');
  await organiser.client.post(`/api/entries/${withdrawn.entry.id}/withdraw`);
  await enterAs(paid.owner, eventId, classIds[0]!, 'Third hot rod');
  const waiting = await enterAs(paid.owner, eventId, classIds[0]!, 'Waiting truck');
  await step(organiser.client, eventId, 'close_registration', 'open_gate');
  const gate = await memberOf(eventId, 'gate', 'Gate Keeper');
  return { ...show, paid, unpaid, withdrawn, waiting, gate };
}

describe('the gate', () => {
  it('looks a card up by its QR address or its number and names the problem in words, without private fields', async () => {
    const s = await showDay();
    const byCode = await s.gate.client.get(`/api/events/${s.eventId}/gate/lookup?code=${encodeURIComponent(`http://localhost/c/${s.paid.owner.build.code}`)}`);
    expect(byCode.status).toBe(200);
    expect(byCode.body.card).toMatchObject({ problem: null, canCheckIn: true, canTakeCash: false, entry: { number: 1, title: 'Paid roadster', className: 'Hot rods', payment: 'paid', status: 'confirmed' } });
    expect(JSON.stringify(byCode.body)).not.toMatch(/VIN-NOT-FOR-GATE|555 0101|@example\.test/);

    const unpaid = await s.gate.client.get(`/api/events/${s.eventId}/gate/lookup?number=2`);
    expect(unpaid.body.card).toMatchObject({ problem: 'unpaid', canCheckIn: false, canTakeCash: true, message: 'Entry 2 is not paid yet. Take the fee in cash to check it in.' });
    const withdrawn = await s.gate.client.get(`/api/events/${s.eventId}/gate/lookup?code=${s.withdrawn.build.code}`);
    expect(withdrawn.body.card).toMatchObject({ problem: 'withdrawn', canCheckIn: false, canTakeCash: false });
    const waiting = await s.gate.client.get(`/api/events/${s.eventId}/gate/lookup?code=${s.waiting.build.code}`);
    expect(waiting.body.card.message).toMatch(/waiting list/);

    const unknown = await s.gate.client.get(`/api/events/${s.eventId}/gate/lookup?code=${encodeURIComponent('https://example.test/menu')}`);
    expect(unknown.body.card).toEqual({ entry: null, problem: 'unknown_code', message: 'Unknown code: this is not a Placard card.', canCheckIn: false, canTakeCash: false });
    const stranger = await createBuild(s.gate.user.id, { published: true });
    const notEntered = await s.gate.client.get(`/api/events/${s.eventId}/gate/lookup?code=${stranger.code}`);
    expect(notEntered.body.card).toMatchObject({ entry: null, problem: 'not_entered', canCheckIn: false });
    const other = await showWithClasses({ settings: { name: 'Spring Valley Run' } });
    const elsewhere = await enter(other.eventId, other.classIds[0]!, 'Visiting car');
    const otherShow = await s.gate.client.get(`/api/events/${s.eventId}/gate/lookup?code=${elsewhere.owner.build.code}`);
    expect(otherShow.body.card).toMatchObject({ entry: null, problem: 'other_show', message: expect.stringContaining('Spring Valley Run') });

    expect((await s.gate.client.get(`/api/events/${s.eventId}/gate/lookup?number=99`)).status).toBe(404);
    const empty = await s.gate.client.get(`/api/events/${s.eventId}/gate/lookup`);
    expect(empty.status).toBe(400);
    expect(empty.body.error.fields.number).toMatch(/Scan a card or type/);
  });

  it('checks a paid car in once: a second scan says so and changes nothing', async () => {
    const s = await showDay();
    const res = await s.gate.client.post(`/api/events/${s.eventId}/gate/check-in`, { number: 1 });
    expect(res.status).toBe(200);
    expect(res.body.card).toMatchObject({ problem: 'already_checked_in', entry: { status: 'checked_in' } });
    const line = await AuditLine.findOne({ where: { entryId: s.paid.entry.id, action: 'checked_in' } });
    expect(line).toMatchObject({ actorId: s.gate.user.id, before: { status: 'confirmed' }, after: { status: 'checked_in', cashTaken: false } });
    const before = await Entry.findByPk(s.paid.entry.id);
    const again = await s.gate.client.post(`/api/events/${s.eventId}/gate/check-in`, { number: 1 });
    expect(again.status).toBe(409);
    expect(again.body.error.message).toMatch(/^Entry 1 is already checked in \(at \d\d:\d\d\)\. Nothing changed\.$/);
    expect((await Entry.findByPk(s.paid.entry.id))!.checkedInAt).toEqual(before!.checkedInAt);
    expect(await AuditLine.count({ where: { entryId: s.paid.entry.id, action: 'checked_in' } })).toBe(1);
    const lookup = await s.gate.client.get(`/api/events/${s.eventId}/gate/lookup?number=1`);
    expect(lookup.body.card).toMatchObject({ problem: 'already_checked_in', canCheckIn: false });
  });

  it('refuses an unpaid car unless cash is taken, and a withdrawn or waiting one always, with the reason', async () => {
    const s = await showDay();
    const refused = await s.gate.client.post(`/api/events/${s.eventId}/gate/check-in`, { number: 2 });
    expect(refused.status).toBe(409);
    expect(refused.body.error).toMatchObject({ message: expect.stringMatching(/not paid/), fields: { number: 'unpaid' } });
    expect((await Entry.findByPk(s.unpaid.entry.id))!.status).toBe('awaiting_payment');

    const cash = await s.gate.client.post(`/api/events/${s.eventId}/gate/check-in`, { number: 2, takeCash: true });
    expect(cash.status).toBe(200);
    expect(cash.body.card.entry).toMatchObject({ status: 'checked_in', payment: 'paid' });
    const lines = await AuditLine.findAll({ where: { entryId: s.unpaid.entry.id }, order: [['id', 'ASC']] });
    expect(lines.slice(-2).map((l) => [l.action, l.actorId])).toEqual([['marked_paid', s.gate.user.id], ['checked_in', s.gate.user.id]]);
    expect(lines.at(-2)!.after).toMatchObject({ note: 'Cash taken at the gate.', paidAmount: 2500 });

    const withdrawnNo = s.withdrawn.entry.number!;
    const gone = await s.gate.client.post(`/api/events/${s.eventId}/gate/check-in`, { number: withdrawnNo, takeCash: true });
    expect(gone.status).toBe(409);
    expect(gone.body.error.message).toMatch(/withdrawn/);
    expect((await Entry.findByPk(s.withdrawn.entry.id))!.status).toBe('withdrawn');
  });

  it('undoes a check-in within a minute (cash included), not after', async () => {
    const s = await showDay();
    await s.gate.client.post(`/api/events/${s.eventId}/gate/check-in`, { number: 2, takeCash: true });
    const undone = await s.gate.client.post(`/api/events/${s.eventId}/gate/undo`, { entryId: s.unpaid.entry.id });
    expect(undone.status).toBe(200);
    expect(undone.body.card.entry).toMatchObject({ status: 'awaiting_payment', payment: 'unpaid', checkedInAt: null });
    expect(await AuditLine.findOne({ where: { entryId: s.unpaid.entry.id, action: 'check_in_undone' } })).toMatchObject({ after: { status: 'awaiting_payment', cashReturned: true } });

    await s.gate.client.post(`/api/events/${s.eventId}/gate/check-in`, { number: 1 });
    await Entry.update({ checkedInAt: new Date(Date.now() - 61_000) }, { where: { id: s.paid.entry.id } });
    const late = await s.gate.client.post(`/api/events/${s.eventId}/gate/undo`, { entryId: s.paid.entry.id });
    expect(late.status).toBe(409);
    expect(late.body.error.message).toMatch(/60 seconds/);
    expect((await Entry.findByPk(s.paid.entry.id))!.status).toBe('checked_in');
  });

  it('mails one “payment received” per payment when cash is taken, undone and taken again', async () => {
    const s = await showDay();
    const paymentMails = async () =>
      (await sequelize.query<{ n: number }>("SELECT count(*)::int AS n FROM pgboss.job WHERE name = 'mail' AND data->>'to' = $1 AND data->>'subject' LIKE 'Payment received%'", { bind: [s.unpaid.owner.user.email], type: QueryTypes.SELECT }))[0]!.n;
    const before = await paymentMails(); // the owner's other car was paid online
    expect((await s.gate.client.post(`/api/events/${s.eventId}/gate/check-in`, { number: 2, takeCash: true })).status).toBe(200);
    expect(await paymentMails()).toBe(before + 1);
    expect((await s.gate.client.post(`/api/events/${s.eventId}/gate/undo`, { entryId: s.unpaid.entry.id })).status).toBe(200);
    const again = await s.gate.client.post(`/api/events/${s.eventId}/gate/check-in`, { number: 2, takeCash: true });
    expect(again.body.card.entry).toMatchObject({ status: 'checked_in', payment: 'paid' });
    // The mail job is written in the check-in's transaction: once it answered, a second one would be there.
    expect(await paymentMails()).toBe(before + 1);
  });

  it('counts arrived / expected per class', async () => {
    const s = await showDay();
    await s.gate.client.post(`/api/events/${s.eventId}/gate/check-in`, { number: 1 });
    const counts = await s.gate.client.get(`/api/events/${s.eventId}/gate/counts`);
    expect(counts.body).toEqual({
      classes: [
        { classId: s.classIds[0], name: 'Hot rods', arrived: 1, expected: 3 },
        { classId: s.classIds[1], name: 'Customs', arrived: 0, expected: 0 },
      ],
      arrived: 1,
      expected: 3,
    });
  });

  it('keeps gate staff to their own show and show day; judges and entrants cannot check in', async () => {
    const s = await showDay();
    const other = await showWithClasses();
    const otherGate = await memberOf(other.eventId, 'gate');
    const judge = await memberOf(s.eventId, 'judge');
    for (const [who, status] of [[otherGate.client, 404], [judge.client, 403], [s.paid.owner.client, 404]] as const) {
      expect((await who.post(`/api/events/${s.eventId}/gate/check-in`, { number: 1 })).status).toBe(status);
      expect((await who.get(`/api/events/${s.eventId}/gate/lookup?number=1`)).status).toBe(status);
      expect((await who.get(`/api/events/${s.eventId}/gate/counts`)).status).toBe(status);
    }
    const early = await memberOf(other.eventId, 'gate');
    expect((await early.client.get(`/api/events/${other.eventId}/gate/counts`)).status).toBe(403);
    expect((await Entry.findByPk(s.paid.entry.id))!.status).toBe('confirmed');
    // The organiser works the gate too.
    expect((await s.organiser.client.post(`/api/events/${s.eventId}/gate/check-in`, { number: 1 })).status).toBe(200);
  });
});
