import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { keepScreenshot, useBrowserAndServer } from '../support/browser';
import { createUser } from '../support/factories';
import { createFullBuild } from '../support/build-factory';

const env = useBrowserAndServer();

/** What a screen reader user would be told: the tab's title and the focused element. */
const EMAIL_MESSAGE = 'Enter a valid e-mail address.';

const focused = (page: Page) => page.evaluate(() => `${document.activeElement?.tagName ?? ''} ${document.activeElement?.textContent?.trim() ?? ''}`);

describe('screen titles, focus after navigation and a safe editor address', () => {
  it('names each screen in the tab title, moves the focus to the new heading, and never asks for /api/builds/NaN', async () => {
    const { user, email, password } = await createUser({ name: 'Orla Fenwick' });
    const build = await createFullBuild(user.id, { title: 'Low Tide Roadster' });
    const context = await env.browser.newContext({ viewport: { width: 390, height: 844 }, locale: 'en-GB' });
    const page = await context.newPage();
    const apiCalls: string[] = [];
    page.on('request', (r) => {
      if (new URL(r.url()).pathname.startsWith('/api/')) apiCalls.push(new URL(r.url()).pathname);
    });

    // The first screen of a visit takes its title; the focus stays where the browser starts.
    await page.goto(`${env.baseUrl}/sign-in?next=${encodeURIComponent('/builds')}`);
    await expect.poll(() => page.title()).toBe('Sign in · Placard');
    expect(await focused(page)).not.toMatch(/^H1/);
    // Sign-in checks its fields with the shared schema (loaded on demand): each field says what is wrong,
    // the first one in trouble takes the focus, and a message goes once its field is changed.
    await page.getByLabel('E-mail').fill('not an address');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await expect.poll(() => page.getByRole('alert').allTextContents()).toEqual([EMAIL_MESSAGE, 'Password is required.']);
    await expect.poll(() => focused(page)).toBe('INPUT ');
    expect(await page.evaluate(() => (document.activeElement as HTMLInputElement).name)).toBe('email');
    await keepScreenshot(page, 'sign-in-field-errors-phone.png');
    await page.getByLabel('E-mail').fill(email);
    await expect.poll(() => page.getByRole('alert').allTextContents()).toEqual(['Password is required.']);
    await page.getByLabel('Password').fill(password);
    await page.getByRole('button', { name: 'Sign in' }).click();

    // After each move inside the app: the new title, and the focus on the new heading.
    await page.waitForURL(`${env.baseUrl}/builds`);
    await expect.poll(() => page.title()).toBe('My builds · Placard');
    await expect.poll(() => focused(page)).toBe('H1 My builds');

    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Shows' }).click();
    await expect.poll(() => page.title()).toBe('Shows · Placard');
    await expect.poll(() => focused(page)).toBe('H1 Shows');

    // A lazily loaded screen whose heading waits for its data: the build's own name.
    await page.goBack();
    await page.getByRole('link', { name: /Low Tide Roadster/ }).first().click();
    await expect.poll(() => page.title()).toBe('Low Tide Roadster · Placard');
    await expect.poll(() => focused(page)).toBe('H1 Low Tide Roadster');
    await keepScreenshot(page, 'editor-heading-focused-phone.png');

    // The photo upload control shows a focus ring when the keyboard reaches it.
    const photos = page.locator('#section-photos');
    const choose = photos.locator('label', { hasText: 'Choose photos' });
    await page.keyboard.press('Shift+Tab');
    await photos.locator('input[type=file]').focus();
    await expect.poll(() => choose.evaluate((el) => `${getComputedStyle(el).outlineStyle} ${getComputedStyle(el).outlineWidth}`)).toBe('solid 3px');
    await choose.scrollIntoViewIfNeeded();
    await keepScreenshot(photos, 'photo-upload-focus-ring-phone.png');

    // An address that is not a build's: a plain message, and no request for build "NaN".
    apiCalls.length = 0;
    await page.goto(`${env.baseUrl}/builds/not-a-number`);
    await expect.poll(() => page.getByText('That is not a build’s address.').count()).toBe(1);
    expect(apiCalls.filter((p) => p.startsWith('/api/builds/'))).toEqual([]);

    // The judge's home names itself even with nothing to judge.
    await page.goto(`${env.baseUrl}/judge`);
    await expect.poll(() => page.getByText('Nothing to judge now').count()).toBe(1);
    await expect.poll(() => page.title()).toBe('Shows to judge · Placard');
    await keepScreenshot(page, 'judge-home-empty-phone.png');

    // On a desk: the editor overlays the newest two dyno runs in the public page's chart.
    await page.setViewportSize({ width: 1366, height: 900 });
    await page.goto(`${env.baseUrl}/builds/${build.id}`);
    const chart = page.getByTestId('dyno-chart').getByRole('img', { name: /Dyno curves/ });
    await expect.poll(() => chart.locator('path').count()).toBe(4);
    await page.locator('#section-dyno').scrollIntoViewIfNeeded();
    await keepScreenshot(page.locator('#section-dyno'), 'editor-dyno-two-runs-desktop.png');
    await context.close();
  });
});
