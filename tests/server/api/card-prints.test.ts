import { describe, expect, it } from 'vitest';
import { QueryTypes } from 'sequelize';
import { sequelize } from '@server/db/sequelize';
import { Build } from '@server/models/build';
import { Entry } from '@server/models/entry';
import { decodeMail } from '@server/mail/mail-job';
import { MAIL_QUEUE } from '@server/jobs/queue';
import { showWithClasses, signedIn } from '../../support/event-factory';
import { apiClient } from '../../support/api-client';
import { enter, memberOf } from '../../support/show-day-factory';
import { readQr, rasterize, pdfText } from '../../support/pdf';
import { waitForMailAbout } from '../../support/mailbox';
import { cardWorker, download, numberOnPage, pagesOf, showWithConfirmedEntries, waitForPrint } from '../../support/card-print-helpers';

const FIVE = [
  { title: 'Blue roadster', cls: 0 },
  { title: 'Lead sled', cls: 1 },
  { title: 'Channelled coupe', cls: 0 },
  { title: 'Shoebox custom', cls: 1 },
  { title: 'Track-nose pickup', cls: 0 },
] as const;

describe('bulk numbered cards', () => {
  it('is for the show’s organisers only; a second start while one waits returns the same print', async () => {
    const s = await showWithConfirmedEntries([...FIVE.slice(0, 2)]);
    const judge = await memberOf(s.eventId, 'judge', 'Jude Judgely');
    const gate = await memberOf(s.eventId, 'gate', 'Gail Gately');
    const otherOrganiser = (await showWithClasses()).organiser;
    // Someone with no role in the show is told it does not exist, as for a missing one.
    for (const [who, status] of [[judge.client, 403], [gate.client, 403], [s.owner.client, 404], [otherOrganiser.client, 404]] as const) {
      expect((await who.post(`/api/events/${s.eventId}/card-prints`, {})).status).toBe(status);
      expect((await who.get(`/api/events/${s.eventId}/card-prints/latest`)).status).toBe(status);
    }
    const anonymous = await apiClient();
    expect((await anonymous.post(`/api/events/${s.eventId}/card-prints`, {})).status).toBe(401);
    expect((await anonymous.get(`/api/events/${s.eventId}/card-prints/latest`)).status).toBe(401);
    // No worker runs in this process yet, so the first print is still waiting when the second start comes.
    const first = await s.organiser.client.post(`/api/events/${s.eventId}/card-prints`, {});
    expect(first.status).toBe(202);
    expect(first.body.print).toMatchObject({ status: 'queued', done: 0, total: 2, classId: null, startedBy: 'Org Anizer', downloadUrl: null });
    const again = await s.organiser.client.post(`/api/events/${s.eventId}/card-prints`, {});
    expect(again.status).toBe(200);
    expect(again.body.print.id).toBe(first.body.print.id);
    // Another filter is another print.
    const oneClass = await s.organiser.client.post(`/api/events/${s.eventId}/card-prints`, { classId: s.classIds[1] });
    expect(oneClass.status).toBe(202);
    expect(oneClass.body.print).toMatchObject({ classId: s.classIds[1], className: 'Customs', total: 1 });
    // A reload finds the same print, and so does a second organiser, whose start joins it.
    expect((await s.organiser.client.get(`/api/events/${s.eventId}/card-prints/latest`)).body.print.id).toBe(first.body.print.id);
    const coOrganiser = await memberOf(s.eventId, 'organiser', 'Cora Coorganiser');
    expect((await coOrganiser.client.get(`/api/events/${s.eventId}/card-prints/latest`)).body.print).toMatchObject({ id: first.body.print.id, startedBy: 'Org Anizer' });
    const joined = await coOrganiser.client.post(`/api/events/${s.eventId}/card-prints`, { classId: null });
    expect(joined.status).toBe(200);
    expect(joined.body.print.id).toBe(first.body.print.id);

    for (const [who, status] of [[judge.client, 403], [gate.client, 403], [s.owner.client, 404]] as const) {
      expect((await who.get(`/api/events/${s.eventId}/card-prints/${first.body.print.id}`)).status).toBe(status);
      expect((await who.get(`/api/events/${s.eventId}/card-prints/${first.body.print.id}/cards.pdf`)).status).toBe(status);
    }
    expect((await s.organiser.client.get(`/api/events/${s.eventId}/card-prints/${first.body.print.id}/cards.pdf`)).status).toBe(409);
    await cardWorker();
    const { print } = await waitForPrint(s.organiser.client, s.eventId, first.body.print.id);
    expect(print.status).toBe('done');
    for (const [who, status] of [[judge.client, 403], [gate.client, 403], [s.owner.client, 404]] as const) expect((await who.get(print.downloadUrl!)).status).toBe(status);
  });

  it('refuses a show or a class with no confirmed entries, and a class of another show, naming the field', async () => {
    const s = await showWithClasses();
    const unpaid = await enter(s.eventId, s.classIds[0]!, 'Unpaid only');
    expect(unpaid.entry.status).toBe('awaiting_payment');
    const empty = await s.organiser.client.post(`/api/events/${s.eventId}/card-prints`, {});
    expect(empty.status).toBe(409);
    expect(empty.body.error.message).toBe('This show has no confirmed entries yet: there are no cards to print.');
    const emptyClass = await s.organiser.client.post(`/api/events/${s.eventId}/card-prints`, { classId: s.classIds[1] });
    expect(emptyClass.status).toBe(409);
    expect(emptyClass.body.error.message).toMatch(/class has no confirmed entries/);
    const other = await showWithClasses();
    const foreign = await s.organiser.client.post(`/api/events/${s.eventId}/card-prints`, { classId: other.classIds[0] });
    expect(foreign.status).toBe(400);
    expect(foreign.body.error.fields).toEqual({ classId: 'Not a class of this show.' });
    const bad = await s.organiser.client.post(`/api/events/${s.eventId}/card-prints`, { classId: 'all' });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields)).toEqual(['classId']);
    expect((await s.organiser.client.get(`/api/events/${s.eventId}/card-prints/latest`)).body.print).toBeNull();
  });

  it('renders one page per confirmed entry in number order, with progress, and a QR code that opens the build', async () => {
    await cardWorker();
    const s = await showWithConfirmedEntries([...FIVE], { showName: 'Riverside Autumn Meet' });
    const started = await s.organiser.client.post(`/api/events/${s.eventId}/card-prints`, {});
    expect(started.status).toBe(202);
    const { print, seen } = await waitForPrint(s.organiser.client, s.eventId, started.body.print.id);
    expect(print).toMatchObject({ status: 'done', done: 5, total: 5, rendered: 5, error: null });
    expect(seen[seen.length - 1]).toBe(5);
    expect([...seen].sort((a, b) => a - b)).toEqual(seen); // never goes backwards

    const file = await download(s.organiser.client, print.downloadUrl!);
    expect(file.status).toBe(200);
    expect(file.headers['content-type']).toBe('application/pdf');
    expect(file.headers['content-disposition']).toMatch(/attachment; filename=".*-numbered-cards\.pdf"/);
    const { count, texts } = await pagesOf(file.body as Buffer);
    const expected = [...s.confirmed].sort((a, b) => a.number - b.number);
    expect(count).toBe(5);
    expect(texts.map(numberOnPage)).toEqual(expected.map((e) => e.number));
    texts.forEach((pageText, i) => {
      const text = pageText.replace(/\s+/g, ' '); // long names wrap onto two lines
      expect(text).toContain('RIVERSIDE AUTUMN MEET');
      expect(text).toContain(expected[i]!.className);
      expect(text).toContain(expected[i]!.title.toUpperCase());
    });
    expect(texts.join(' ')).not.toMatch(/UNPAID SEDAN|WITHDRAWN WAGON|example\.test/i);

    // The first page's QR code, as a phone reads the printed page: the car's page with this show first, marked with its number.
    const qr = readQr(rasterize(file.body as Buffer, 100));
    expect(qr?.data).toBe(`http://127.0.0.1:3999/c/${expected[0]!.code}?show=${s.slug}&no=${expected[0]!.number}`);
  });

  it('prints one class alone, in number order', async () => {
    await cardWorker();
    const s = await showWithConfirmedEntries([...FIVE]);
    const started = await s.organiser.client.post(`/api/events/${s.eventId}/card-prints`, { classId: s.classIds[0] });
    const { print } = await waitForPrint(s.organiser.client, s.eventId, started.body.print.id);
    const { count, texts } = await pagesOf((await download(s.organiser.client, print.downloadUrl!)).body as Buffer);
    const hotRods = s.confirmed.filter((e) => e.className === 'Hot rods').map((e) => e.number).sort((a, b) => a - b);
    expect(count).toBe(3);
    expect(texts.map(numberOnPage)).toEqual(hotRods);
    for (const t of texts) expect(t).not.toContain('Customs');
  });

  it('draws no card again when nothing changed, and exactly one after one edit', async () => {
    await cardWorker();
    const s = await showWithConfirmedEntries([...FIVE]);
    const run = async () => {
      const res = await s.organiser.client.post(`/api/events/${s.eventId}/card-prints`, {});
      expect(res.status).toBe(202);
      return (await waitForPrint(s.organiser.client, s.eventId, res.body.print.id)).print;
    };
    const first = await run();
    expect(first.rendered).toBe(5);
    const again = await run();
    expect(again).toMatchObject({ status: 'done', done: 5, total: 5, rendered: 0 });
    const firstFile = (await download(s.organiser.client, first.downloadUrl!)).body as Buffer;
    expect(Buffer.compare((await download(s.organiser.client, again.downloadUrl!)).body as Buffer, firstFile)).toBe(0);

    // The owner renames one car: only its card is drawn again, and the new title is on its page.
    const renamed = s.confirmed[2]!;
    await Build.update({ title: 'Channelled coupe, second paint' }, { where: { id: renamed.buildId } });
    const edited = await run();
    expect(edited).toMatchObject({ status: 'done', done: 5, rendered: 1 });
    const { texts } = await pagesOf((await download(s.organiser.client, edited.downloadUrl!)).body as Buffer);
    const page = texts.find((t) => numberOnPage(t) === renamed.number)!;
    expect(page.replace(/\s+/g, ' ')).toContain('SECOND PAINT');

    // A withdrawal changes the set, not the other cards: nothing is drawn, one page fewer.
    expect((await s.organiser.client.post(`/api/entries/${s.confirmed[0]!.id}/withdraw`)).status).toBe(200);
    const fewer = await run();
    expect(fewer).toMatchObject({ total: 4, rendered: 0 });
    expect((await pagesOf((await download(s.organiser.client, fewer.downloadUrl!)).body as Buffer)).count).toBe(4);
  });
});

describe('the owner’s card for an entry, and the show reminder that attaches it', () => {
  it('gives the owner their card with the show, class and number; others and waiting entries get none', async () => {
    const s = await showWithConfirmedEntries([{ title: 'Scalloped roadster', cls: 1 }], { showName: 'Lakeside Cruise Night' });
    const entry = s.confirmed[0]!;
    const res = await download(s.owner.client, `/api/entries/${entry.id}/card.pdf`);
    expect(res.status).toBe(200);
    expect(res.headers['content-disposition']).toBe(`attachment; filename="placard-${entry.code}-entry-${entry.number}.pdf"`);
    const text = await pdfText(res.body as Buffer);
    expect(text).toContain('LAKESIDE CRUISE NIGHT');
    expect(text).toContain('Customs');
    expect(numberOnPage(text)).toBe(entry.number);
    expect(readQr(rasterize(res.body as Buffer, 100))?.data).toBe(`http://127.0.0.1:3999/c/${entry.code}?show=${s.slug}&no=${entry.number}`); // marked for the gate

    const stranger = await signedIn();
    expect((await stranger.client.get(`/api/entries/${entry.id}/card.pdf`)).status).toBe(404);
    await Entry.update({ status: 'waiting_list', number: null }, { where: { id: s.unpaid.entryId } });
    const waiting = await s.owner.client.get(`/api/entries/${s.unpaid.entryId}/card.pdf`);
    expect(waiting.status).toBe(409);
    expect(waiting.body.error.message).toMatch(/no number yet/);
  });

  it('mails each confirmed entrant once, with their card attached; organisers only', async () => {
    await cardWorker();
    const s = await showWithConfirmedEntries([{ title: 'Pinstriped panel van', cls: 0 }], { showName: 'Harbour Lights Show' });
    const entry = s.confirmed[0]!;
    expect((await s.owner.client.post(`/api/events/${s.eventId}/reminders`)).status).toBe(404);
    const sent = await s.organiser.client.post(`/api/events/${s.eventId}/reminders`);
    expect(sent.status).toBe(202);
    expect(sent.body).toEqual({ entrants: 1 });
    const mail = await waitForMailAbout(s.owner.email, /your card for entry/, 120_000);
    expect(mail.subject).toBe(`See you at Harbour Lights Show: your card for entry ${entry.number}`);
    expect(mail.text).toContain('Pinstriped panel van is entry number');

    // The queued mail carries the card: a PDF with the show, class and number.
    const [job] = await sequelize.query<{ data: unknown }>(`SELECT data FROM pgboss.job WHERE name = $1 AND data->>'to' = $2 AND data->>'subject' LIKE 'See you at%'`, { bind: [MAIL_QUEUE, s.owner.email], type: QueryTypes.SELECT });
    const attachment = decodeMail(job!.data).attachments![0]!;
    expect(attachment.filename).toBe(`placard-${entry.code}-entry-${entry.number}.pdf`);
    const text = await pdfText(attachment.content);
    expect(text).toContain('HARBOUR LIGHTS SHOW');
    expect(numberOnPage(text)).toBe(entry.number);

    // A second press sends nobody a second reminder.
    expect((await s.organiser.client.post(`/api/events/${s.eventId}/reminders`)).status).toBe(202);
    const marker = await s.organiser.client.post(`/api/events/${s.eventId}/card-prints`, {});
    await waitForPrint(s.organiser.client, s.eventId, marker.body.print.id); // the card queue has worked past the second reminder job
    const count = await sequelize.query<{ n: string }>(`SELECT count(*) AS n FROM pgboss.job WHERE name = $1 AND data->>'to' = $2 AND data->>'subject' LIKE 'See you at%'`, { bind: [MAIL_QUEUE, s.owner.email], type: QueryTypes.SELECT });
    expect(Number(count[0]!.n)).toBe(1);
  });
});
