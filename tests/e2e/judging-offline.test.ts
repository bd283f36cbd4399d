import { describe, expect, it } from 'vitest';
import { Score } from '@server/models/score';
import { keepScreenshot, openSignedIn, useBrowserAndServer } from '../support/browser';
import { DEFAULT_PASSWORD } from '../support/factories';
import { judgeOf, showInJudging } from '../support/judging-factory';

const env = useBrowserAndServer();

describe('judging on a phone with no signal', () => {
  it('opens the sheet, survives a reload offline, keeps three scored cars on the phone and sends every score exactly once when the signal returns', async () => {
    const show = await showInJudging({ carsPerClass: 2 });
    const judge = await judgeOf(show.eventId, 'Field Judge');
    expect((await show.organiser.client.put(`/api/events/${show.eventId}/judges/${judge.user.id}/classes`, { allClasses: true })).status).toBe(200);

    const context = await env.browser.newContext({ viewport: { width: 390, height: 844 }, deviceScaleFactor: 2, isMobile: true, hasTouch: true });
    const page = await context.newPage();
    const list = `/judge/${show.eventId}`;
    await openSignedIn(page, env.baseUrl, judge.email, DEFAULT_PASSWORD, list);
    await expect.poll(() => page.getByText('My cars: 0 of 4 scored').count()).toBe(1);
    // The service worker has kept the shell and its assets once it is active (it then answers the next load of /judge…).
    await expect.poll(() => page.evaluate(async () => (await navigator.serviceWorker.getRegistration('/judge'))?.active?.state)).toBe('activated');
    await keepScreenshot(page, 'judge-cars-phone.png', { fullPage: true });

    await page.getByRole('link', { name: /First car/ }).click();
    await page.getByRole('heading', { name: 'First car' }).waitFor();

    await context.setOffline(true);
    await page.reload();
    await page.getByRole('heading', { name: 'First car' }).waitFor();
    await page.getByText('No signal').waitFor();

    const picks = [
      [7, 6, 4],
      [9, 8, 5],
      [3, 10, 0],
    ];
    for (let car = 0; car < 3; car++) {
      for (const [i, criterion] of show.criteria.entries()) {
        await page.getByRole('radiogroup', { name: criterion.name }).getByRole('radio', { name: String(picks[car]![i]), exact: true }).tap();
        await expect.poll(() => page.getByRole('radiogroup', { name: criterion.name }).getByRole('radio', { checked: true }).innerText()).toBe(String(picks[car]![i]));
      }
      if (car === 0) {
        await page.getByLabel('Comment on the whole car').fill('Clean underside, loose trim on the left door.');
        await page.getByLabel('Comment on paint and body').click(); // leaving the box saves it
        await keepScreenshot(page, 'judge-sheet-phone-offline.png', { fullPage: true });
      }
      if (car < 2) await page.getByRole('link', { name: /^No\. \d+ →$/ }).tap();
      await page.getByRole('heading', { name: car < 2 ? `Car ${car + 2}` : 'Car 3' }).waitFor();
    }
    // Still nothing on the server, and the phone says so, even after another reload with no signal.
    await page.reload();
    await page.getByRole('link', { name: 'My cars' }).tap();
    await expect.poll(() => page.getByText(/10 lines not yet sent/).count()).toBe(1);
    expect(await Score.count({ where: { eventId: show.eventId } })).toBe(0);
    await keepScreenshot(page, 'judge-cars-phone-unsent.png', { fullPage: true });

    await context.setOffline(false);
    await expect.poll(() => page.getByText('Everything is sent.').count()).toBe(1);
    const rows = await Score.findAll({ where: { eventId: show.eventId, judgeId: judge.user.id } });
    expect(rows).toHaveLength(9);
    for (let car = 0; car < 3; car++) {
      for (const [i, criterion] of show.criteria.entries()) {
        const matching = rows.filter((r) => r.entryId === show.entries[car]!.id && r.criterionId === criterion.id);
        expect(matching.map((r) => r.points)).toEqual([picks[car]![i]]);
      }
    }
    await keepScreenshot(page, 'judge-cars-phone-sent.png', { fullPage: true });
    await context.close();
  });
});
