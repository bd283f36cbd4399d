import { describe, expect, it } from 'vitest';
import type { Locator, Page } from 'playwright-core';
import { keepScreenshot, openSignedIn, useBrowserAndServer } from '../support/browser';
import { createUser } from '../support/factories';
import { createFullBuild } from '../support/build-factory';

const env = useBrowserAndServer();

async function box(locator: Locator) {
  const b = await locator.boundingBox();
  if (!b) throw new Error('not laid out');
  return { left: b.x, right: b.x + b.width, top: b.y, bottom: b.y + b.height };
}

/** Every "Remove" button of a panel lies wholly inside the panel's box. */
async function expectRemoveButtonsInside(page: Page, sectionId: string) {
  const section = page.locator(`#section-${sectionId}`);
  const panel = await box(section);
  const buttons = section.getByRole('button', { name: /^Remove/ });
  expect(await buttons.count()).toBeGreaterThan(0);
  for (const button of await buttons.all()) {
    const b = await box(button);
    expect(b.left, `${sectionId}: Remove starts inside the panel`).toBeGreaterThanOrEqual(panel.left);
    expect(b.right, `${sectionId}: Remove ends inside the panel (panel ends at ${panel.right})`).toBeLessThanOrEqual(panel.right);
  }
  return panel;
}

const LONG_VALUE =
  'Twelve-circuit harness drawn up by the owner, every wire labelled at both ends, run in braided loom along the inner frame rail, fused behind the glovebox door, with a spare circuit for the trailer plug';

const LONG_ROLE = 'Paint, bodywork, pinstriping and gold-leaf lettering';
// No space to wrap at: the page must still not widen on a phone.
const LONG_ADDRESS = 'https://coachwork-notes.example/builds/the-long-roof-wagon-restoration-diary-part-eleven';

describe('credits and extra lines in the build editor', () => {
  it('keeps the Remove buttons inside their panel at 1024, 1366 and 1920 px and on a phone, and wraps long values', async () => {
    const { user, email, password } = await createUser({ name: 'Petra Vandell' });
    const build = await createFullBuild(user.id, { published: false });
    const editorPath = `/builds/${build.id}`;
    const context = await env.browser.newContext({ viewport: { width: 1024, height: 900 }, locale: 'en-GB' });
    const page = await context.newPage();
    const writes: string[] = [];
    page.on('request', (r) => {
      if (r.method() !== 'GET' && r.url().includes('/api/builds/')) writes.push(`${r.method()} ${r.url()}`);
    });
    await openSignedIn(page, env.baseUrl, email, password, editorPath);

    // Opening a full build sheet changes nothing: every panel reads as stored, none waits to save.
    const statuses = page.locator('form[aria-label] [role=status]');
    await expect.poll(() => statuses.count()).toBeGreaterThanOrEqual(10);
    const shown = await statuses.allTextContents();
    expect(shown.filter((t) => t !== 'Saved' && t !== 'Not filled in yet')).toEqual([]);
    expect(writes).toEqual([]);

    const extra = page.getByRole('form', { name: 'Extra lines' });
    await extra.getByRole('button', { name: 'Add a line' }).click();
    await extra.getByLabel('Label').last().fill('Wiring');
    await extra.getByLabel('Value').last().fill(LONG_VALUE);
    await extra.getByRole('button', { name: 'Add a line' }).click();
    await extra.getByLabel('Label').last().fill('Build diary');
    await extra.getByLabel('Value').last().fill(LONG_ADDRESS);
    await expect.poll(() => extra.getByRole('status').textContent()).toBe('Saved');
    const creditsForm = page.getByRole('form', { name: 'Credits' });
    await creditsForm.getByRole('button', { name: 'Add a credit' }).click();
    await creditsForm.getByLabel('Role').last().fill(LONG_ROLE);
    await creditsForm.getByLabel('Name').last().fill('Marrow Lane Coachworks');
    await expect.poll(() => creditsForm.getByRole('status').textContent()).toBe('Saved');
    // Extra lines carry no "Made by" or "Why this choice": those belong to the spec sections.
    expect(await extra.getByLabel('Made by').count()).toBe(0);
    expect(await extra.getByLabel('Why this choice').count()).toBe(0);
    expect(await page.getByRole('form', { name: 'Engine' }).getByLabel('Made by').count()).toBe(1);

    for (const width of [1024, 1366, 1920, 390]) {
      await page.setViewportSize({ width, height: width < 600 ? 844 : 900 });
      const credits = await expectRemoveButtonsInside(page, 'credits');
      const lines = await expectRemoveButtonsInside(page, 'extra');
      if (width >= 1024) {
        // Beside the numbers panel, never under it.
        const numbers = await box(page.getByTestId('numbers-panel'));
        expect(credits.right).toBeLessThanOrEqual(numbers.left);
        expect(lines.right).toBeLessThanOrEqual(numbers.left);
      }
      // Every box shows its whole text: nothing runs past a one-line box's edge or out of a text area's sight.
      for (const sectionId of ['credits', 'extra']) {
        const boxes = await page.locator(`#section-${sectionId}`).locator('input:not([type=hidden]), textarea').evaluateAll((els) =>
          els.map((el) => ({ text: (el as HTMLInputElement).value, wide: el.scrollWidth <= el.clientWidth + 1, tall: el.scrollHeight <= el.clientHeight + 1 })),
        );
        expect(boxes.filter((b) => !b.wide || !b.tall).map((b) => b.text), `at ${width} px in ${sectionId}`).toEqual([]);
      }
      // Nothing, not even a web address with no space in it, makes the page scroll sideways.
      expect(await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth), `at ${width} px`).toBeLessThanOrEqual(0);
      // The long value is shown whole: its box grew to hold the text, nothing scrolls out of sight.
      const value = extra.getByLabel('Value').nth(-2);
      const fit = await value.evaluate((el) => ({ scroll: el.scrollHeight, client: el.clientHeight, width: el.clientWidth }));
      expect(fit.scroll, `at ${width} px the value's text fits its box`).toBeLessThanOrEqual(fit.client + 1);
      expect(fit.client, `at ${width} px the value's box is taller than one line`).toBeGreaterThan(44);
      await keepScreenshot(page.locator('#section-extra'), `build-editor-extra-lines-${width}.png`);
      await keepScreenshot(page.locator('#section-credits'), `build-editor-credits-${width}.png`);
    }

    // After a reload the long value is stored and shown whole.
    await page.reload();
    await expect.poll(() => extra.getByLabel('Value').nth(-2).inputValue()).toBe(LONG_VALUE);
    expect(await extra.getByLabel('Value').last().inputValue()).toBe(LONG_ADDRESS);
    await context.close();
  }, 120_000);
});
