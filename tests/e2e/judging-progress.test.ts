import { describe, expect, it } from 'vitest';
import { keepScreenshot, openSignedIn, useBrowserAndServer } from '../support/browser';
import { DEFAULT_PASSWORD } from '../support/factories';
import { judgeOf, scoreItem, showInJudging } from '../support/judging-factory';

const env = useBrowserAndServer();

describe('the organiser watches judging', () => {
  it('sees finished sheets per class and what each judge has left, and closes judging', async () => {
    const show = await showInJudging({ carsPerClass: 2 });
    const judge = await judgeOf(show.eventId, 'Pat Marker');
    await show.organiser.client.put(`/api/events/${show.eventId}/judges/${judge.user.id}/classes`, { allClasses: false, classIds: [show.classIds[0]] });
    await judge.client.post(`/api/events/${show.eventId}/scores`, { scores: show.criteria.map((c) => scoreItem(show.entries[0]!.id, c.id, 4)) });

    const context = await env.browser.newContext({ viewport: { width: 1100, height: 900 } });
    const page = await context.newPage();
    await openSignedIn(page, env.baseUrl, show.organiser.email, DEFAULT_PASSWORD, `/shows/${show.eventId}`);
    const panel = page.locator('section', { has: page.getByRole('heading', { name: 'Judging', exact: true }) });
    await panel.getByRole('row', { name: /Pat Marker/ }).waitFor();
    expect(await panel.getByRole('row', { name: /Pat Marker/ }).innerText()).toMatch(/1 \/ 2\s+0\s+1\s+2/);
    expect(await panel.getByRole('row', { name: /Hot rods/ }).innerText()).toMatch(/1 car with 0 finished sheets · 1 car with 1 finished sheet/);
    await keepScreenshot(page, 'judging-progress-organiser.png', { fullPage: true });

    await panel.getByRole('button', { name: 'Close judging' }).click();
    await panel.getByText(/Judging is closed/).waitFor();
    const late = await judge.client.post(`/api/events/${show.eventId}/scores`, { scores: [scoreItem(show.entries[1]!.id, show.criteria[0]!.id, 3)] });
    expect(late.status).toBe(409);
    await context.close();
  });
});
