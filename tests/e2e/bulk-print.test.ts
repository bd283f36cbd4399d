import { beforeAll, describe, expect, it } from 'vitest';
import { execFileSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { KEEP_SCREENSHOTS, SCREENSHOT_DIR, keepScreenshot, openSignedIn, useBrowserAndServer } from '../support/browser';
import { DEFAULT_PASSWORD } from '../support/factories';
import { PDFTOPPM, pdfText, rasterize, readQr } from '../support/pdf';
import { cardWorker, numberOnPage, pagesOf, showWithConfirmedEntries } from '../support/card-print-helpers';

const env = useBrowserAndServer();
beforeAll(() => cardWorker()); // the server runs in this process; so does the worker that draws its prints


/** Pages of a PDF as PNGs beside the screenshots, to look at. */
const pdfToPngs = (file: string, name: string, last = 2) => KEEP_SCREENSHOTS && execFileSync(PDFTOPPM, ['-r', '60', '-png', '-f', '1', '-l', String(last), file, path.join(SCREENSHOT_DIR, name)]);

// Enough cards that the job outlasts a few polls of the page, so the bar is seen between empty and full.
const CARDS = 100;
const TITLES = ['Flathead roadster', 'Chopped mercury-style coupe', 'Gasser wagon', 'Fenderless tudor', 'Shortbed pickup'];

describe('numbered cards in bulk, from the organiser’s entries page', () => {
  it('starts a print, watches the bar move, downloads the cards in number order, and finds the same print after a reload', async () => {
    const entries = Array.from({ length: CARDS }, (_, i) => ({ title: `${TITLES[i % TITLES.length]} ${i + 1}`, cls: (i % 3 === 0 ? 1 : 0) as 0 | 1 }));
    const s = await showWithConfirmedEntries(entries, { showName: 'Stonebridge Summer Nationals' });
    const context = await env.browser.newContext({ viewport: { width: 1280, height: 900 }, acceptDownloads: true });
    const page = await context.newPage();
    await openSignedIn(page, env.baseUrl, s.organiser.email, DEFAULT_PASSWORD, `/shows/${s.eventId}/entries`);
    const panel = page.locator('section', { has: page.getByRole('heading', { name: 'Numbered cards' }) });
    await panel.getByRole('button', { name: 'Print numbered cards' }).waitFor();

    // Every value the bar shows, as the page draws it.
    await page.evaluate(() => {
      const seen: number[] = [];
      (window as unknown as { barSeen: number[] }).barSeen = seen;
      const note = () => {
        const bar = document.querySelector('[role="progressbar"]');
        const v = bar ? Number(bar.getAttribute('aria-valuenow')) : null;
        if (v !== null && seen[seen.length - 1] !== v) seen.push(v);
      };
      new MutationObserver(note).observe(document.body, { subtree: true, childList: true, attributes: true, attributeFilter: ['aria-valuenow'] });
    });
    await panel.getByRole('button', { name: 'Print numbered cards' }).click();
    const bar = panel.getByRole('progressbar', { name: 'Cards done' });
    await bar.waitFor();
    expect(await bar.getAttribute('aria-valuemax')).toBe(String(CARDS));
    await keepScreenshot(page, 'bulk-print-progress.png');
    const link = panel.getByRole('link', { name: `Download the PDF (${CARDS} cards)` });
    await link.waitFor({ timeout: 30_000 });
    const seen = await page.evaluate(() => (window as unknown as { barSeen: number[] }).barSeen);
    console.log('progress seen by the page:', seen.join(' → '));
    expect(seen[0]).toBe(0);
    expect(seen.some((v) => v > 0 && v < CARDS)).toBe(true); // it moved through the job, not just from empty to gone
    expect([...seen].sort((a, b) => a - b)).toEqual(seen);
    expect(await panel.getByText(`${CARDS} cards drawn`).count()).toBe(1);
    await keepScreenshot(page, 'bulk-print-done.png');

    const [download] = await Promise.all([page.waitForEvent('download'), link.click()]);
    const file = await download.path();
    const pdf = readFileSync(file);
    const { count, texts } = await pagesOf(pdf);
    const expected = [...s.confirmed].sort((a, b) => a.number - b.number);
    expect(count).toBe(CARDS);
    expect(texts.map(numberOnPage)).toEqual(expected.map((e) => e.number));
    texts.forEach((t, i) => expect(t.replace(/\s+/g, ' ')).toContain(expected[i]!.title.toUpperCase()));
    expect(readQr(rasterize(pdf, 100))?.data).toBe(`http://127.0.0.1:3999/c/${expected[0]!.code}?show=${s.slug}&no=${expected[0]!.number}`);
    pdfToPngs(file, 'bulk-print-page');

    // A reload (or a second organiser) sees the same finished print, not a new one.
    const href = await link.getAttribute('href');
    await page.reload();
    await panel.getByRole('link', { name: `Download the PDF (${CARDS} cards)` }).waitFor();
    expect(await panel.getByRole('link', { name: `Download the PDF (${CARDS} cards)` }).getAttribute('href')).toBe(href);
    await context.close();

    // The owner downloads the card of one entry from their entries page.
    const owner = await env.browser.newContext({ viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true, acceptDownloads: true });
    const ownerPage = await owner.newPage();
    await openSignedIn(ownerPage, env.baseUrl, s.owner.email, DEFAULT_PASSWORD, '/entries');
    const third = expected[2]!;
    const cardLink = ownerPage.getByRole('link', { name: `Download the card for No. ${third.number}`, exact: true });
    await cardLink.waitFor();
    await keepScreenshot(ownerPage, 'my-entries-card-link.png', { fullPage: false });
    const [cardDownload] = await Promise.all([ownerPage.waitForEvent('download'), cardLink.click()]);
    const cardFile = await cardDownload.path();
    const card = readFileSync(cardFile);
    const text = (await pdfText(card)).replace(/\s+/g, ' ');
    expect(text).toContain('STONEBRIDGE SUMMER NATIONALS');
    expect(text).toContain(third.className);
    expect(numberOnPage(text)).toBe(third.number);
    expect(readQr(rasterize(card, 100))?.data).toBe(`http://127.0.0.1:3999/c/${third.code}?show=${s.slug}&no=${third.number}`); // marked for the gate
    pdfToPngs(cardFile, 'owner-entry-card', 1);
    await owner.close();
  });
});
