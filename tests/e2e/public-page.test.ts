import { describe, expect, it } from 'vitest';
import { keepScreenshot, useBrowserAndServer } from '../support/browser';
import { createUser } from '../support/factories';
import { createFullBuild } from '../support/build-factory';
import { storePhotosForBuild } from '@server/services/media/photos';
import { jpegWithGps, sidewaysJpeg } from '../support/images';

const env = useBrowserAndServer();

describe('the public build page on a phone', () => {
  it('reads whole with JavaScript turned off, and the units switch still works', async () => {
    const { user } = await createUser({ name: 'Rowan Teller' });
    const build = await createFullBuild(user.id);
    await storePhotosForBuild(build.id, [{ buffer: await jpegWithGps(), originalName: 'cover.jpg' }]);
    const context = await env.browser.newContext({ javaScriptEnabled: false, viewport: { width: 390, height: 844 }, deviceScaleFactor: 2, isMobile: true, locale: 'en-US' });
    const page = await context.newPage();
    const res = await page.goto(`${env.baseUrl}/c/${build.code}`);
    expect(res?.status()).toBe(200);
    expect(await page.locator('script').count()).toBe(0);
    await expect.poll(() => page.getByRole('heading', { level: 1 }).innerText()).toMatch(/1969 Night Shift/i);
    for (const name of ['Engine', 'Drivetrain', 'Chassis and suspension', 'Brakes', 'Wheels and tyres', 'Body and interior', 'Dyno', 'Credits']) {
      expect(await page.getByRole('heading', { name, exact: true }).count(), name).toBe(1);
    }
    expect(await page.getByText('275/35R18').count()).toBeGreaterThan(0);
    expect(await page.getByText(/3,415\s*lb/).count()).toBeGreaterThan(0);
    // Nothing wider than the phone.
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
    await keepScreenshot(page, 'public-page-phone.png', { fullPage: true });

    await page.getByRole('link', { name: 'Metric', exact: true }).click();
    await page.waitForURL(/units=metric/);
    expect(await page.getByText(/1,549\s*kg/).count()).toBeGreaterThan(0);
    await keepScreenshot(page, 'public-page-phone-top.png');
    await context.close();
  });

  it('keeps the title and the first figures on the first screen under a portrait cover, opens photos larger on a tap, and reads the dyno runs without sideways scrolling', async () => {
    const { user } = await createUser({ name: 'Rowan Teller' });
    const build = await createFullBuild(user.id);
    // Shot sideways: the stored cover is portrait (1000 × 1600 upright).
    await storePhotosForBuild(build.id, [
      { buffer: await sidewaysJpeg(), originalName: 'tall.jpg' },
      { buffer: await jpegWithGps(), originalName: 'second.jpg' },
    ]);
    const context = await env.browser.newContext({ javaScriptEnabled: false, viewport: { width: 390, height: 844 }, deviceScaleFactor: 2, isMobile: true, locale: 'en-GB' });
    const page = await context.newPage();
    await page.goto(`${env.baseUrl}/c/${build.code}`);
    const firstFigure = await page.locator('.fig > div').first().boundingBox();
    const title = await page.getByRole('heading', { level: 1 }).boundingBox();
    expect(title!.y + title!.height).toBeLessThan(844);
    expect(firstFigure!.y + firstFigure!.height).toBeLessThan(844);
    await keepScreenshot(page, 'public-page-portrait-cover-phone.png');

    // British English: kilograms, with power in hp.
    await expect.poll(() => page.locator('.fig > div').first().innerText()).toMatch(/hp/);
    expect(await page.getByText(/1,549\s*kg/).count()).toBeGreaterThan(0);

    const dyno = page.locator('#dyno');
    await dyno.scrollIntoViewIfNeeded();
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
    await keepScreenshot(dyno, 'public-page-dyno-phone.png');

    const photoLinks = page.locator('a.big');
    expect(await photoLinks.count()).toBe(2);
    const href = await photoLinks.nth(1).getAttribute('href');
    expect(href).toMatch(/\/media\/photos\/[0-9a-f]{32}-\d+\.jpg$/);
    await photoLinks.nth(1).click();
    await page.waitForURL(/\/media\/photos\//);
    await context.close();
  });
});
