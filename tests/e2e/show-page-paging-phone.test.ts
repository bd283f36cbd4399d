import { describe, expect, it } from 'vitest';
import { keepScreenshot, useBrowserAndServer } from '../support/browser';
import { bigShow } from '../support/big-show';

const env = useBrowserAndServer();

describe('a big show’s public page on a phone with no script', () => {
  it('pages through one class and finds a car by number or title with the plain links and form', async () => {
    const show = await bigShow(300);
    const phone = await env.browser.newContext({ viewport: { width: 390, height: 844 }, javaScriptEnabled: false });
    const page = await phone.newPage();
    await page.goto(`${env.baseUrl}/e/${show.slug}`);
    await expect.poll(() => page.getByRole('status').textContent()).toContain('300 cars · 1–50 shown, page 1 of 6');
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
    await keepScreenshot(page, 'show-page-first-view-phone.png', { fullPage: false });

    // One class, then its next page, by the page's own links.
    await page.getByRole('list', { name: 'Classes' }).getByRole('link', { name: 'Customs' }).click();
    await expect.poll(() => page.getByRole('status').textContent()).toContain('100 cars in Customs · 1–50 shown, page 1 of 2');
    await page.getByRole('link', { name: 'Next →' }).click();
    await expect.poll(() => page.getByRole('status').textContent()).toContain('100 cars in Customs · 51–100 shown, page 2 of 2');
    expect(await page.locator('ol.entries li').first().textContent()).toContain('Field car 152');

    // The form keeps the class chosen; a number finds its car.
    await page.getByLabel('Find a car by title or number').fill('155');
    await page.getByRole('button', { name: 'Find' }).click();
    await expect.poll(() => page.getByRole('status').textContent()).toContain('1 car matches “155” in Customs');
    await page.getByLabel('Class', { exact: true }).selectOption({ label: 'Every class' });
    await page.getByLabel('Find a car by title or number').fill('field car 29');
    await page.getByRole('button', { name: 'Find' }).click();
    // 29 and 290–299, in class order.
    await expect.poll(() => page.getByRole('status').textContent()).toContain('11 cars match “field car 29”');
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
    await keepScreenshot(page, 'show-page-search-phone.png', { fullPage: true });
    // Each car links to its own page (at the public address the suite names, not this server's).
    expect(await page.getByRole('link', { name: 'Field car 29', exact: true }).getAttribute('href')).toMatch(/\/c\/[A-Z0-9]{7}$/);
    await phone.close();
  });
});
