import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { keepScreenshot, useBrowserAndServer } from '../support/browser';
import { createUser, DEFAULT_PASSWORD } from '../support/factories';
import { showWithClasses } from '../support/event-factory';
import { enter, memberOf, step } from '../support/show-day-factory';
import { judgeOf, showInJudging } from '../support/judging-factory';

const env = useBrowserAndServer();
const PHONE = { viewport: { width: 390, height: 844 }, deviceScaleFactor: 2, isMobile: true, hasTouch: true };

/**
 * The app's entry script held back, as on one bar of signal where it takes seconds: the test decides when it
 * arrives. Also gathers what the browser refused under the page's content security policy.
 */
async function signInThroughApi(page: Page, email: string) {
  const session = await page.request.get(`${env.baseUrl}/api/session`);
  const { csrfToken } = (await session.json()) as { csrfToken: string };
  expect((await page.request.post(`${env.baseUrl}/api/session`, { data: { email, password: DEFAULT_PASSWORD }, headers: { 'x-csrf-token': csrfToken } })).ok()).toBe(true);
}

async function withAppHeld(page: Page) {
  let release!: () => void;
  const arrived = new Promise<void>((resolve) => (release = resolve));
  await page.route(/\/assets\/index-[\w-]+\.js$/, async (route) => {
    await arrived;
    await route.continue();
  });
  const refused: string[] = [];
  page.on('console', (m) => void (m.type() === 'error' && /Content Security Policy/i.test(m.text()) ? refused.push(m.text()) : undefined));
  return { release, refused };
}

describe('the first screens the server draws before the app arrives', () => {
  it('let the gate type a number and send it before the app has loaded; the app looks the car up when it arrives', async () => {
    const show = await showWithClasses({ settings: { name: 'Lamplight Meet' }, classes: [{ name: 'Hot rods' }] });
    await enter(show.eventId, show.classIds[0]!, 'Early bird coupe');
    await step(show.organiser.client, show.eventId, 'close_registration', 'open_gate');
    const gate = await memberOf(show.eventId, 'gate', 'Gale Gatewood');

    const page = await env.browser.newPage(PHONE);
    await signInThroughApi(page, gate.email);
    const app = await withAppHeld(page);
    await page.goto(`${env.baseUrl}/gate/${show.eventId}`, { waitUntil: 'commit' });

    // The app's code has not arrived: the box is the server's, and it takes the number now.
    await page.getByRole('heading', { name: 'Gate · Lamplight Meet' }).waitFor();
    expect(await page.locator('[data-early-path]').count()).toBe(1);
    const lookUps: string[] = [];
    page.on('request', (r) => void (r.url().includes('/gate/lookup') ? lookUps.push(r.url()) : undefined));
    await page.getByLabel('Entry number').fill('1');
    await page.getByLabel('Entry number').press('Enter');
    // The page looks the number up itself and shows the car; the buttons wait for the app.
    const car = page.getByRole('region', { name: 'Scanned car' });
    await car.getByText('No. 1').waitFor();
    expect(await car.getByText('Early bird coupe').count()).toBe(1);
    expect(await car.getByText('Payment: Unpaid').count()).toBe(1);
    expect(await car.getByText('Entry 1 is not paid yet. Take the fee in cash to check it in.').count()).toBe(1);
    await page.getByText('The camera and the check-in buttons are on their way.').waitFor();
    expect(await car.getByRole('button').count()).toBe(0);
    expect(page.url()).toBe(`${env.baseUrl}/gate/${show.eventId}`); // the send was held, the page never left
    await keepScreenshot(page, 'first-screen-gate-held.png');

    app.release();
    await car.getByRole('button', { name: 'Take €25.00 cash and check in' }).waitFor();
    expect(await car.getByText('Early bird coupe').count()).toBe(1);
    expect(lookUps, 'the app keeps the car the page found: one look-up').toHaveLength(1);
    expect(await page.getByLabel('Entry number').inputValue()).toBe('1');
    expect(await page.locator('[data-early-path]').count()).toBe(0);
    expect(app.refused).toEqual([]);
    await keepScreenshot(page, 'first-screen-gate-answered.png');
  });

  it('let a person type their e-mail and password and send them before the app has loaded, and signs them in when it arrives', async () => {
    const person = await createUser({ name: 'Rhea Early' });
    const page = await env.browser.newPage(PHONE);
    const app = await withAppHeld(page);
    await page.goto(`${env.baseUrl}/sign-in?next=${encodeURIComponent('/builds')}`, { waitUntil: 'commit' });
    await page.getByLabel('E-mail').fill(person.email);
    await page.getByLabel('Password').fill(DEFAULT_PASSWORD);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByText('Signing you in as soon as the page has finished loading…').waitFor();
    expect(await page.locator('[data-early-path]').count()).toBe(1);
    await keepScreenshot(page, 'first-screen-sign-in-held.png');

    app.release();
    await page.waitForURL(`${env.baseUrl}/builds`);
    await page.getByRole('heading', { name: 'My builds' }).waitFor();
    expect(app.refused).toEqual([]);
  });

  it('let a judge tap a car on their list before the app has loaded; the app opens that car’s sheet when it arrives', async () => {
    const show = await showInJudging({ carsPerClass: 1 });
    const judge = await judgeOf(show.eventId, 'Jude Early');
    expect((await show.organiser.client.put(`/api/events/${show.eventId}/judges/${judge.user.id}/classes`, { allClasses: true })).status).toBe(200);
    const [, second] = show.entries;

    const page = await env.browser.newPage(PHONE);
    await signInThroughApi(page, judge.email);
    const app = await withAppHeld(page);
    await page.goto(`${env.baseUrl}/judge/${show.eventId}`, { waitUntil: 'commit' });
    await page.getByText(/^My cars: 0 of 2 scored/).waitFor();
    await keepScreenshot(page, 'first-screen-judge-held.png');
    await page.getByRole('link', { name: new RegExp(`^${second!.number} `) }).click();
    await page.getByText('Opening that car as soon as your cars have finished loading…').waitFor();
    expect(page.url()).toBe(`${env.baseUrl}/judge/${show.eventId}`);

    app.release();
    await page.waitForURL(`${env.baseUrl}/judge/${show.eventId}/cars/${second!.id}`);
    await page.getByRole('heading', { name: 'Car 2' }).waitFor(); // the factory's second car
    expect(app.refused).toEqual([]);
  });
});
