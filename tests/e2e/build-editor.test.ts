import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { mkdtemp, rm } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import sharp from 'sharp';
import { keepScreenshot, openSignedIn, useBrowserAndServer } from '../support/browser';
import { createUser } from '../support/factories';

const env = useBrowserAndServer();
let tmp: string;
let photoPath: string;

beforeAll(async () => {
  tmp = await mkdtemp(path.join(os.tmpdir(), 'placard-editor-'));
  // A drawn test image (no real photo): a 1600×1000 JPEG of blocks of colour.
  photoPath = path.join(tmp, 'three-quarter-view.jpg');
  const blocks = [0, 1, 2, 3].map((i) => ({ input: { create: { width: 400, height: 1000, channels: 3 as const, background: ['#1c1b19', '#d9481c', '#55524c', '#d8d0c0'][i]! } }, left: i * 400, top: 0 }));
  await sharp({ create: { width: 1600, height: 1000, channels: 3, background: '#f5f0e6' } }).composite(blocks).jpeg({ quality: 85 }).toFile(photoPath);
});
afterAll(async () => {
  if (tmp) await rm(tmp, { recursive: true, force: true });
});

const shot = (page: Page, name: string) => keepScreenshot(page, name, { fullPage: true });

const DYNO_CSV = ['rpm,power,torque', '2500,160,336', '3000,205,359', '3500,244,366', '4000,281,369', '4500,312,364', '5000,334,351', '5500,342,327', '6000,338,296'].join('\n');

describe('the build editor in the browser', () => {
  it('creates a build, fills engine and wheels, uploads a photo and adds a dyno run', async () => {
    const { email, password } = await createUser({ name: 'Rowan Tesk' });
    const context = await env.browser.newContext({ viewport: { width: 390, height: 844 }, locale: 'en-US' });
    const page = await context.newPage();
    const pageErrors: string[] = [];
    page.on('pageerror', (err) => pageErrors.push(err.message));

    await openSignedIn(page, env.baseUrl, email, password, '/builds');
    await expect.poll(() => page.getByText('No builds yet').count()).toBe(1);
    await page.getByRole('button', { name: 'New build' }).click();
    // Title is required: the shared schema says so before anything is sent.
    await page.getByRole('button', { name: 'Start the build sheet' }).click();
    await expect.poll(() => page.getByText('Give the build a title.').count()).toBe(1);
    await page.getByLabel('Title').fill('The Ember Coupe');
    await page.getByLabel('Model year').fill('1934');
    await page.getByLabel('Style').selectOption('hot-rod');
    await page.getByRole('button', { name: 'Start the build sheet' }).click();
    await page.waitForURL(/\/builds\/\d+$/);
    const buildUrl = page.url();
    await expect.poll(() => page.getByRole('heading', { name: 'The Ember Coupe' }).count()).toBe(1);

    // Engine: bore × stroke × cylinders shows as displacement in the numbers, live, before saving.
    const engine = page.getByRole('form', { name: 'Engine' });
    await engine.getByLabel('Bore unit').selectOption('in');
    await engine.getByLabel('Bore', { exact: true }).fill('4');
    await engine.getByLabel('Stroke unit').selectOption('in');
    await engine.getByLabel('Stroke', { exact: true }).fill('3');
    await engine.getByLabel('Cylinders').fill('8');
    const engineNumbers = page.getByTestId('section-numbers-engine');
    await expect.poll(() => engineNumbers.textContent()).toMatch(/302\sin³/);
    await engineNumbers.scrollIntoViewIfNeeded();
    await keepScreenshot(page, 'build-editor-engine-phone.png');
    await engineNumbers.getByRole('button', { name: 'metric' }).click();
    await expect.poll(() => engineNumbers.textContent()).toMatch(/4,942\scm³/);
    // No Save button: the panel saves itself once the typing stops.
    await expect.poll(() => engine.getByRole('status').filter({ hasText: /^Saved$/ }).count()).toBeGreaterThan(0);

    // Wheels: staggered tyre sizes; the numbers work out their diameters.
    const wheels = page.getByRole('form', { name: 'Wheels and tyres' });
    await wheels.getByLabel('Tyre size').nth(0).fill('245/40R18');
    await wheels.getByLabel('Tyre size').nth(1).fill('295/35R18');
    await wheels.getByLabel('Rim width (in)').nth(1).fill('10');
    await wheels.getByLabel('Offset (ET) unit').nth(1).selectOption('mm');
    await wheels.getByLabel('Offset (ET)', { exact: true }).nth(1).fill('40');
    const wheelNumbers = page.getByTestId('section-numbers-wheels');
    await expect.poll(() => wheelNumbers.textContent()).toContain('Rear tyre diameter');
    await expect.poll(() => wheelNumbers.textContent()).toContain('Rear backspacing');
    await expect.poll(() => wheels.getByRole('status').filter({ hasText: /^Saved$/ }).count()).toBeGreaterThan(0);
    await keepScreenshot(wheels, 'build-editor-wheels-phone.png');

    // A tyre code that does not read is not sent: the schema's message is on the field and in the status.
    await wheels.getByLabel('Tyre size').nth(0).fill('245/40X18');
    await expect.poll(() => wheels.getByText(/does not read as a size code/).count()).toBeGreaterThan(0);
    await expect.poll(() => wheels.getByRole('status').textContent()).toMatch(/^● Not saved: .*does not read as a size code/);
    await wheels.getByLabel('Tyre size').nth(0).fill('245/40R18');
    await expect.poll(() => wheels.getByRole('status').filter({ hasText: /^Saved$/ }).count()).toBeGreaterThan(0);

    // Photo: uploaded with progress, stored resized; the <img> offers the widths.
    const photos = page.getByTestId('photos-panel');
    await photos.locator('input[type=file]').setInputFiles(photoPath);
    const img = photos.locator('img[srcset*="480w"]');
    await img.first().waitFor({ timeout: 15_000 });
    const srcset = await img.first().getAttribute('srcset');
    expect(srcset).toMatch(/480w/);
    expect(srcset).toMatch(/960w/);
    // The caption saves itself after a pause in the typing.
    await photos.getByLabel('Caption').fill('Three-quarter view in the shop');
    await expect.poll(() => photos.getByText('Caption saved').count()).toBe(1);
    // A second photo: reorder with the buttons (the keyboard and phone way), then choose the cover.
    await photos.locator('input[type=file]').setInputFiles(photoPath);
    await expect.poll(() => photos.locator('li[data-photo-id]').count()).toBe(2);
    const firstId = await photos.locator('li[data-photo-id]').first().getAttribute('data-photo-id');
    await photos.getByRole('button', { name: 'Move photo 1 later' }).click();
    await expect.poll(() => photos.locator('li[data-photo-id]').nth(1).getAttribute('data-photo-id')).toBe(firstId);
    await photos.getByRole('button', { name: 'Make cover' }).click();
    await expect.poll(() => photos.locator('li[data-photo-id]').first().textContent()).toContain('Cover');

    // Dyno run from pasted CSV: a live preview, then the chart.
    const dyno = page.getByTestId('dyno-panel');
    await dyno.getByRole('button', { name: 'Add a dyno run' }).click();
    const run = page.getByRole('form', { name: 'Add a dyno run' });
    await run.getByLabel('Facility').fill('Valley rolling road');
    await run.getByLabel('Peak power', { exact: true }).fill('342');
    await run.getByLabel('Rpm at peak power', { exact: true }).fill('5500');
    await run.getByLabel('Peak torque', { exact: true }).fill('369');
    await run.getByLabel('Rpm at peak torque', { exact: true }).fill('4000');
    await run.getByLabel('Curve as CSV').fill('rpm;power\n3000;200');
    await expect.poll(() => run.getByText(/no torque column/).count()).toBe(1);
    await run.getByLabel('Curve as CSV').fill(DYNO_CSV);
    await expect.poll(() => run.getByTestId('csv-preview').textContent()).toContain('8 points');
    await keepScreenshot(run, 'build-editor-dyno-form-phone.png');
    await run.getByRole('button', { name: 'Add the run' }).click();
    // The editor draws the public page's SVG chart: one solid power and one dashed torque curve for the run.
    const chart = dyno.getByRole('img', { name: /Dyno curves, power solid and torque dashed/ });
    await expect.poll(() => chart.getAttribute('aria-labelledby')).toBe('editor-dyno-title');
    await expect.poll(() => chart.locator('path').count()).toBe(2);
    await expect.poll(() => chart.locator('path[stroke-dasharray]').count()).toBe(1);
    await keepScreenshot(dyno, 'build-editor-dyno-phone.png');
    await dyno.getByRole('button', { name: 'Use as the build’s power figure' }).click();
    await expect.poll(() => dyno.getByText(/now measured on/).count()).toBe(1);

    // Weigh-in: four corners in a car-shaped grid; used as the weight, the estimate goes to the history.
    const overview = page.getByRole('form', { name: 'Overview' });
    await overview.getByLabel('Weight unit').selectOption('kg');
    await overview.getByLabel('Weight', { exact: true }).fill('1250');
    await expect.poll(() => overview.getByRole('status').filter({ hasText: /^Saved$/ }).count()).toBeGreaterThan(0);
    await page.getByRole('button', { name: 'Add a weigh-in' }).click();
    const weigh = page.getByRole('form', { name: 'Add a weigh-in' });
    await weigh.getByLabel('LF · Left front').fill('301');
    await weigh.getByLabel('RF · Right front').fill('309');
    await weigh.getByLabel('LR · Left rear').fill('334');
    await weigh.getByLabel('RR · Right rear').fill('343');
    await expect.poll(() => weigh.textContent()).toMatch(/Total\s*1,287\skg/);
    await keepScreenshot(weigh, 'build-editor-weigh-in-form-phone.png');
    await weigh.getByRole('button', { name: 'Add the weigh-in' }).click();
    await page.getByRole('button', { name: 'Use as the build’s weight' }).click();
    await expect.poll(() => page.locator('#section-history').textContent()).toMatch(/estimated 1,250\skg → measured 1,287\skg on \d{4}-\d{2}-\d{2}/);
    await expect.poll(() => overview.getByLabel('Weight', { exact: true }).inputValue()).toBe('1287');
    await keepScreenshot(page.locator('#section-weighIns'), 'build-editor-weigh-ins-phone.png');

    // Text saves itself too (leaving at once is covered by build-editor-autosave.test.ts).
    await page.getByRole('form', { name: 'Body and interior' }).getByLabel('Paint').fill('Deep oxblood, hand-rubbed');
    await expect.poll(() => page.getByRole('form', { name: 'Body and interior' }).getByRole('status').filter({ hasText: /^Saved$/ }).count()).toBeGreaterThan(0);

    await shot(page, 'build-editor-phone.png');

    // My builds: the cover and the key figures with provenance.
    await page.getByRole('link', { name: '← My builds' }).click();
    await page.waitForURL(`${env.baseUrl}/builds`);
    const card = page.getByRole('listitem').filter({ hasText: 'The Ember Coupe' });
    await card.locator('img[srcset*="480w"]').waitFor();
    await expect.poll(() => card.textContent()).toContain('Draft');
    await shot(page, 'my-builds-phone.png');

    expect(pageErrors).toEqual([]);
    await context.close();

    // The desktop layout: section nav, forms and the sticky numbers panel side by side.
    const desk = await env.browser.newContext({ viewport: { width: 1280, height: 900 }, locale: 'en-GB' });
    const deskPage = await desk.newPage();
    await openSignedIn(deskPage, env.baseUrl, email, password, new URL(buildUrl).pathname);
    const panel = deskPage.getByTestId('numbers-panel');
    await expect.poll(() => panel.textContent()).toMatch(/Displacement/);
    await expect.poll(() => panel.textContent()).toMatch(/At the flywheel/);
    await keepScreenshot(deskPage, 'build-editor-desktop.png');
    // A stated displacement that bore × stroke cannot give: the spec check says so beside the field and in the panel.
    const deskEngine = deskPage.getByRole('form', { name: 'Engine' });
    await deskEngine.getByLabel('Displacement (as stated) unit').selectOption('L');
    await deskEngine.getByLabel('Displacement (as stated)', { exact: true }).fill('5.7');
    await expect.poll(() => deskEngine.getByText(/Bore × stroke × 8 cylinders gives/).count()).toBe(1);
    await expect.poll(() => panel.textContent()).toMatch(/Spec check · 1 to look at/);
    // The message names the section and the field, not just the section.
    await expect.poll(() => panel.getByTestId('spec-check-message').allTextContents()).toEqual([expect.stringMatching(/^Engine · displacement: /)]);
    await deskEngine.getByLabel('Displacement (as stated)', { exact: true }).scrollIntoViewIfNeeded();
    await keepScreenshot(deskPage, 'build-editor-desktop-spec-check.png');

    // Deleting asks for the title first, then leaves for My builds (unsaved edits no longer matter).
    await deskPage.getByRole('button', { name: 'Delete build' }).click();
    const dialog = deskPage.getByRole('dialog');
    await expect.poll(() => dialog.getByRole('button', { name: 'Delete for good' }).isDisabled()).toBe(true);
    await dialog.getByLabel(/Type “The Ember Coupe” to confirm/).fill('The Ember Coupe');
    await dialog.getByRole('button', { name: 'Delete for good' }).click();
    await deskPage.waitForURL(`${env.baseUrl}/builds`);
    await expect.poll(() => deskPage.getByText('No builds yet').count()).toBe(1);
    await desk.close();
  }, 90_000);
});
