import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import sharp from 'sharp';
import { keepScreenshot, openSignedIn, useBrowserAndServer } from '../support/browser';
import { createUser } from '../support/factories';
import { createBuild } from '../support/build-factory';

const env = useBrowserAndServer();

/** A drawn test image (no real photo) of a given shape, so each stored photo can be told apart by its proportions. */
async function drawn(name: string, width: number, height: number, colour: string) {
  const buffer = await sharp({ create: { width, height, channels: 3, background: colour } }).jpeg({ quality: 80 }).toBuffer();
  return { name, mimeType: 'image/jpeg', buffer };
}

type StoredPhoto = { id: number; caption: string; position: number; isCover: boolean; width: number; height: number };
async function storedPhotos(page: Page, buildId: number): Promise<StoredPhoto[]> {
  const res = await page.request.get(`${env.baseUrl}/api/builds/${buildId}`);
  const photos = ((await res.json()) as { build: { photos: StoredPhoto[] } }).build.photos;
  return [...photos].sort((a, b) => a.position - b.position);
}
const shape = (p: StoredPhoto) => Math.round((p.width / p.height) * 100) / 100;

describe('photos in the build editor', () => {
  it('says why a file is refused, clears that on the next success, keeps the first chosen as cover, and gives captions room', async () => {
    const { user, email, password } = await createUser({ name: 'Sefa Orrin' });
    const build = await createBuild(user.id, { title: 'The Copper Tourer' });
    const editorPath = `/builds/${build.id}`;
    const context = await env.browser.newContext({ viewport: { width: 1366, height: 900 }, locale: 'en-GB' });
    const page = await context.newPage();
    await openSignedIn(page, env.baseUrl, email, password, editorPath);
    const photos = page.getByTestId('photos-panel');
    const input = photos.locator('input[type=file]');

    // Refused: a GIF (checked in the browser) and a file that only claims to be a JPEG (checked by the server).
    await input.setInputFiles([
      { name: 'sketch.gif', mimeType: 'image/gif', buffer: Buffer.from('GIF89a') },
      { name: 'notes.jpg', mimeType: 'image/jpeg', buffer: Buffer.from('these are not image bytes') },
    ]);
    const alerts = photos.getByRole('alert');
    await expect.poll(() => alerts.allTextContents()).toEqual(['sketch.gif is not a JPEG, PNG, WebP or AVIF image.', 'notes.jpg is not a JPEG, PNG, WebP or AVIF image.']);
    await keepScreenshot(photos, 'build-editor-photos-refused-desktop.png');

    // Three chosen at once: the largest (slowest to resize) is chosen first and still becomes the cover, and the order is kept.
    await input.setInputFiles([await drawn('front.jpg', 2400, 1600, '#7a3b1e'), await drawn('cab.jpg', 800, 1000, '#2f4a3a'), await drawn('dash.jpg', 640, 480, '#c9b48a')]);
    await expect.poll(() => photos.locator('li[data-photo-id]').count()).toBe(3);
    await expect.poll(() => alerts.count()).toBe(0);
    let stored = await storedPhotos(page, build.id);
    expect(stored.map(shape)).toEqual([1.5, 0.8, 1.33]);
    expect(stored.map((p) => p.isCover)).toEqual([true, false, false]);
    const cover = stored[0]!.id;

    // More chosen later: the cover stays.
    await input.setInputFiles([await drawn('rear.jpg', 1000, 1000, '#444444'), await drawn('engine.jpg', 900, 600, '#aa6633')]);
    await expect.poll(() => photos.locator('li[data-photo-id]').count()).toBe(5);
    stored = await storedPhotos(page, build.id);
    expect(stored.filter((p) => p.isCover).map((p) => p.id)).toEqual([cover]);
    expect(stored.map(shape)).toEqual([1.5, 0.8, 1.33, 1, 1.5]);

    // A caption box is wide enough to read, and a long caption wraps instead of being cut off; it saves itself.
    const caption = photos.getByLabel('Caption').first();
    const longCaption = 'Front three-quarter on the morning of the first drive, before the hood side panels went back on';
    await caption.fill(longCaption);
    await expect.poll(() => photos.getByRole('status').first().textContent()).toBe('Caption saved');
    expect((await storedPhotos(page, build.id))[0]!.caption).toBe(longCaption);
    const fit = await caption.evaluate((el) => ({ width: el.clientWidth, scroll: el.scrollHeight, client: el.clientHeight }));
    expect(fit.width).toBeGreaterThanOrEqual(200);
    expect(fit.scroll).toBeLessThanOrEqual(fit.client + 1);
    await keepScreenshot(photos, 'build-editor-photos-desktop.png');

    await page.setViewportSize({ width: 390, height: 844 });
    expect(await caption.evaluate((el) => el.clientWidth)).toBeGreaterThanOrEqual(280);
    await keepScreenshot(photos, 'build-editor-photos-phone.png');
    await context.close();
  }, 120_000);
});
