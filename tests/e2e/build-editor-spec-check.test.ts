import { describe, expect, it } from 'vitest';
import type { Locator } from 'playwright-core';
import { keepScreenshot, openSignedIn, useBrowserAndServer } from '../support/browser';
import { createUser } from '../support/factories';
import { createBuild } from '../support/build-factory';

const env = useBrowserAndServer();

const WHY = /^A measured figure means more with the day it was measured/;

async function measured(form: Locator, label: string, value: string) {
  await form.getByLabel(label, { exact: true }).fill(value);
  await form.getByLabel(`${label}: measured, estimated or target`).selectOption('measured');
}

describe('spec-check messages in the build editor', () => {
  it('name the section and field, and say a shared explanation once', async () => {
    const { user, email, password } = await createUser({ name: 'Noor Halvard' });
    const build = await createBuild(user.id, { title: 'The Flint Gasser' });
    const context = await env.browser.newContext({ viewport: { width: 1366, height: 900 }, locale: 'en-GB' });
    const page = await context.newPage();
    await openSignedIn(page, env.baseUrl, email, password, `/builds/${build.id}`);

    // Two figures marked measured, neither with a date.
    const engine = page.getByRole('form', { name: 'Engine' });
    await measured(engine, 'Flywheel power', '300');
    await measured(engine, 'Flywheel torque', '520');
    const panel = page.getByTestId('numbers-panel');
    await expect.poll(() => panel.getByTestId('spec-check-message').allTextContents()).toEqual([
      'Engine · flywheel power: This measured figure has no date.',
      'Engine · flywheel torque: This measured figure has no date.',
    ]);
    // The explanation is said once in the panel; beside each field it waits behind "Why?".
    expect(await panel.getByText(WHY).count()).toBe(1);
    const notes = engine.locator('details').filter({ hasText: 'A measured figure means more' });
    expect(await notes.count()).toBe(2);
    expect(await engine.getByText(WHY).first().isVisible()).toBe(false);
    await notes.first().getByText('Why?').click();
    await expect.poll(() => engine.getByText(WHY).first().isVisible()).toBe(true);
    await keepScreenshot(panel, 'build-editor-spec-check-panel-desktop.png');
    await engine.getByLabel('Flywheel power', { exact: true }).scrollIntoViewIfNeeded();
    await keepScreenshot(page, 'build-editor-spec-check-field-desktop.png');

    await page.setViewportSize({ width: 390, height: 844 });
    await engine.getByLabel('Flywheel torque', { exact: true }).scrollIntoViewIfNeeded();
    await keepScreenshot(page, 'build-editor-spec-check-field-phone.png');
    await context.close();
  }, 120_000);
});
