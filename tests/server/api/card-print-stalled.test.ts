import { describe, expect, it } from 'vitest';
import { randomUUID } from 'node:crypto';
import { CardPrint } from '@server/models/card-print';
import { config } from '@server/config';
import { cardWorker, download, pagesOf, showWithConfirmedEntries, waitForPrint } from '../../support/card-print-helpers';

describe('a bulk print whose worker was killed mid-print', () => {
  it('blocks nobody once its heartbeat stops: the organiser prints again, it resumes, and no partial file is ever served', async () => {
    const show = await showWithConfirmedEntries([{ title: 'Alpha roadster', cls: 0 }, { title: 'Bravo coupe', cls: 1 }, { title: 'Charlie wagon', cls: 0 }]);
    const client = show.organiser.client;
    const url = `/api/events/${show.eventId}/card-prints`;
    // What a killed worker leaves: a print running at 2 of 3 under its token, whose beats stop.
    const dead = await CardPrint.create({ eventId: show.eventId, classId: null, total: 3, done: 2, status: 'running', startedBy: show.organiser.user.id, workerToken: randomUUID(), heartbeatAt: new Date() });

    // While it still beats, printing again returns the running print (the control).
    const whileAlive = await client.post(url, {});
    expect([whileAlive.status, whileAlive.body.print.id, whileAlive.body.print.stalled]).toEqual([200, dead.id, false]);

    await dead.update({ heartbeatAt: new Date(Date.now() - (config.cardPrintStaleSeconds + 1) * 1000) });
    const seen = (await client.get(`${url}/latest`)).body.print;
    expect(seen).toMatchObject({ id: dead.id, status: 'running', done: 2, stalled: true, downloadUrl: null });
    expect((await client.get(`${url}/${dead.id}/cards.pdf`)).status).toBe(409); // nothing partial

    const again = await client.post(url, {});
    expect([again.status, again.body.print.id]).toEqual([202, dead.id]);
    await cardWorker();
    const { print } = await waitForPrint(client, show.eventId, dead.id);
    expect(print).toMatchObject({ status: 'done', done: 3, total: 3 });
    const pdf = await download(client, print.downloadUrl!);
    expect((await pagesOf(pdf.body as Buffer)).count).toBe(3);
  });
});
