import { describe, expect, it } from 'vitest';
import { Build } from '@server/models/build';
import { Entry } from '@server/models/entry';
import { keepScreenshot, openSignedIn, useBrowserAndServer } from '../support/browser';
import { DEFAULT_PASSWORD } from '../support/factories';
import { showInJudging } from '../support/judging-factory';

const env = useBrowserAndServer();

describe('people’s choice on a phone with JavaScript turned off', () => {
  it('a visitor votes with one big button, is thanked, and a second vote is refused; the organiser sees it in the tally', async () => {
    const show = await showInJudging();
    const first = await Entry.findByPk(show.entries[0]!.id, { include: [{ model: Build, as: 'build', attributes: ['code'] }] });
    const second = await Entry.findByPk(show.entries[1]!.id, { include: [{ model: Build, as: 'build', attributes: ['code'] }] });
    const [car1, car2] = [first!.build!.code, second!.build!.code];
    expect((await show.organiser.client.post(`/api/events/${show.eventId}/peoples-choice/open`)).status).toBe(200);

    const phone = await env.browser.newContext({ javaScriptEnabled: false, viewport: { width: 390, height: 844 }, deviceScaleFactor: 2, isMobile: true, locale: 'en-GB' });
    // Two cars open in two tabs, as a visitor walking the field might leave them.
    const page = await phone.newPage();
    const otherTab = await phone.newPage();
    await page.goto(`${env.baseUrl}/c/${car1}`);
    await otherTab.goto(`${env.baseUrl}/c/${car2}`);
    expect(await page.locator('script').count()).toBe(0);

    const button = page.getByRole('button', { name: 'Vote for this car' });
    await button.scrollIntoViewIfNeeded();
    const box = await button.boundingBox();
    expect(box!.height).toBeGreaterThanOrEqual(44);
    expect(box!.width).toBeGreaterThan(300); // the width of the phone, easy to hit with a thumb
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
    await keepScreenshot(page.locator('#show-entry'), 'peoples-choice-vote-button.png');
    await keepScreenshot(page, 'peoples-choice-page-phone.png');

    const [posted] = await Promise.all([page.waitForResponse((r) => r.url().includes(`/c/${car1}/vote?show=`)), button.click()]);
    expect(posted.status()).toBe(303);
    await page.getByText('Thank you for voting.').waitFor();
    expect(page.url()).toMatch(new RegExp(`^${env.baseUrl}/c/${car1}\\?show=meet-[0-9a-f]{8}#vote-meet-[0-9a-f]{8}$`));
    expect(await page.getByText(/went to this car/).count()).toBe(1);
    expect(await page.getByRole('button', { name: 'Vote for this car' }).count()).toBe(0);
    await keepScreenshot(page.locator('#show-entry'), 'peoples-choice-thanks.png');

    // The tab opened before the vote still shows its button; pressing it is refused in words.
    const [refused] = await Promise.all([otherTab.waitForResponse((r) => r.url().includes(`/c/${car2}/vote?show=`)), otherTab.getByRole('button', { name: 'Vote for this car' }).click()]);
    expect(refused.status()).toBe(409);
    await otherTab.getByRole('heading', { name: 'You have already voted' }).waitFor();
    expect(await otherTab.getByText(/for entry 1\./).count()).toBe(1);
    await keepScreenshot(otherTab, 'peoples-choice-refused.png');
    await otherTab.getByRole('link', { name: 'Back to the car' }).click();
    await otherTab.getByText(/went to entry 1/).waitFor();
    await phone.close();

    // The organiser's panel: one vote for car 1, one address; voiding it asks first.
    const desk = await env.browser.newContext({ viewport: { width: 1100, height: 900 } });
    const org = await desk.newPage();
    await openSignedIn(org, env.baseUrl, show.organiser.email, DEFAULT_PASSWORD, `/shows/${show.eventId}`);
    const panel = org.locator('section', { has: org.getByRole('heading', { name: 'People’s choice', exact: true }) });
    await panel.getByRole('row', { name: /First car/ }).waitFor();
    expect(await panel.getByRole('row', { name: /First car/ }).innerText()).toMatch(/^1\s+First car\s*leading\s+Hot rods\s+1$/i);
    expect(await panel.getByText(/^1 vote counted/).count()).toBe(1);
    // The panel says what the limits stop and what they cannot; one vote is no burst.
    const bursts = panel.locator('section', { has: org.getByRole('heading', { name: 'Bursts of new voters' }) });
    expect(await bursts.getByText('No bursts so far.').count()).toBe(1);
    expect(await bursts.getByText(/at most 10 counted votes every 10 minutes/).count()).toBe(1);
    expect(await bursts.getByText(/changes network .* counts as a new address/).count()).toBe(1);
    await panel.scrollIntoViewIfNeeded();
    await keepScreenshot(panel, 'peoples-choice-organiser.png');

    await panel.getByRole('button', { name: /^Void the votes of [0-9a-f]{10}$/ }).click();
    const dialog = org.getByRole('dialog', { name: 'Void these votes?' });
    await dialog.getByText(/1 vote from address [0-9a-f]{10} will stop counting/).waitFor();
    await dialog.getByRole('button', { name: 'Void the votes' }).click();
    await panel.getByText('1 vote voided.', { exact: true }).waitFor();
    expect(await panel.getByRole('row', { name: /First car/ }).innerText()).toMatch(/\s0$/);
    await panel.getByRole('button', { name: 'Close voting' }).click();
    await panel.getByRole('button', { name: 'Reopen voting' }).waitFor();
    await keepScreenshot(panel, 'peoples-choice-organiser-voided.png');
    await desk.close();
  });
});
