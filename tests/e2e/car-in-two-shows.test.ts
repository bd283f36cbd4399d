import { describe, expect, it } from 'vitest';
import { config } from '@server/config';
import { qrMatrix } from '@server/services/builds/cards';
import { numberedCardsOf } from '@server/services/show-day/numbered-cards';
import { keepScreenshot, useBrowserAndServer } from '../support/browser';
import { showWithClasses } from '../support/event-factory';
import { showInJudging } from '../support/judging-factory';
import { enter, step } from '../support/show-day-factory';

const env = useBrowserAndServer();
const DAY = 86400_000;

/** One car in a show being judged and in a later one still at show day, both taking people's choice votes. */
async function carInTwoShows() {
  const judged = await showInJudging();
  const { owner } = judged;
  const later = await showWithClasses({
    settings: { name: 'Lantern Yard Evening', entryFee: 0, startsAt: new Date(Date.now() + 40 * DAY).toISOString(), endsAt: new Date(Date.now() + 41 * DAY).toISOString() },
    classes: [{ name: 'Street machines' }, { name: 'Early iron' }],
  });
  // Another car first, so its number there differs from its number in the judged show.
  await enter(later.eventId, later.classIds[0]!, 'Other car');
  const entered = await owner.client.post(`/api/events/${later.eventId}/entries`, { buildId: owner.build.id, classId: later.classIds[1] });
  expect(entered.status, JSON.stringify(entered.body)).toBe(201);
  await step(later.organiser.client, later.eventId, 'close_registration', 'open_gate');
  for (const show of [judged, later]) expect((await show.organiser.client.post(`/api/events/${show.eventId}/peoples-choice/open`)).status).toBe(200);
  const judgedSlug = (await judged.organiser.client.get(`/api/events/${judged.eventId}`)).body.event.slug as string;
  return { judged: { ...judged, slug: judgedSlug }, later, code: owner.build.code, laterNumber: entered.body.entry.number as number };
}

const votesFor = async (show: { organiser: { client: { get: (url: string) => Promise<{ body: { peoplesChoice: { tally: Array<{ title: string; votes: number }> } } }> } }; eventId: number }) =>
  (await show.organiser.client.get(`/api/events/${show.eventId}/peoples-choice`)).body.peoplesChoice.tally.find((t) => t.title === 'First car')?.votes;

describe('a car in two current shows, on a phone', () => {
  it('shows both shows with their numbers, classes and votes; a vote counts in its own show; the QR of a show’s card puts that show first', async () => {
    const { judged, later, code, laterNumber } = await carInTwoShows();
    const phone = await env.browser.newContext({ viewport: { width: 390, height: 844 }, deviceScaleFactor: 2, isMobile: true, locale: 'en-GB' });
    const page = await phone.newPage();
    await page.goto(`${env.baseUrl}/c/${code}`);

    const sections = page.locator('#show-entry section');
    expect(await sections.count()).toBe(2);
    const judgedBox = page.getByRole('region', { name: 'Entry in Autumn Field Meet' });
    const laterBox = page.getByRole('region', { name: 'Entry in Lantern Yard Evening' });
    // The sooner show first; each with its own class, number and vote button.
    expect(await sections.first().getAttribute('aria-label')).toBe('Entry in Autumn Field Meet');
    expect(await judgedBox.innerText()).toMatch(/Class: Hot rods\s+Entry 1\b/i);
    expect(await laterBox.innerText()).toMatch(new RegExp(`Class: Early iron\\s+Entry ${laterNumber}\\b`, 'i'));
    for (const box of [judgedBox, laterBox]) expect(await box.getByRole('button', { name: 'Vote for this car' }).count()).toBe(1);
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
    await keepScreenshot(page.locator('#show-entry'), 'car-in-two-shows-phone.png');

    // A vote in the later show counts there, and only there; the page comes back with that show first, thanking the visitor.
    const [posted] = await Promise.all([page.waitForResponse((r) => r.url().includes(`/c/${code}/vote`)), laterBox.getByRole('button', { name: 'Vote for this car' }).click()]);
    expect(posted.status()).toBe(303);
    await laterBox.getByText('Thank you for voting.').waitFor();
    expect(page.url()).toBe(`${env.baseUrl}/c/${code}?show=${later.slug}#vote-${later.slug}`);
    expect(await sections.first().getAttribute('aria-label')).toBe('Entry in Lantern Yard Evening');
    expect(await judgedBox.getByRole('button', { name: 'Vote for this car' }).count()).toBe(1);
    expect(await votesFor(later)).toBe(1);
    expect(await votesFor(judged)).toBe(0);
    await keepScreenshot(page, 'car-in-two-shows-voted-phone.png', { fullPage: true });

    // The judged show's vote is still the visitor's to give.
    await judgedBox.getByRole('button', { name: 'Vote for this car' }).click();
    await judgedBox.getByText('Thank you for voting.').waitFor();
    expect(await votesFor(judged)).toBe(1);
    expect(await votesFor(later)).toBe(1);

    // The numbered card of the later show carries that show in its QR address; opened, the page leads with it.
    const card = (await numberedCardsOf({ id: later.eventId, name: 'Lantern Yard Evening', slug: later.slug }, null)).find((c) => c.number === laterNumber)!;
    const scanned = `/c/${code}?show=${later.slug}&no=${laterNumber}`;
    expect(card.content.qr).toEqual(qrMatrix(`${config.publicBaseUrl}${scanned}`));
    const judgedCard = (await numberedCardsOf({ id: judged.eventId, name: 'Autumn Field Meet', slug: judged.slug }, null)).find((c) => c.number === 1)!;
    expect(judgedCard.content.qr).toEqual(qrMatrix(`${config.publicBaseUrl}/c/${code}?show=${judged.slug}&no=1`));
    const fresh = await env.browser.newContext({ viewport: { width: 390, height: 844 }, isMobile: true });
    const scannedPage = await fresh.newPage();
    await scannedPage.goto(`${env.baseUrl}${scanned}`);
    expect(await scannedPage.locator('#show-entry section').first().getAttribute('aria-label')).toBe('Entry in Lantern Yard Evening');
    await scannedPage.goto(`${env.baseUrl}/c/${code}?show=${judged.slug}&no=1`);
    expect(await scannedPage.locator('#show-entry section').first().getAttribute('aria-label')).toBe('Entry in Autumn Field Meet');
    await fresh.close();
    await phone.close();
  });
});
