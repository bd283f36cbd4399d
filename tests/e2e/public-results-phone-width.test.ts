import { describe, expect, it } from 'vitest';
import { keepScreenshot, useBrowserAndServer } from '../support/browser';
import { judgedShow } from '../support/results-factory';

const env = useBrowserAndServer();
const LONG_TITLE = 'Supercalifragilisticexpialidociousroadsterwithnospacesatall';

describe('the public results page on a phone', () => {
  it('keeps a long unbroken title inside the 390 px screen', async () => {
    const show = await judgedShow({ hotRods: [LONG_TITLE, 'Deuce'], customs: ['Merc'] });
    for (const [judge, title, points] of [[0, LONG_TITLE, [9, 8, 4]], [1, LONG_TITLE, [8, 8, 4]], [0, 'Deuce', [7, 7, 3]], [1, 'Deuce', [7, 6, 3]], [0, 'Merc', [6, 6, 3]], [1, 'Merc', [6, 5, 3]]] as const) {
      await show.score(judge, title, [...points]);
    }
    expect((await show.publish()).status).toBe(200);
    const phone = await env.browser.newContext({ viewport: { width: 390, height: 844 }, javaScriptEnabled: false });
    const page = await phone.newPage();
    await page.goto(`${env.baseUrl}/e/${show.slug}`);
    await page.locator('ol.results').first().waitFor();
    expect(await page.getByRole('link', { name: LONG_TITLE }).count()).toBeGreaterThan(0);
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
    await keepScreenshot(page, 'results-long-title-phone.png', { fullPage: true });
    await phone.close();
  });
});
