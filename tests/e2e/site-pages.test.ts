import { describe, expect, it } from 'vitest';
import { randomUUID } from 'node:crypto';
import { keepScreenshot, useBrowserAndServer } from '../support/browser';
import { createUser } from '../support/factories';
import { createFullBuild } from '../support/build-factory';
import { storePhotosForBuild } from '@server/services/media/photos';
import { jpegWithGps } from '../support/images';

const env = useBrowserAndServer();

describe('the home page and the list of builds, with JavaScript turned off', () => {
  it.each([
    ['phone', { width: 390, height: 844 }, true],
    ['desktop', { width: 1366, height: 900 }, false],
  ] as const)('on a %s: the home page reads whole, the search finds a build by title and style, and a tile opens it', async (device, viewport, isMobile) => {
    const tag = randomUUID().slice(0, 6);
    const { user } = await createUser({ name: 'Ines Vardy' });
    const build = await createFullBuild(user.id, { title: `Dusk Runner ${tag}` });
    await storePhotosForBuild(build.id, [{ buffer: await jpegWithGps(), originalName: 'cover.jpg' }]);

    const context = await env.browser.newContext({ javaScriptEnabled: false, viewport, isMobile, deviceScaleFactor: isMobile ? 2 : 1 });
    const page = await context.newPage();
    const res = await page.goto(`${env.baseUrl}/`);
    expect(res?.status()).toBe(200);
    expect(await page.locator('script').count()).toBe(0);
    await expect.poll(() => page.getByRole('heading', { level: 1 }).innerText()).toMatch(/the whole build, one scan away/i);
    for (const name of ['Owners', 'Visitors', 'Organisers', 'Builds on Placard', 'Shows taking entries']) {
      expect(await page.getByRole('heading', { name, exact: true }).count(), name).toBe(1);
    }
    expect(await page.getByRole('link', { name: /Dusk Runner/ }).count()).toBeGreaterThan(0);
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(viewport.width);
    await keepScreenshot(page, `home-no-js-${device}.png`, { fullPage: true });

    // The form works without script: a plain GET to /c.
    await page.getByRole('searchbox', { name: 'Title' }).fill(tag);
    await page.getByRole('combobox', { name: 'Style' }).selectOption({ label: 'Hot rod' });
    await page.getByRole('button', { name: 'Find builds' }).click();
    await page.waitForURL(/\/c\?q=/);
    await expect.poll(() => page.getByText(/build(s)? matching/).innerText()).toMatch(/^0 builds matching/);
    await page.getByRole('combobox', { name: 'Style' }).selectOption({ label: 'Any style' });
    await page.getByRole('button', { name: 'Find builds' }).click();
    await expect.poll(() => page.getByText(/build(s)? matching/).innerText()).toMatch(/^1 build matching/);
    await keepScreenshot(page, `build-list-no-js-${device}.png`, { fullPage: true });

    await page.getByRole('link', { name: /Dusk Runner/ }).click();
    await page.waitForURL(new RegExp(`/c/${build.code}`));
    await expect.poll(() => page.getByRole('heading', { level: 1 }).innerText()).toMatch(/Dusk Runner/i);
    await context.close();
  });
});
