import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { keepScreenshot, openSignedIn, useBrowserAndServer } from '../support/browser';
import { createUser } from '../support/factories';
import { createBuild } from '../support/build-factory';

const env = useBrowserAndServer();

/** The engine section as the API stores it (the browser's own session). */
async function storedEngine(page: Page, buildId: number) {
  const res = await page.request.get(`${env.baseUrl}/api/builds/${buildId}`);
  expect(res.status()).toBe(200);
  const body = (await res.json()) as { build: { sections: { engine?: { bore?: { value: number; unit: string }; exhaust?: string } } } };
  return body.build.sections.engine ?? {};
}

const VIEWPORTS = [
  { name: 'phone', viewport: { width: 390, height: 844 } },
  { name: 'desktop', viewport: { width: 1366, height: 900 } },
] as const;

describe('leaving the build editor never drops an edit', () => {
  for (const { name, viewport } of VIEWPORTS) {
    it(`saves a figure changed just before "← My builds", and says so when a value will not save (${name})`, async () => {
      const { user, email, password } = await createUser({ name: 'Ivo Marrant' });
      const build = await createBuild(user.id, { title: 'The Slate Roadster' });
      const editorPath = `/builds/${build.id}`;
      const context = await env.browser.newContext({ viewport, locale: 'en-GB' });
      const page = await context.newPage();
      const pageErrors: string[] = [];
      page.on('pageerror', (err) => pageErrors.push(err.message));
      await openSignedIn(page, env.baseUrl, email, password, editorPath);

      // Change a figure and leave at once: no pause for the autosave, no Save button.
      const engine = page.getByRole('form', { name: 'Engine' });
      await engine.getByLabel('Bore unit').selectOption('mm');
      await engine.getByLabel('Bore', { exact: true }).fill('101.6');
      await page.getByRole('link', { name: '← My builds' }).click();
      await page.waitForURL(`${env.baseUrl}/builds`);
      expect((await storedEngine(page, build.id)).bore).toMatchObject({ value: 101.6, unit: 'mm' });

      // Back in the editor after a reload, the figure is there.
      await page.goto(`${env.baseUrl}${editorPath}`);
      await page.reload();
      await expect.poll(() => page.getByRole('form', { name: 'Engine' }).getByLabel('Bore', { exact: true }).inputValue()).toBe('101.6');
      await expect.poll(() => engine.getByRole('status').textContent()).toBe('Saved');

      // A bore out of range is not sent: the panel says why, on the field and in its status.
      await engine.getByLabel('Bore', { exact: true }).fill('2000');
      await expect.poll(() => engine.getByRole('status').textContent()).toMatch(/^● Not saved: Bore must be between 20 and 200 mm\.$/);
      await expect.poll(() => engine.getByRole('alert').filter({ hasText: 'Bore must be between 20 and 200 mm.' }).count()).toBeGreaterThan(0);
      // The line kept in view beside the sections says so too, wherever the owner has scrolled.
      const summary = page.locator('[data-testid=save-summary]:visible');
      await expect.poll(() => summary.textContent()).toBe('● Not saved: Engine');
      await engine.scrollIntoViewIfNeeded();
      await keepScreenshot(page, `build-editor-not-saved-${name}.png`);

      // Leaving with it names the panel and why, and staying keeps the edit in the box.
      await page.getByRole('link', { name: '← My builds' }).click();
      const dialog = page.getByRole('dialog');
      await expect.poll(() => dialog.textContent()).toContain('Engine: Bore must be between 20 and 200 mm.');
      await keepScreenshot(page, `build-editor-leave-not-saved-${name}.png`);
      await dialog.getByRole('button', { name: 'Stay and fix' }).click();
      expect(new URL(page.url()).pathname).toBe(editorPath);
      await expect.poll(() => engine.getByLabel('Bore', { exact: true }).inputValue()).toBe('2000');
      // The keyboard is on the field to fix, not left on the link.
      await expect.poll(() => engine.getByLabel('Bore', { exact: true }).evaluate((el) => el === document.activeElement)).toBe(true);
      expect((await storedEngine(page, build.id)).bore).toMatchObject({ value: 101.6 });

      // The summary at the top of the panel lists every error of the panel, not just the first.
      await engine.getByLabel('Stroke', { exact: true }).fill('900');
      const errorList = engine.getByRole('alert').filter({ hasText: 'Not saved yet.' });
      await expect.poll(() => errorList.locator('li').allTextContents()).toEqual(['Bore must be between 20 and 200 mm.', 'Stroke must be between 20 and 200 mm.']);
      await engine.getByLabel('Stroke', { exact: true }).fill('');

      // Fixed, it saves by itself; text typed and left at once is kept as well.
      await engine.getByLabel('Bore', { exact: true }).fill('102');
      await expect.poll(() => engine.getByRole('status').textContent()).toBe('Saved');
      await expect.poll(() => summary.textContent()).toBe('All changes saved');
      await engine.getByLabel('Exhaust').fill('Twin 2.5 in pipes, hand-bent, through bullet mufflers that run the length of the frame rails');
      await page.getByRole('link', { name: '← My builds' }).click();
      await page.waitForURL(`${env.baseUrl}/builds`);
      const stored = await storedEngine(page, build.id);
      expect(stored.bore).toMatchObject({ value: 102, unit: 'mm' });
      expect(stored.exhaust).toBe('Twin 2.5 in pipes, hand-bent, through bullet mufflers that run the length of the frame rails');

      expect(pageErrors).toEqual([]);
      await context.close();
    }, 120_000);
  }

  it('shows the server\'s reason when it refuses a save, on the field and in the status, and keeps the edit', async () => {
    const { user, email, password } = await createUser({ name: 'Ivo Marrant' });
    const build = await createBuild(user.id, { title: 'The Ash Pickup' });
    const context = await env.browser.newContext({ viewport: { width: 1366, height: 900 }, locale: 'en-GB' });
    const page = await context.newPage();
    await openSignedIn(page, env.baseUrl, email, password, `/builds/${build.id}`);
    // The server's answer stands in for a rule only the server knows: its field error is the reason shown.
    const refusal = { error: { code: 'VALIDATION_FAILED', message: 'Check the highlighted fields.', fields: { exhaust: 'Exhaust is refused by the server for this test.' } } };
    await page.route(`**/api/builds/${build.id}/sections/engine`, (route) => route.fulfill({ status: 400, contentType: 'application/json', body: JSON.stringify(refusal) }));

    const engine = page.getByRole('form', { name: 'Engine' });
    await engine.getByLabel('Exhaust').fill('Side pipes');
    await expect.poll(() => engine.getByRole('status').textContent()).toBe('● Not saved: Exhaust is refused by the server for this test.');
    await expect.poll(() => engine.getByRole('alert').filter({ hasText: 'Exhaust is refused by the server for this test.' }).count()).toBeGreaterThan(0);
    await keepScreenshot(page, 'build-editor-server-refused-desktop.png');

    // Leaving says so too; once the server takes it, the edit (still in the box) is stored.
    await page.getByRole('link', { name: '← My builds' }).click();
    await expect.poll(() => page.getByRole('dialog').textContent()).toContain('Engine: Exhaust is refused by the server for this test.');
    await page.getByRole('button', { name: 'Stay and fix' }).click();
    await page.unroute(`**/api/builds/${build.id}/sections/engine`);
    await engine.getByLabel('Exhaust').press('Enter');
    await expect.poll(() => engine.getByRole('status').textContent()).toBe('Saved');
    expect((await storedEngine(page, build.id)).exhaust).toBe('Side pipes');
    await context.close();
  }, 120_000);

  it('keeps both panels when their saves answer out of order', async () => {
    const { user, email, password } = await createUser({ name: 'Ivo Marrant' });
    const build = await createBuild(user.id, { title: 'The Pewter Wagon' });
    const context = await env.browser.newContext({ viewport: { width: 1366, height: 900 }, locale: 'en-GB' });
    const page = await context.newPage();
    await openSignedIn(page, env.baseUrl, email, password, `/builds/${build.id}`);

    // The engine's save reaches the server first, but its answer is held back until the wheels' save has answered.
    let engineSent!: () => void;
    const engineAtServer = new Promise<void>((resolve) => (engineSent = resolve));
    let releaseEngine!: () => void;
    const engineReleased = new Promise<void>((resolve) => (releaseEngine = resolve));
    await page.route(`**/api/builds/${build.id}/sections/engine`, async (route) => {
      const response = await route.fetch();
      engineSent();
      await engineReleased;
      await route.fulfill({ response });
    });
    const engine = page.getByRole('form', { name: 'Engine' });
    const wheels = page.getByRole('form', { name: 'Wheels and tyres' });
    await engine.getByLabel('Cylinders').fill('8');
    await engine.getByLabel('Cylinders').press('Enter');
    await engineAtServer;
    await wheels.getByLabel('Tyre size').nth(0).fill('245/40R18');
    await expect.poll(() => wheels.getByRole('status').textContent()).toBe('Saved');
    releaseEngine();
    await expect.poll(() => engine.getByRole('status').textContent()).toBe('Saved');

    // The engine's older answer did not put the wheels back to empty.
    await expect.poll(() => page.getByTestId('save-summary').locator('visible=true').textContent()).toBe('All changes saved');
    expect(await wheels.getByLabel('Tyre size').nth(0).inputValue()).toBe('245/40R18');
    const res = await page.request.get(`${env.baseUrl}/api/builds/${build.id}`);
    const stored = ((await res.json()) as { build: { sections: { engine?: { cylinders?: number }; wheels?: { front?: { tyreSize?: string } } } } }).build.sections;
    expect(stored.engine?.cylinders).toBe(8);
    expect(stored.wheels?.front?.tyreSize).toBe('245/40R18');
    await context.close();
  }, 120_000);

  it('saves on the browser\'s back button and when the tab is closed', async () => {
    const { user, email, password } = await createUser({ name: 'Ivo Marrant' });
    const build = await createBuild(user.id, { title: 'The Umber Sedan' });
    const context = await env.browser.newContext({ viewport: { width: 390, height: 844 }, locale: 'en-GB' });
    const page = await context.newPage();
    await openSignedIn(page, env.baseUrl, email, password, '/builds');
    await page.getByRole('link', { name: 'The Umber Sedan' }).click();
    await page.waitForURL(`${env.baseUrl}/builds/${build.id}`);

    // Back, at once after typing: the editor saves, then goes back to My builds.
    const engine = page.getByRole('form', { name: 'Engine' });
    await engine.getByLabel('Bore unit').selectOption('mm');
    await engine.getByLabel('Bore', { exact: true }).fill('96');
    await page.goBack();
    // The address changes at once and is put back while the editor saves: wait for My builds itself.
    await page.getByRole('heading', { name: 'My builds' }).waitFor();
    expect(new URL(page.url()).pathname).toBe('/builds');
    expect((await storedEngine(page, build.id)).bore).toMatchObject({ value: 96, unit: 'mm' });

    // Closing the tab at once after typing: the browser asks first, and the save goes out anyway.
    await page.goForward();
    await engine.getByLabel('Bore', { exact: true }).fill('97');
    const dialogs: string[] = [];
    page.on('dialog', (dialog) => {
      dialogs.push(dialog.type());
      void dialog.accept();
    });
    await page.close({ runBeforeUnload: true });
    await expect.poll(() => page.isClosed()).toBe(true);
    expect(dialogs).toEqual(['beforeunload']);
    const checker = await context.newPage();
    await expect.poll(async () => (await storedEngine(checker, build.id)).bore?.value).toBe(97);
    await context.close();
  }, 120_000);
  it('never drops a dyno run or a weigh-in written but not added: leaving names them, and staying keeps them', async () => {
    const { user, email, password } = await createUser({ name: 'Ivo Marrant' });
    const build = await createBuild(user.id, { title: 'The Ochre Pickup' });
    const context = await env.browser.newContext({ viewport: { width: 390, height: 844 }, locale: 'en-GB' });
    const page = await context.newPage();
    await openSignedIn(page, env.baseUrl, email, password, `/builds/${build.id}`);

    await page.getByRole('button', { name: 'Add a dyno run' }).click();
    const run = page.getByRole('form', { name: 'Add a dyno run' });
    await run.getByLabel('Facility').fill('The rolling road behind the grain store');
    await run.getByLabel('Peak power', { exact: true }).fill('312');
    await page.getByRole('button', { name: 'Add a weigh-in' }).click();
    const weighIn = page.getByRole('form', { name: 'Add a weigh-in' });
    await weighIn.getByLabel('LF · Left front').fill('402');
    await expect.poll(() => page.locator('[data-testid=save-summary]:visible').textContent()).toBe('● Not added yet: Dyno run, Weigh-in');

    await page.getByRole('link', { name: '← My builds' }).click();
    const dialog = page.getByRole('dialog', { name: 'Not saved' });
    await dialog.getByText('Dyno run: not added yet. Press “Add the run”, or leave without it.').waitFor();
    await dialog.getByText('Weigh-in: not added yet. Press “Add the weigh-in”, or leave without it.').waitFor();
    await keepScreenshot(page, 'editor-leave-unadded-phone.png');
    await dialog.getByRole('button', { name: 'Stay and fix' }).click();
    expect(new URL(page.url()).pathname).toBe(`/builds/${build.id}`);
    expect(await run.getByLabel('Facility').inputValue()).toBe('The rolling road behind the grain store');
    expect(await weighIn.getByLabel('LF · Left front').inputValue()).toBe('402');

    // Cleared by hand (Cancel), nothing is left to ask about; the weigh-in still holds the owner back.
    await run.getByRole('button', { name: 'Cancel' }).click();
    await expect.poll(() => page.locator('[data-testid=save-summary]:visible').textContent()).toBe('● Not added yet: Weigh-in');
    await page.getByRole('link', { name: '← My builds' }).click();
    await page.getByRole('dialog', { name: 'Not saved' }).getByRole('button', { name: 'Leave without saving' }).click();
    await page.getByRole('heading', { name: 'My builds' }).waitFor();
    await context.close();
  }, 120_000);
});
