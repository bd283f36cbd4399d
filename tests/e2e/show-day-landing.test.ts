import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { keepScreenshot, useBrowserAndServer } from '../support/browser';
import { DEFAULT_PASSWORD, createUser } from '../support/factories';
import { checkIn, judgeOf, showInJudging } from '../support/judging-factory';
import { memberOf } from '../support/show-day-factory';

const env = useBrowserAndServer();
const PHONE = { viewport: { width: 390, height: 844 }, deviceScaleFactor: 2, isMobile: true, hasTouch: true };

/** Signs in with no `next`, as a person opening the site on the day would, and waits for where they land. */
async function signInOnPhone(email: string): Promise<Page> {
  const context = await env.browser.newContext(PHONE);
  const page = await context.newPage();
  await page.goto(`${env.baseUrl}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(DEFAULT_PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL((url) => url.pathname !== '/sign-in');
  return page;
}

describe('each role lands on its day', () => {
  it('a judge lands on their cars, sees a car not checked in as expected with nothing to score, and the late arrival joins the list once the gate checks it in', async () => {
    const show = await showInJudging({ carsPerClass: 2, notArrived: 1 });
    const judge = await judgeOf(show.eventId, 'Rue Scorewell');
    await show.organiser.client.put(`/api/events/${show.eventId}/judges/${judge.user.id}/classes`, { allClasses: true });

    const page = await signInOnPhone(judge.email);
    expect(new URL(page.url()).pathname).toBe(`/judge/${show.eventId}`);
    await page.getByText('My cars: 0 of 3 scored · 1 still expected').waitFor();
    const expected = page.getByRole('region', { name: 'Still expected at the gate' });
    expect(await expected.getByRole('listitem').innerText()).toMatch(/4\s+Car 4\s+Customs\s+Not arrived/i);
    expect(await expected.getByRole('link').count()).toBe(0); // nothing to open, so nothing to score
    await keepScreenshot(page, 'show-day-judge-expected.png', { fullPage: true });

    // Opened by its address anyway, the sheet says why there is nothing to score.
    await page.goto(`${env.baseUrl}/judge/${show.eventId}/cars/${show.entries[3]!.id}`);
    await page.getByText('No. 4 has not arrived: only cars the gate has checked in are judged.').waitFor();

    const gate = await memberOf(show.eventId, 'gate');
    await checkIn(gate.client, show.eventId, 4);
    await page.goto(`${env.baseUrl}/judge/${show.eventId}`);
    await page.getByText('My cars: 0 of 4 scored').waitFor();
    await page.getByRole('link', { name: /^4\s+Car 4/ }).click();
    await page.getByRole('heading', { name: 'Car 4' }).waitFor();
    await keepScreenshot(page, 'show-day-judge-late-arrival.png', { fullPage: true });
    await page.context().close();
  });

  it('gate staff land on the scanner, the organiser on Today, the site admin on accounts', async () => {
    const show = await showInJudging({ carsPerClass: 1, notArrived: 1 });

    const gate = await memberOf(show.eventId, 'gate');
    const gatePage = await signInOnPhone(gate.email);
    expect(new URL(gatePage.url()).pathname).toBe(`/gate/${show.eventId}`);
    await gatePage.getByRole('heading', { name: /^Gate ·/ }).waitFor();
    await keepScreenshot(gatePage, 'show-day-gate-landing.png');
    await gatePage.context().close();

    const organiserPage = await signInOnPhone(show.organiser.email);
    expect(new URL(organiserPage.url()).pathname).toBe(`/shows/${show.eventId}`);
    const today = organiserPage.locator('section', { has: organiserPage.getByRole('heading', { name: 'Today', exact: true }) });
    await today.getByText('1 of 2 cars checked in').waitFor();
    await today.getByText('No unpaid entries').waitFor();
    await today.getByText('No judge has cars to score yet: give each judge their classes.').waitFor();
    // Today comes before the show's details, so a phone shows it first.
    const todayBox = await today.boundingBox();
    const detailsBox = await organiserPage.locator('section', { has: organiserPage.getByRole('heading', { name: 'The show', exact: true }) }).boundingBox();
    expect(todayBox!.y).toBeLessThan(detailsBox!.y);
    await keepScreenshot(organiserPage, 'show-day-organiser-today.png');
    await organiserPage.context().close();

    const admin = await createUser({ isSiteAdmin: true, name: 'Sam Siteadmin' });
    const adminPage = await signInOnPhone(admin.email);
    expect(new URL(adminPage.url()).pathname).toBe('/admin/accounts');
    await adminPage.getByRole('heading', { name: 'Accounts' }).waitFor();
    await adminPage.context().close();
  });
});
