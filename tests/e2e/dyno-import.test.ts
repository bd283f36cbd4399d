import { describe, expect, it } from 'vitest';
import path from 'node:path';
import { SCREENSHOT_DIR, useBrowserAndServer } from '../support/browser';
import { createUser } from '../support/factories';
import { createFullBuild } from '../support/build-factory';

// An owner imports the CSV file a dyno's software exported (short headers, as such exports have),
// sees the curve before saving, saves the run, and visitors see the curve on the public page.

const env = useBrowserAndServer();

const EXPORT = ['Dyno day, bay 2', 'RPM,HP,TQ', '2500,160.2,336.5', '3000,205.1,359.0', '3500,244.7,366.2', '4000,281.3,369.4', '4500,312.0,364.1', '5000,334.6,351.5', '5500,342.4,327.0', '6000,338.1,296.0', ''].join('\r\n');

describe('importing a dyno export', () => {
  it('reads an "RPM,HP,TQ" file, previews the curve, saves the run and shows the curve on the public page', async () => {
    const { user, email, password } = await createUser({ name: 'Rowan Teller' });
    const build = await createFullBuild(user.id);
    const context = await env.browser.newContext({ viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true });
    const page = await context.newPage();
    await page.goto(`${env.baseUrl}/sign-in?next=${encodeURIComponent(`/builds/${build.id}`)}`);
    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password').fill(password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL(`${env.baseUrl}/builds/${build.id}`);

    const dyno = page.getByTestId('dyno-panel');
    await dyno.getByRole('button', { name: 'Add a dyno run' }).click();
    const run = page.getByRole('form', { name: 'Add a dyno run' });
    await run.getByLabel('Facility').fill('Gravel Pit rolling road');
    await run.getByLabel('Peak power').fill('342.4');
    await run.getByLabel('at rpm').nth(0).fill('5500');
    await run.getByLabel('Peak torque').fill('369.4');
    await run.getByLabel('at rpm').nth(1).fill('4000');

    // A file with a missing column: the problem is said once, under the field.
    await run.getByLabel('Import the dyno’s CSV file').setInputFiles({ name: 'broken.csv', mimeType: 'text/csv', buffer: Buffer.from('RPM,HP\n3000,200\n') });
    await expect.poll(() => run.getByText(/The header has no TQ column|no torque column/).count()).toBe(1);
    await run.getByRole('button', { name: 'Add the run' }).click();
    await expect.poll(() => run.getByRole('alert').filter({ hasText: 'no torque column' }).count()).toBe(1);
    expect(await run.getByText(/no torque column/).count()).toBe(1);

    // The export itself: the preview reads it and draws the curve before anything is saved.
    await run.getByLabel('Import the dyno’s CSV file').setInputFiles({ name: 'bay2-run3.csv', mimeType: 'text/csv', buffer: Buffer.from(EXPORT) });
    const preview = run.getByTestId('csv-preview');
    await expect.poll(() => preview.textContent()).toContain('Reads as 8 points, 2,500–6,000 rpm; highest power 342.4 hp, highest torque 369.4 lb·ft');
    expect(await preview.textContent()).toContain('Columns: RPM; HP in hp; TQ in lb·ft');
    // One run drawn by the one dyno chart: a power and a torque curve.
    await expect.poll(() => preview.locator('svg path').count()).toBeGreaterThanOrEqual(2);
    expect(await run.getByText(/no torque column/).count()).toBe(0);
    await preview.scrollIntoViewIfNeeded();
    await page.screenshot({ path: path.join(SCREENSHOT_DIR, 'dyno-import-preview-phone.png') });
    await page.setViewportSize({ width: 1366, height: 900 });
    await preview.scrollIntoViewIfNeeded();
    await page.screenshot({ path: path.join(SCREENSHOT_DIR, 'dyno-import-preview-desktop.png') });

    await run.getByRole('button', { name: 'Add the run' }).click();
    await expect.poll(() => run.count()).toBe(0);
    await expect.poll(() => dyno.getByText(/Gravel Pit rolling road/).count()).toBeGreaterThan(0);

    // The public page: the run in the list of runs and its eight points drawn as the power and torque curves.
    await page.goto(`${env.baseUrl}/c/${build.code}`);
    const section = page.locator('section#dyno');
    expect(await section.locator('ol.runs').innerText()).toContain('Gravel Pit rolling road');
    const curves = await section.locator('svg path').evaluateAll((paths) => paths.map((p) => p.getAttribute('d') ?? ''));
    expect(curves.filter((d) => d.startsWith('M') && (d.match(/L/g) ?? []).length === 7).length).toBeGreaterThanOrEqual(2);
    await section.screenshot({ path: path.join(SCREENSHOT_DIR, 'dyno-import-public-desktop.png') });
    await context.close();
  });
});
