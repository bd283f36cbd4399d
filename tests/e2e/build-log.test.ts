import { describe, expect, it } from 'vitest';
import { keepScreenshot, openSignedIn, useBrowserAndServer } from '../support/browser';
import { createUser, DEFAULT_PASSWORD } from '../support/factories';
import { createFullBuild } from '../support/build-factory';
import { jpegWithGps } from '../support/images';
import { storePhotosForBuild } from '@server/services/media/photos';
import { createLogPost } from '@server/services/builds/build-log';
import { checkPageVersionOnEveryRequest } from '../support/page-cache';

const env = useBrowserAndServer();
// The visitor's reload must see the post the owner just published, not the page trusted for its usual second.
checkPageVersionOnEveryRequest();

describe('the build log: the owner writes a post on a phone; a visitor reads the log without script', () => {
  it('a draft stays off the page until published; the log page lists every post, newest first', async () => {
    const { user, email } = await createUser({ name: 'Odile Marsh' });
    const build = await createFullBuild(user.id, { title: 'Slate Blue Wagon' });
    await storePhotosForBuild(build.id, [{ buffer: await jpegWithGps(), originalName: 'jig.jpg' }], ['On the jig']);
    for (const [i, day] of ['2024-04-06', '2024-09-21', '2025-03-15'].entries()) {
      await createLogPost(build, { postedOn: day, title: `Weekend ${i + 1}`, body: 'Grinding, welding, grinding again.', status: 'published', photoIds: [], dynoRunId: null, weighInId: null });
    }

    const ownerPhone = await env.browser.newContext({ viewport: { width: 390, height: 844 }, deviceScaleFactor: 2, isMobile: true, hasTouch: true });
    const editor = await ownerPhone.newPage();
    await openSignedIn(editor, env.baseUrl, email, DEFAULT_PASSWORD, `/builds/${build.id}`);
    const panel = editor.locator('section#section-log');
    await panel.getByRole('button', { name: 'Write a post' }).click();
    const form = panel.getByRole('form', { name: 'Write a post' });
    await form.getByLabel('Date').fill('2025-08-30');
    await form.getByLabel('Title').fill('Dyno day');
    await form.getByLabel('Text').fill('Three pulls, then *one more* for luck.\n\nThe sheet is with the run.');
    await form.getByRole('checkbox', { name: 'On the jig' }).check();
    await form.getByLabel('About a measurement').selectOption({ label: 'Dyno run of 2026-04-18' });
    await keepScreenshot(form, 'build-log-form-phone.png');
    await form.getByRole('button', { name: 'Add the post' }).click();
    await panel.getByRole('heading', { name: 'Dyno day' }).waitFor();
    expect(await panel.getByText('Draft', { exact: true }).count()).toBe(1);

    // A visitor without script: the draft is not there yet.
    const phone = await env.browser.newContext({ javaScriptEnabled: false, viewport: { width: 390, height: 844 }, deviceScaleFactor: 2, isMobile: true, locale: 'en-GB' });
    const page = await phone.newPage();
    await page.goto(`${env.baseUrl}/c/${build.code}`);
    expect(await page.getByText('Dyno day').count()).toBe(0);

    // The owner publishes it.
    await panel.getByRole('button', { name: 'Edit Dyno day' }).click();
    const edit = panel.getByRole('form', { name: 'Edit “Dyno day”' });
    await edit.getByLabel('Shown').selectOption('published');
    await edit.getByRole('button', { name: 'Save the post' }).click();
    await panel.getByText(/^2025-08-30 · Published/).waitFor();
    await keepScreenshot(panel, 'build-log-panel-phone.png');
    await ownerPhone.close();

    await page.reload();
    const log = page.locator('#log');
    await log.getByRole('heading', { name: 'Dyno day' }).waitFor();
    expect(await log.locator('h3').allInnerTexts()).toEqual(['Dyno day', 'Weekend 3', 'Weekend 2']);
    expect(await log.locator('em', { hasText: 'one more' }).count()).toBe(1);
    expect(await log.getByRole('link', { name: 'the dyno run of 2026-04-18' }).getAttribute('href')).toBe(`/c/${build.code}#dyno`);
    await log.scrollIntoViewIfNeeded();
    await keepScreenshot(log, 'build-log-on-page-phone.png');
    await log.getByRole('link', { name: 'All 4 posts' }).click();
    await page.getByRole('heading', { name: /Build log/ }).waitFor();
    expect(await page.locator('ol.log h3').allInnerTexts()).toEqual(['Dyno day', 'Weekend 3', 'Weekend 2', 'Weekend 1']);
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
    await keepScreenshot(page, 'build-log-page-phone.png', { fullPage: true });
    await phone.close();
  });
});
