import { describe, expect, it } from 'vitest';
import { keepScreenshot, openSignedIn, useBrowserAndServer } from '../support/browser';
import { createUser, DEFAULT_PASSWORD } from '../support/factories';
import { createFullBuild } from '../support/build-factory';
import { createLogPost } from '@server/services/builds/build-log';
import { createAnsweredQuestion } from '@server/services/builds/build-questions';
import { checkPageVersionOnEveryRequest } from '../support/page-cache';

const env = useBrowserAndServer();
// The visitor's reload must see the answer just given, not the page trusted for its usual second.
checkPageVersionOnEveryRequest();

describe('a visitor asks on a phone without script; the owner answers in the editor', () => {
  it('the question waits in the owner’s inbox, is answered there, and shows on the page', async () => {
    const { user, email } = await createUser({ name: 'Tamsin Reeve' });
    const build = await createFullBuild(user.id, { title: 'Harbour Grey Roadster' });
    await createLogPost(build, { postedOn: '2025-04-12', title: 'Frame back from the welder', body: 'Boxed rails and a new *centre* crossmember.', status: 'published', photoIds: [], dynoRunId: null, weighInId: null });
    await createAnsweredQuestion(build, { question: 'Is it drivable?', answer: 'Every weekend it does not rain.', askedCount: 5 });

    const phone = await env.browser.newContext({ javaScriptEnabled: false, viewport: { width: 390, height: 844 }, deviceScaleFactor: 2, isMobile: true, locale: 'en-GB' });
    const page = await phone.newPage();
    await page.goto(`${env.baseUrl}/c/${build.code}`);
    expect(await page.locator('script').count()).toBe(0);
    await page.getByRole('heading', { name: 'Build log' }).waitFor();
    expect(await page.getByText('Frame back from the welder').count()).toBe(1);
    await keepScreenshot(page.locator('#log'), 'build-log-section-phone.png');
    const box = page.getByLabel('Ask the owner a question');
    await box.scrollIntoViewIfNeeded();
    // The honeypot is out of sight and out of the tab order; nothing on the page scrolls sideways.
    const honeypot = (await page.locator('input[name="website"]').boundingBox())!;
    expect(honeypot.x + honeypot.width).toBeLessThanOrEqual(0);
    expect(await page.locator('input[name="website"]').getAttribute('tabindex')).toBe('-1');
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
    const send = page.getByRole('button', { name: 'Send the question' });
    expect((await send.boundingBox())!.height).toBeGreaterThanOrEqual(44);
    await keepScreenshot(page.locator('#questions'), 'build-questions-ask-phone.png');
    await box.fill('What tyres are those, and are they hard to find?');
    const [posted] = await Promise.all([page.waitForResponse((r) => r.url().endsWith(`/c/${build.code}/questions`)), send.click()]);
    expect(posted.status()).toBe(303);
    await page.getByRole('heading', { name: 'Question sent' }).waitFor();
    await keepScreenshot(page, 'build-questions-sent-phone.png');
    await page.getByRole('link', { name: 'Back to the build' }).first().click();
    await page.getByRole('heading', { name: 'Questions people ask' }).waitFor();
    expect(await page.getByText('What tyres are those').count()).toBe(0);

    // The owner, on a phone with script, finds it waiting in the editor and answers it.
    const ownerPhone = await env.browser.newContext({ viewport: { width: 390, height: 844 }, deviceScaleFactor: 2, isMobile: true, hasTouch: true });
    const editor = await ownerPhone.newPage();
    await openSignedIn(editor, env.baseUrl, email, DEFAULT_PASSWORD, `/builds/${build.id}`);
    const panel = editor.locator('section#section-questions');
    await panel.getByRole('heading', { name: 'Questions (1 waiting)' }).waitFor();
    await panel.scrollIntoViewIfNeeded();
    await keepScreenshot(panel, 'build-questions-inbox-phone.png');
    await panel.getByRole('button', { name: 'Answer: What tyres are those, and are they hard to find?' }).click();
    const form = panel.getByRole('form', { name: 'Answer: What tyres are those, and are they hard to find?' });
    await form.getByLabel('Answer').fill('Radials made for older cars; any *good* tyre dealer can order them.');
    await form.getByLabel('Times asked').fill('9');
    await form.getByRole('button', { name: 'Publish the answer' }).click();
    await panel.getByRole('heading', { name: 'Questions', exact: true }).waitFor();
    expect(await panel.getByText('No questions waiting.').count()).toBe(1);
    await keepScreenshot(panel, 'build-questions-answered-phone.png');
    await ownerPhone.close();

    // Back on the visitor's phone: the answer is on the page, first because it is the most asked.
    await page.reload();
    const answers = page.locator('#questions dt');
    await answers.first().waitFor();
    expect(await answers.allInnerTexts()).toEqual(['What tyres are those, and are they hard to find? · asked 9 times', 'Is it drivable? · asked 5 times']);
    expect(await page.locator('#questions em', { hasText: 'good' }).count()).toBe(1);
    await keepScreenshot(page, 'build-questions-page-phone.png');
    await phone.close();
  });
});
