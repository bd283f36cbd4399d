import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { keepScreenshot, openSignedIn, useBrowserAndServer } from '../support/browser';
import { createUser } from '../support/factories';
import { createFullBuild } from '../support/build-factory';
import { mediaBoxes, pageCount } from '../support/pdf';
import { Build } from '@server/models/build';

const env = useBrowserAndServer();

describe('the card designer', () => {
  it('changes the design and the paper, saves the choices and downloads the PDF', async () => {
    const { user, email, password } = await createUser({ name: 'Rowan Teller' });
    const build = await createFullBuild(user.id);
    const context = await env.browser.newContext({ viewport: { width: 1280, height: 900 }, acceptDownloads: true });
    const page = await context.newPage();
    await openSignedIn(page, env.baseUrl, email, password, `/builds/${build.id}/card`);
    await expect.poll(() => page.getByRole('heading', { name: 'Windshield card' }).count()).toBe(1);
    const preview = page.getByTitle('Card preview');
    await expect.poll(() => preview.getAttribute('data-src')).toContain('design=poster&paper=letter&orientation=portrait');

    // The first page is drawn on a canvas (pdf.js), so even a browser with no PDF viewer shows it.
    await expect.poll(() => preview.getAttribute('data-state')).toBe('ready');
    await page.getByRole('radio', { name: /Data sheet/ }).check();
    await page.getByRole('radio', { name: /A4/ }).check();
    await page.getByRole('radio', { name: 'Landscape' }).check();
    await page.getByRole('checkbox', { name: 'Extras' }).uncheck();
    await expect.poll(() => preview.getAttribute('data-src')).toContain('design=data-sheet&paper=a4&orientation=landscape');
    await expect.poll(() => page.getByText('Choices saved with the build.').count(), { timeout: 10_000 }).toBe(1);
    // The designer saves as the owner clicks; wait for the last click's save to land.
    const savedSettings = async () => (await Build.findByPk(build.id))!.cardSettings as Record<string, unknown> & { sections?: string[] };
    await expect.poll(async () => (await savedSettings()).sections?.includes('extra')).toBe(false);
    expect(await savedSettings()).toMatchObject({ design: 'data-sheet', paper: 'a4', orientation: 'landscape' });
    await keepScreenshot(page, 'card-designer.png', { fullPage: true });

    const [download] = await Promise.all([page.waitForEvent('download', (d) => d.suggestedFilename().includes('data-sheet-a4-landscape')), page.getByRole('link', { name: 'Download PDF' }).click()]);
    const pdf = readFileSync((await download.path())!);
    expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');
    const [box] = mediaBoxes(pdf);
    expect(box![2]).toBeCloseTo(841.8898, 2);
    expect(box![3]).toBeCloseTo(595.2756, 2);
    expect(pageCount(pdf).objects).toBe(1);

    // Next time, the saved choices are already there: one click to print.
    await page.reload();
    await expect.poll(() => page.getByRole('radio', { name: /Data sheet/ }).isChecked()).toBe(true);
    await context.close();
  });
});
