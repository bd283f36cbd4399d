import { describe, expect, it } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import { keepScreenshot, openSignedIn, useBrowserAndServer } from '../support/browser';
import { createUser } from '../support/factories';
import { createFullBuild } from '../support/build-factory';

// The card designer on a phone and on a desktop: where the preview sits, that it follows the
// choices, and that it says what did not fit.

const env = useBrowserAndServer();

// A story of a dozen paragraphs: more than any Letter card holds, so something is always cut.
const LONG_STORY = Array.from({ length: 12 }, (_, i) => `Winter ${i + 1} in the shed went on the floor pans, the wiring and a gearbox that fought back at every step of the way.`).join('\n\n');

async function openDesigner(viewport: { width: number; height: number }, story?: string): Promise<{ context: BrowserContext; page: Page }> {
  const { user, email, password } = await createUser({ name: 'Rowan Teller' });
  const build = await createFullBuild(user.id, story ? { story } : {});
  const context = await env.browser.newContext({ viewport, isMobile: viewport.width < 500, hasTouch: viewport.width < 500 });
  const page = await context.newPage();
  await openSignedIn(page, env.baseUrl, email, password, `/builds/${build.id}/card`);
  await expect.poll(() => page.getByTitle('Card preview').getAttribute('data-state')).toBe('ready');
  return { context, page };
}

const boxOf = async (page: Page, locator: ReturnType<Page['locator']>) => {
  const box = await locator.boundingBox();
  expect(box, 'element on the page').not.toBeNull();
  return box!;
};

/** The preview's height over its width, which follows the paper and orientation chosen. */
const shapeOf = async (page: Page) => {
  const b = await boxOf(page, page.getByTitle('Card preview'));
  return b.height / b.width;
};

describe('the card designer on a phone and a desktop', () => {
  it('on a phone shows the preview first, the choices below it, follows a change of design and paper, and says what was left off', async () => {
    const { context, page } = await openDesigner({ width: 390, height: 844 }, LONG_STORY);
    const preview = page.getByTitle('Card preview');
    const designPanel = page.getByRole('radio', { name: /Poster/ });

    // The preview is on the first screen, whole across, and the first choice comes after it.
    const p = await boxOf(page, preview);
    expect(p.y).toBeLessThan(844);
    expect(p.x).toBeGreaterThanOrEqual(0);
    expect(p.x + p.width).toBeLessThanOrEqual(390);
    expect(p.width).toBeGreaterThan(300);
    expect((await boxOf(page, designPanel)).y).toBeGreaterThan(p.y + p.height);
    expect(await shapeOf(page)).toBeCloseTo(792 / 612, 1);
    await keepScreenshot(page, 'card-designer-phone.png');

    // Every section ticked and a long story on Letter: the card cannot hold it all, and the designer names what gave way.
    const leftOff = page.getByRole('status', { name: 'Left off the card' });
    await expect.poll(() => leftOff.count()).toBe(1);
    await expect.poll(() => leftOff.getByRole('listitem').count()).toBeGreaterThan(0);
    expect(await leftOff.innerText()).toContain('Not everything fits on this paper');
    expect(await leftOff.innerText()).toContain('Story: cut short');
    await leftOff.scrollIntoViewIfNeeded();
    await keepScreenshot(page, 'card-designer-phone-left-off.png');

    // Compact on Tabloid landscape: the preview asks for that card and takes that shape; the note follows the new render.
    await page.getByRole('radio', { name: /Compact/ }).check();
    await page.getByRole('radio', { name: /Tabloid/ }).check();
    await page.getByRole('radio', { name: 'Landscape' }).check();
    await expect.poll(() => preview.getAttribute('data-src')).toContain('design=compact&paper=tabloid&orientation=landscape');
    await expect.poll(() => preview.getAttribute('data-state')).toBe('ready');
    expect(await shapeOf(page)).toBeCloseTo(792 / 1224, 1);
    await expect.poll(() => leftOff.innerText()).toMatch(/Story: (left off|cut short)/);
    await preview.scrollIntoViewIfNeeded();
    await keepScreenshot(page, 'card-designer-phone-compact-tabloid.png');
    await context.close();
  });

  it('on a desktop shows the choices beside the preview and follows a change of paper', async () => {
    const { context, page } = await openDesigner({ width: 1366, height: 900 });
    const preview = page.getByTitle('Card preview');
    const p = await boxOf(page, preview);
    const design = await boxOf(page, page.getByRole('radio', { name: /Poster/ }));
    // Side by side: the choices to the left of the preview, both starting on the first screen.
    expect(design.x + design.width).toBeLessThan(p.x);
    expect(p.y).toBeLessThan(900);
    expect(design.y).toBeLessThan(900);

    await page.getByRole('radio', { name: /A3/ }).check();
    await expect.poll(() => preview.getAttribute('data-src')).toContain('paper=a3');
    await expect.poll(() => preview.getAttribute('data-state')).toBe('ready');
    expect(await shapeOf(page)).toBeCloseTo(1190.55 / 841.89, 1);
    // The usual build fits whole on A3, and the designer says so.
    await expect.poll(() => page.getByText('Everything you ticked fits on this card.').count()).toBe(1);
    await keepScreenshot(page, 'card-designer-desktop.png', { fullPage: true });
    await context.close();
  });
});
