import { describe, expect, it } from 'vitest';
import { AuditLine } from '@server/models/audit-line';
import { Entry } from '@server/models/entry';
import { Event } from '@server/models/event';
import { confirmEntryPayment } from '@server/services/entries/entries';
import { ownerWithBuild, showWithClasses } from '../../support/event-factory';
import { enter, memberOf } from '../../support/show-day-factory';

const DAY = 86400_000;
type Row = { id: number; number: number | null; buildTitle: string; className: string; status: string; payment: string; waitingPosition: number | null; contact: { email: string; phone: string | null }; privateFields: { vin: string | null } };

describe('the entries table', () => {
  it('pages, sorts, filters and searches on the server; the organiser sees the contact, and no private field the show did not ask for', async () => {
    const { organiser, eventId, classIds } = await showWithClasses({ classes: [{ name: 'Hot rods', capacity: 3 }, { name: 'Customs' }] });
    const titles = ['Zephyr coupe', 'Amber roadster', 'Midnight wagon', 'Copper sedan'];
    const entered = [];
    for (const t of titles) entered.push(await enter(eventId, classIds[0]!, t, { ownerPhone: '+49 555 0100', vin: 'VIN-SECRET-1' }));
    await enter(eventId, classIds[1]!, 'Blue custom');
    await confirmEntryPayment(entered[0]!.entry.id, 'ref-1');

    const first = await organiser.client.get(`/api/events/${eventId}/entry-table?pageSize=25`);
    expect(first.status).toBe(200);
    expect(first.body.total).toBe(5);
    expect(first.body.rows.map((r: Row) => [r.number, r.buildTitle, r.status])).toEqual([
      [1, 'Zephyr coupe', 'confirmed'],
      [2, 'Amber roadster', 'awaiting_payment'],
      [3, 'Midnight wagon', 'awaiting_payment'],
      [4, 'Blue custom', 'awaiting_payment'],
      [null, 'Copper sedan', 'waiting_list'],
    ]);
    const zephyr = first.body.rows[0] as Row;
    expect(zephyr.payment).toBe('paid');
    expect(zephyr.contact).toEqual({ email: entered[0]!.owner.email, phone: '+49 555 0100' });
    expect(zephyr.privateFields).toEqual({ vin: null, plate: null, address: null });
    expect((first.body.rows[4] as Row).waitingPosition).toBe(1);

    const byTitle = await organiser.client.get(`/api/events/${eventId}/entry-table?sort=title&dir=desc&pageSize=25`);
    expect(byTitle.body.rows.map((r: Row) => r.buildTitle)).toEqual(['Zephyr coupe', 'Midnight wagon', 'Copper sedan', 'Blue custom', 'Amber roadster']);
    const customs = await organiser.client.get(`/api/events/${eventId}/entry-table?classId=${classIds[1]!}&pageSize=25`);
    expect(customs.body.rows.map((r: Row) => r.buildTitle)).toEqual(['Blue custom']);
    const unpaid = await organiser.client.get(`/api/events/${eventId}/entry-table?status=awaiting_payment&pageSize=25`);
    expect(unpaid.body.total).toBe(3);
    const searched = await organiser.client.get(`/api/events/${eventId}/entry-table?q=ROAD&pageSize=25`);
    expect(searched.body.rows.map((r: Row) => r.buildTitle)).toEqual(['Amber roadster']);
    const byNumber = await organiser.client.get(`/api/events/${eventId}/entry-table?q=3&pageSize=25`);
    expect(byNumber.body.rows.map((r: Row) => r.number)).toEqual([3]);
    const byEmail = await organiser.client.get(`/api/events/${eventId}/entry-table?q=${encodeURIComponent(entered[1]!.owner.email)}&pageSize=25`);
    expect(byEmail.body.rows.map((r: Row) => r.buildTitle)).toEqual(['Amber roadster']);
    const percent = await organiser.client.get(`/api/events/${eventId}/entry-table?q=%25&pageSize=25`);
    expect(percent.body.total).toBe(0);
  });

  it('pages through many entries in a stable order', async () => {
    const { organiser, eventId, classIds } = await showWithClasses({ settings: { entryFee: 0 } });
    const seed = await enter(eventId, classIds[0]!, 'Template');
    const base = await Entry.findByPk(seed.entry.id);
    const rows = Array.from({ length: 119 }, (_, i) => ({ eventId, buildId: base!.buildId, classId: classIds[i % 2]!, ownerId: base!.ownerId, number: i + 2, status: 'confirmed' as const, feeAmount: 0, currency: 'EUR' }));
    // One build per entry is the rule; for a paging test the rows need only distinct numbers, so the unique index is sidestepped with fresh builds.
    const { createBuild } = await import('../../support/build-factory');
    for (const r of rows) r.buildId = (await createBuild(base!.ownerId, { title: `Car ${String(r.number).padStart(3, '0')}`, published: true })).id;
    await Entry.bulkCreate(rows);
    const page3 = await organiser.client.get(`/api/events/${eventId}/entry-table?page=3&pageSize=50`);
    expect(page3.body).toMatchObject({ total: 120, page: 3, pageCount: 3 });
    expect(page3.body.rows.map((r: Row) => r.number)).toEqual(Array.from({ length: 20 }, (_, i) => 101 + i));
    const bad = await organiser.client.get(`/api/events/${eventId}/entry-table?pageSize=7&sort=colour`);
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['pageSize', 'sort']);
  });

  it('is for the show’s organisers only: judges, gate staff, entrants and other organisers are refused', async () => {
    const { eventId, classIds } = await showWithClasses();
    const { owner } = await enter(eventId, classIds[0]!, 'Someone’s car');
    const judge = await memberOf(eventId, 'judge');
    const gate = await memberOf(eventId, 'gate');
    const other = await showWithClasses();
    for (const [who, status] of [[judge.client, 403], [gate.client, 403], [owner.client, 404], [other.organiser.client, 404]] as const) {
      expect((await who.get(`/api/events/${eventId}/entry-table`)).status).toBe(status);
      expect((await who.get(`/api/events/${eventId}/entries.csv`)).status).toBe(status);
    }
    const { apiClient } = await import('../../support/api-client');
    expect((await (await apiClient()).get(`/api/events/${eventId}/entry-table`)).status).toBe(401);
  });
});

describe('which private fields the organisers see', () => {
  const secrets = { ownerPhone: '+49 555 0199', vin: 'VIN-PRIVATE-7', plate: 'PLT 777', ownerAddress: '7 Hidden Lane' };

  it('is name, e-mail and phone; the plate, VIN or address only where the show asked for it and the entrant agreed', async () => {
    const { organiser, eventId, classIds } = await showWithClasses({ settings: { asksFor: ['plate'] } });
    const owner = await ownerWithBuild('Plated roadster');
    await owner.build.update(secrets);
    // The show asks for the plate: entering without agreeing is refused, naming the box, and enters nothing.
    const refused = await owner.client.post(`/api/events/${eventId}/entries`, { buildId: owner.build.id, classId: classIds[0] });
    expect(refused.status).toBe(400);
    expect(refused.body.error.fields.shares).toMatch(/asks for your plate/);
    expect(await Entry.count({ where: { eventId } })).toBe(0);
    const entered = await owner.client.post(`/api/events/${eventId}/entries`, { buildId: owner.build.id, classId: classIds[0], shares: ['plate'] });
    expect(entered.status).toBe(201);

    const row = (await organiser.client.get(`/api/events/${eventId}/entry-table`)).body.rows[0];
    expect(row.contact).toEqual({ email: owner.email, phone: '+49 555 0199' });
    expect(row.privateFields).toEqual({ plate: 'PLT 777', vin: null, address: null });
    expect(row.sharedFields).toEqual(['plate']);
    const csv = (await organiser.client.get(`/api/events/${eventId}/entries.csv`)).text;
    expect(csv).toContain('PLT 777');
    expect(csv).not.toContain('VIN-PRIVATE-7');
    expect(csv).not.toContain('7 Hidden Lane');

    // Asking for more later does not reach an entry made before: the entrant agreed to the plate only.
    expect((await organiser.client.patch(`/api/events/${eventId}`, { asksFor: ['plate', 'vin', 'address'] })).status).toBe(200);
    expect((await organiser.client.get(`/api/events/${eventId}/entry-table`)).body.rows[0].privateFields).toEqual({ plate: 'PLT 777', vin: null, address: null });
  });

  it('is none of them where the show asks for nothing, and the show says what it asks on its public page', async () => {
    const { organiser, eventId, classIds } = await showWithClasses();
    const { entry } = await enter(eventId, classIds[0]!, 'Quiet coupe', secrets);
    const { rows } = (await organiser.client.get(`/api/events/${eventId}/entry-table`)).body;
    expect(rows.find((r: Row) => r.id === entry.id).privateFields).toEqual({ vin: null, plate: null, address: null });
    const csv = (await organiser.client.get(`/api/events/${eventId}/entries.csv`)).text;
    for (const secret of ['VIN-PRIVATE-7', 'PLT 777', '7 Hidden Lane']) expect(csv).not.toContain(secret);
    const slug = (await Event.findByPk(eventId))!.slug;
    const pub = await organiser.client.get(`/api/public/events/${slug}`);
    expect(pub.body.event.asksFor).toEqual([]);
  });
});

describe('actions on an entry, each with an audit line', () => {
  it('changes class (refusing a full class or another show’s), with before → after', async () => {
    const { organiser, eventId, classIds } = await showWithClasses({ classes: [{ name: 'Hot rods' }, { name: 'Customs', capacity: 1 }, { name: 'Trucks' }] });
    const { entry } = await enter(eventId, classIds[0]!, 'Moving car');
    await enter(eventId, classIds[1]!, 'Custom one');
    const full = await organiser.client.post(`/api/entries/${entry.id}/class`, { classId: classIds[1]! });
    expect(full.status).toBe(409);
    expect(full.body.error.fields.classId).toMatch(/Customs has no free place/);
    const other = await showWithClasses();
    const foreign = await organiser.client.post(`/api/entries/${entry.id}/class`, { classId: other.classIds[0]! });
    expect(foreign.status).toBe(400);
    expect(foreign.body.error.fields.classId).toMatch(/no such class/);
    expect((await organiser.client.post(`/api/entries/${entry.id}/class`, {})).body.error.fields.classId).toBe('Pick a class.');

    const moved = await organiser.client.post(`/api/entries/${entry.id}/class`, { classId: classIds[2]! });
    expect(moved.status).toBe(200);
    expect(moved.body.entry).toMatchObject({ className: 'Trucks', classId: classIds[2]! });
    expect(moved.body.audit[0]).toMatchObject({ action: 'class_changed', who: 'Org Anizer', before: { className: 'Hot rods' }, after: { className: 'Trucks' } });
    expect(await AuditLine.count({ where: { entryId: entry.id, action: 'class_changed' } })).toBe(1);
  });

  it('marks paid by hand with a note; refuses without a note, twice, on a free show or a waiting entry', async () => {
    const { organiser, eventId, classIds } = await showWithClasses({ classes: [{ name: 'Hot rods', capacity: 1 }] });
    const { entry } = await enter(eventId, classIds[0]!, 'Cash car');
    const waiting = await enter(eventId, classIds[0]!, 'Waiting car');
    const noNote = await organiser.client.post(`/api/entries/${entry.id}/mark-paid`, { note: '  ' });
    expect(noNote.status).toBe(400);
    expect(noNote.body.error.fields.note).toMatch(/note/);
    const paid = await organiser.client.post(`/api/entries/${entry.id}/mark-paid`, { note: 'Bank transfer, 3 Nov' });
    expect(paid.status).toBe(200);
    expect(paid.body.entry).toMatchObject({ status: 'confirmed', payment: 'paid', paidAmount: 2500 });
    expect(paid.body.audit[0]).toMatchObject({ action: 'marked_paid', before: { status: 'awaiting_payment' }, after: { status: 'confirmed', paidAmount: 2500, note: 'Bank transfer, 3 Nov' } });
    expect((await organiser.client.post(`/api/entries/${entry.id}/mark-paid`, { note: 'again' })).status).toBe(409);
    const onList = await organiser.client.post(`/api/entries/${waiting.entry.id}/mark-paid`, { note: 'cash' });
    expect(onList.status).toBe(409);
    expect(onList.body.error.message).toMatch(/waiting list/);

    const free = await showWithClasses({ settings: { entryFee: 0 } });
    const freeEntry = await enter(free.eventId, free.classIds[0]!, 'Free car');
    expect((await free.organiser.client.post(`/api/entries/${freeEntry.entry.id}/mark-paid`, { note: 'cash' })).body.error.message).toMatch(/free/);
  });

  it('moves an entry up from the waiting list: the next number, awaiting payment', async () => {
    const { organiser, eventId, classIds } = await showWithClasses({ classes: [{ name: 'Hot rods', capacity: 1 }] });
    const first = await enter(eventId, classIds[0]!, 'In');
    const second = await enter(eventId, classIds[0]!, 'Waiting');
    expect(second.entry.status).toBe('waiting_list');
    const up = await organiser.client.post(`/api/entries/${second.entry.id}/move-up`);
    expect(up.status).toBe(200);
    expect(up.body.entry).toMatchObject({ status: 'awaiting_payment', number: 2, waitingPosition: null });
    expect(up.body.audit[0]).toMatchObject({ action: 'moved_up', before: { status: 'waiting_list', number: null }, after: { status: 'awaiting_payment', number: 2 } });
    expect((await organiser.client.post(`/api/entries/${first.entry.id}/move-up`)).status).toBe(409);
  });

  it('withdraws by the show’s refund rule: in full before the date, the set percentage after', async () => {
    const now = Date.now();
    const { organiser, eventId, classIds } = await showWithClasses();
    const early = await enter(eventId, classIds[0]!, 'Early');
    await confirmEntryPayment(early.entry.id, 'ref-early');
    const res = await organiser.client.post(`/api/entries/${early.entry.id}/withdraw`);
    expect(res.body.entry).toMatchObject({ status: 'withdrawn', refundDue: 2500 });

    const late = await enter(eventId, classIds[0]!, 'Late');
    await confirmEntryPayment(late.entry.id, 'ref-late');
    await Event.update({ refundRule: { fullRefundUntil: new Date(now - DAY).toISOString(), afterwardsPercent: 50 } }, { where: { id: eventId } });
    expect((await organiser.client.post(`/api/entries/${late.entry.id}/withdraw`)).body.entry).toMatchObject({ refundDue: 1250 });
    const row = (await organiser.client.get(`/api/events/${eventId}/entry-table?status=withdrawn`)).body.rows.find((r: Row) => r.id === late.entry.id);
    expect(row).toMatchObject({ payment: 'refund_due', refundDue: 1250 });
    const audit = await organiser.client.get(`/api/entries/${late.entry.id}/audit`);
    expect(audit.body.audit[0]).toMatchObject({ action: 'withdrawn_by_organiser', who: 'Org Anizer', before: { status: 'confirmed' }, after: { status: 'withdrawn', refundDue: 1250 } });
  });

  it('leaves every action to the show’s organisers: gate staff, judges, the entrant and another show’s organiser get 403 and nothing changes', async () => {
    const { eventId, classIds } = await showWithClasses({ classes: [{ name: 'A', capacity: 1 }, { name: 'B' }] });
    const { owner, entry } = await enter(eventId, classIds[0]!, 'Guarded');
    const waiting = await enter(eventId, classIds[0]!, 'Guarded waiting');
    const gate = await memberOf(eventId, 'gate');
    const judge = await memberOf(eventId, 'judge');
    const other = await showWithClasses();
    // People of the show are refused (403); for another show's organiser the entry does not exist (404).
    for (const [who, status] of [[gate.client, 403], [judge.client, 403], [owner.client, 403], [other.organiser.client, 404]] as const) {
      expect((await who.post(`/api/entries/${entry.id}/class`, { classId: classIds[1]! })).status).toBe(status);
      expect((await who.post(`/api/entries/${entry.id}/mark-paid`, { note: 'cash' })).status).toBe(status);
      expect((await who.get(`/api/entries/${entry.id}/audit`)).status).toBe(status);
    }
    for (const [who, status] of [[gate.client, 403], [judge.client, 403], [owner.client, 404], [other.organiser.client, 404]] as const) {
      expect((await who.post(`/api/entries/${waiting.entry.id}/move-up`)).status).toBe(status);
    }
    for (const [who, status] of [[gate.client, 403], [judge.client, 403], [other.organiser.client, 404]] as const) expect((await who.post(`/api/entries/${entry.id}/withdraw`)).status).toBe(status);
    expect(await Entry.findByPk(entry.id)).toMatchObject({ classId: classIds[0]!, status: 'awaiting_payment', paidAt: null });
    expect(await AuditLine.count({ where: { entryId: entry.id } })).toBe(1);
  });
});

describe('CSV export', () => {
  it('writes UTF-8 with a header row, numbers as numbers and formula-looking text defused', async () => {
    const { organiser, eventId, classIds, slug } = await showWithClasses({ classes: [{ name: 'Hot rods' }] });
    const a = await enter(eventId, classIds[0]!, '=HYPERLINK("http://x.test","click")', { ownerPhone: '+1 555 0199' });
    await enter(eventId, classIds[0]!, 'Coupé "Brûlé", 1932');
    await enter(eventId, classIds[0]!, '@SUM(A1)');
    await confirmEntryPayment(a.entry.id, 'ref-a');
    const res = await organiser.client.get(`/api/events/${eventId}/entries.csv`).buffer(true).parse((r, cb) => {
      const chunks: Buffer[] = [];
      r.on('data', (c: Buffer) => chunks.push(c));
      r.on('end', () => cb(null, Buffer.concat(chunks)));
    });
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('text/csv; charset=utf-8');
    expect(res.headers['content-disposition']).toBe(`attachment; filename="${slug}-entries.csv"`);
    const bytes = res.body as Buffer;
    expect([...bytes.subarray(0, 3)]).toEqual([0xef, 0xbb, 0xbf]);
    const lines = bytes.subarray(3).toString('utf8').trim().split('\n');
    expect(lines[0]).toBe('Number,Build,Card code,Year,Make and model,Entrant,E-mail,Phone,Class,Status,Payment,Entered (Europe/Berlin),Payment method,Payment note,Payment reference,Currency,Fee,Paid,Refund due,Refunded,Refunded (Europe/Berlin),Refund reference,Payment needs attention,Checked in (Europe/Berlin),Waiting-list place,VIN,Plate');
    expect(lines[1]).toMatch(/^1,"'=HYPERLINK\(""http:\/\/x\.test"",""click""\)",/);
    expect(lines[1]).toContain(`,${a.owner.email},'+1 555 0199,Hot rods,Confirmed,Paid,`);
    expect(lines[1]).toContain(',Online,,ref-a,EUR,25,25,,');
    expect(lines[2]).toMatch(/^2,"Coupé ""Brûlé"", 1932",/);
    expect(lines[3]).toMatch(/^3,'@SUM\(A1\),/);
  });

  it('gives the build’s year, make and model, when each entry came in, how it was paid with the note and reference, and check-in in the show’s time zone', async () => {
    const { organiser, eventId, classIds } = await showWithClasses({ classes: [{ name: 'Hot rods' }] });
    const a = await enter(eventId, classIds[0]!, 'Tudor sedan');
    await a.owner.build.update({ modelYear: 1937, bodyOrigin: 'Two-door steel sedan body' });
    expect((await organiser.client.post(`/api/entries/${a.entry.id}/mark-paid`, { note: 'Cash at the club night' })).status).toBe(200);
    // Checked in at 08:05 UTC on a summer morning: 10:05 in Berlin, the show's zone.
    await Entry.update({ status: 'checked_in', checkedInAt: new Date('2026-06-13T08:05:00Z'), createdAt: new Date('2026-05-02T21:30:00Z') }, { where: { id: a.entry.id }, silent: true });
    const res = await organiser.client.get(`/api/events/${eventId}/entries.csv`).buffer(true).parse((r, cb) => {
      const chunks: Buffer[] = [];
      r.on('data', (c: Buffer) => chunks.push(c));
      r.on('end', () => cb(null, Buffer.concat(chunks)));
    });
    // One cell per comma outside quotes; a quoted cell loses its quotes and "" becomes ".
    const cells = (line: string) => [...line.matchAll(/(?:^|,)("(?:[^"]|"")*"|[^,]*)/g)].map((m) => m[1]!.replace(/^"|"$/g, '').replace(/""/g, '"'));
    const [header, row] = (res.body as Buffer).subarray(3).toString('utf8').trim().split('\n').map(cells);
    const cell = (name: string) => row![header!.indexOf(name)];
    expect(cell('Year')).toBe('1937');
    expect(cell('Make and model')).toBe('Two-door steel sedan body');
    expect(cell('Entered (Europe/Berlin)')).toBe('2026-05-02 23:30');
    expect(cell('Payment method')).toBe('By hand (cash, transfer)');
    expect(cell('Payment note')).toBe('Cash at the club night');
    expect(cell('Payment reference')).toMatch(/^manual:/);
    expect(cell('Checked in (Europe/Berlin)')).toBe('2026-06-13 10:05');
  });
});
