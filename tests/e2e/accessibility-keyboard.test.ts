import { beforeAll, describe, expect, it } from 'vitest';
import type { Locator, Page } from 'playwright-core';
import { keepScreenshot, openSignedIn, useBrowserAndServer } from '../support/browser';
import { DEFAULT_PASSWORD } from '../support/factories';
import { judgedShow } from '../support/results-factory';
import { focusInside, tabThrough } from '../support/axe-keyboard';

const env = useBrowserAndServer();

/**
 * The organiser's screens with the keyboard alone: every control takes the focus by Tab and shows
 * it, and a dialog takes the focus when it opens, keeps it while open and gives it back when closed.
 * The show page holds the show's classes, the judging progress and the results; the entries table
 * is its own screen.
 */
describe("the organiser's screens by keyboard", () => {
  let show: Awaited<ReturnType<typeof judgedShow>>;
  beforeAll(async () => {
    show = await judgedShow({ hotRods: ['Keyed roadster', 'Keyed sedan'], customs: ['Keyed coupe'] });
    await show.score(0, 'Keyed roadster', [8, 6, 4]);
    await show.score(0, 'Keyed coupe', [9, 7, 5]);
  });

  const settle = async (page: Page) => {
    await page.locator('main h1').first().waitFor();
    await expect.poll(() => page.getByRole('status').filter({ hasText: /^Loading/ }).count()).toBe(0);
  };

  /**
   * Presses Tab `times` times and says where each press left the focus on the page outside `dialog`.
   * A modal <dialog> lets the focus leave the page for the browser's own toolbar after its last
   * control (the document's body is then the active element), and come back to its first: that is
   * not the page behind.
   */
  const tabsLeaving = async (page: Page, dialog: Locator, times: number) => {
    const out: string[] = [];
    for (let i = 0; i < times; i++) {
      await page.keyboard.press('Tab');
      if (await focusInside(dialog)) continue;
      const outside = await page.evaluate(() => (document.activeElement === document.body ? null : (document.activeElement?.outerHTML.slice(0, 80) ?? null)));
      if (outside) out.push(outside);
    }
    return out;
  };

  it('reaches every control of the show page and the entries table by Tab, each with a visible focus mark', async () => {
    const page = await (await env.browser.newContext({ viewport: { width: 1366, height: 900 } })).newPage();
    await openSignedIn(page, env.baseUrl, show.organiser.email, DEFAULT_PASSWORD, `/shows/${show.eventId}`);
    await settle(page);
    // The screen holds what the organiser runs: the classes, the judging progress and the results.
    for (const name of ['Classes', 'Judging', 'Results']) await page.getByRole('heading', { name, exact: true }).first().waitFor();
    const showPage = await tabThrough(page);
    await page.goto(`${env.baseUrl}/shows/${show.eventId}/entries`);
    await settle(page);
    await page.getByRole('button', { name: 'Keyed sedan' }).waitFor();
    const entries = await tabThrough(page);
    console.log(`keyboard: ${showPage.controls} controls on the show page, ${entries.controls} on the entries table, all reached by Tab`);
    expect(showPage.controls).toBeGreaterThan(20);
    expect(entries.controls).toBeGreaterThan(10);
    expect({ showPage: showPage.unreached, entries: entries.unreached }).toEqual({ showPage: [], entries: [] });
    expect({ showPage: showPage.unmarked, entries: entries.unmarked }).toEqual({ showPage: [], entries: [] });
  });

  it('opens, keeps and gives back the focus in the dialogs: publish results, an entry, and the question inside it', async () => {
    const page = await (await env.browser.newContext({ viewport: { width: 1366, height: 900 } })).newPage();
    await openSignedIn(page, env.baseUrl, show.organiser.email, DEFAULT_PASSWORD, `/shows/${show.eventId}`);
    await settle(page);

    // Publish results: Enter on the button opens the question, Tab stays in it, Escape closes it and the focus is back.
    const publish = page.locator('section', { has: page.getByRole('heading', { name: 'Results', exact: true }) }).getByRole('button', { name: 'Publish results' });
    await publish.focus();
    await page.keyboard.press('Enter');
    const question = page.getByRole('dialog', { name: 'Publish results?' });
    await question.waitFor();
    expect(await focusInside(question)).toBe(true);
    expect(await tabsLeaving(page, question, 6)).toEqual([]);
    await page.keyboard.press('Escape');
    await question.waitFor({ state: 'hidden' });
    await expect.poll(() => publish.evaluate((el) => el === document.activeElement)).toBe(true);

    // An entry of the table: Enter on its title opens it, the keyboard stays inside, the class can be changed with the keyboard.
    await page.goto(`${env.baseUrl}/shows/${show.eventId}/entries`);
    await settle(page);
    const opener = page.getByRole('button', { name: 'Keyed sedan' });
    await opener.focus();
    await page.keyboard.press('Enter');
    const entry = page.getByRole('dialog', { name: /Keyed sedan/ });
    await entry.waitFor();
    expect(await focusInside(entry)).toBe(true);
    expect(await tabsLeaving(page, entry, 12)).toEqual([]);
    await keepScreenshot(page, 'keyboard-entry-dialog.png');

    // The question inside: Enter on Withdraw asks, Escape takes back only the question, the focus returns to Withdraw.
    const withdraw = entry.getByRole('button', { name: 'Withdraw', exact: true });
    await withdraw.focus();
    await page.keyboard.press('Enter');
    const sure = page.getByRole('dialog', { name: 'Withdraw Keyed sedan?' });
    await sure.waitFor();
    expect(await focusInside(sure)).toBe(true);
    expect(await tabsLeaving(page, sure, 4)).toEqual([]);
    await page.keyboard.press('Escape');
    await sure.waitFor({ state: 'hidden' });
    expect(await entry.isVisible()).toBe(true);
    await expect.poll(() => withdraw.evaluate((el) => el === document.activeElement)).toBe(true);

    // Escape closes the entry, and the focus is back on the title it was opened from.
    await page.keyboard.press('Escape');
    await entry.waitFor({ state: 'hidden' });
    await expect.poll(() => opener.evaluate((el) => el === document.activeElement)).toBe(true);
  });
});
