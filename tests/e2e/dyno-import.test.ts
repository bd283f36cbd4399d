import { describe, expect, it } from 'vitest';
import { keepScreenshot, openSignedIn, useBrowserAndServer } from '../support/browser';
import { createUser } from '../support/factories';
import { createFullBuild } from '../support/build-factory';

// An owner imports the CSV file a dyno's software exported (short headers, as such exports have),
// sees the curve before saving, saves the run, and visitors see the curve on the public page.

const env = useBrowserAndServer();

// Power and torque agree row by row (hp = lb·ft × rpm / 5252, from memory).
const EXPORT = ['Dyno day, bay 2', 'RPM,HP,TQ', '2500,120.3,252.7', '3000,153.6,268.9', '3500,188.4,282.7', '4000,221.3,290.6', '4500,251.9,294.0', '5000,277.4,291.4', '5500,298.6,285.1', '6000,310.0,271.4', ''].join('\r\n');

/** An owner with a full build, signed in on a phone, with the "Add a dyno run" form open and its facility filled. */
async function openNewRunOnPhone(ownerName: string, facility: string) {
  const { user, email, password } = await createUser({ name: ownerName });
  const build = await createFullBuild(user.id);
  const context = await env.browser.newContext({ viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true });
  const page = await context.newPage();
  await openSignedIn(page, env.baseUrl, email, password, `/builds/${build.id}`);
  const dyno = page.getByTestId('dyno-panel');
  await dyno.getByRole('button', { name: 'Add a dyno run' }).click();
  const run = page.getByRole('form', { name: 'Add a dyno run' });
  await run.getByLabel('Facility').fill(facility);
  return { build, context, page, dyno, run };
}

describe('importing a dyno export', () => {
  it('reads an "RPM,HP,TQ" file, previews the curve, fills the peaks from it, saves the run and shows the curve on the public page', async () => {
    const { build, context, page, dyno, run } = await openNewRunOnPhone('Rowan Teller', 'Gravel Pit rolling road');
    const box = (label: string) => run.getByLabel(label, { exact: true });
    // No curve and no peaks: each empty peak box asks for itself, by its label.
    await run.getByRole('button', { name: 'Add the run' }).click();
    await expect.poll(() => run.getByRole('alert').filter({ hasText: 'Enter the peak power.' }).count()).toBe(1);
    expect(await run.getByRole('alert').filter({ hasText: 'Enter the rpm at peak torque.' }).count()).toBe(1);
    expect(await box('Rpm at peak torque').getAttribute('aria-invalid')).toBe('true');
    await box('Peak power').scrollIntoViewIfNeeded();
    await keepScreenshot(page, 'dyno-import-peaks-missing-phone.png');

    // A file with a missing column: the problem is said once, under the field.
    await run.getByLabel('Import the dyno’s CSV file').setInputFiles({ name: 'broken.csv', mimeType: 'text/csv', buffer: Buffer.from('RPM,HP\n3000,200\n') });
    await expect.poll(() => run.getByText(/The header has no TQ column|no torque column/).count()).toBe(1);
    await run.getByRole('button', { name: 'Add the run' }).click();
    await expect.poll(() => run.getByRole('alert').filter({ hasText: 'no torque column' }).count()).toBe(1);
    expect(await run.getByText(/no torque column/).count()).toBe(1);

    // A cell no dyno reads is refused at once, by line and column, with no curve drawn.
    const pasted = run.getByLabel('Curve as CSV');
    const preview = run.getByTestId('csv-preview');
    await pasted.fill('RPM,HP,TQ\n3000,-150,262\n4000,220,289');
    await expect.poll(() => run.getByRole('alert').filter({ hasText: 'Line 2: -150 in the HP column is below 0: power can’t be negative.' }).count()).toBe(1);
    expect(await preview.count()).toBe(0);
    expect(await box('Peak power').inputValue()).toBe('');
    await pasted.scrollIntoViewIfNeeded();
    await keepScreenshot(page, 'dyno-import-negative-phone.png');
    // Rows in falling rpm read low to high.
    await pasted.fill('RPM,HP,TQ\n6000,310,271.4\n4000,221.3,290.6');
    await expect.poll(() => preview.textContent()).toContain('Reads as 2 points, 4,000–6,000 rpm');

    // The export itself: the preview reads it and draws the curve before anything is saved.
    await run.getByLabel('Import the dyno’s CSV file').setInputFiles({ name: 'bay2-run3.csv', mimeType: 'text/csv', buffer: Buffer.from(EXPORT) });
    await expect.poll(() => preview.textContent()).toContain('Reads as 8 points, 2,500–6,000 rpm; highest power 310 hp at 6,000 rpm, highest torque 294 lb·ft at 4,500 rpm.');
    expect(await preview.textContent()).toContain('Columns: RPM; HP in hp; TQ in lb·ft');
    // The peaks are in their boxes, read from the curve, for the owner to keep or change.
    await expect.poll(() => Promise.all(['Peak power', 'Rpm at peak power', 'Peak torque', 'Rpm at peak torque'].map((l) => box(l).inputValue()))).toEqual(['310', '6000', '294', '4500']);
    expect(await run.getByTestId('peaks-hint').textContent()).toContain('Read from the curve');
    expect(await run.getByText(/^Enter the /).count()).toBe(0);
    // One run drawn by the one dyno chart: a power and a torque curve.
    await expect.poll(() => preview.locator('svg path').count()).toBeGreaterThanOrEqual(2);
    expect(await run.getByText(/no torque column/).count()).toBe(0);
    await preview.scrollIntoViewIfNeeded();
    await keepScreenshot(page, 'dyno-import-preview-phone.png');
    await page.setViewportSize({ width: 1366, height: 900 });
    await preview.scrollIntoViewIfNeeded();
    await keepScreenshot(page, 'dyno-import-preview-desktop.png');

    await run.getByTestId('peaks-hint').scrollIntoViewIfNeeded();
    await keepScreenshot(page, 'dyno-import-peaks-desktop.png');
    await page.setViewportSize({ width: 390, height: 844 });
    await run.getByTestId('peaks-hint').scrollIntoViewIfNeeded();
    await keepScreenshot(page, 'dyno-import-peaks-phone.png');

    // The owner changes one peak (the printed sheet rounds it otherwise); the others stay as read.
    await box('Rpm at peak torque').fill('4400');
    await run.getByRole('button', { name: 'Add the run' }).click();
    await expect.poll(() => run.count()).toBe(0);
    await expect.poll(() => dyno.getByText(/Gravel Pit rolling road/).count()).toBeGreaterThan(0);
    // Figures as entered: no decimals the owner never gave.
    expect(await dyno.locator('li').filter({ hasText: 'Gravel Pit rolling road' }).innerText()).toContain('310 hp at 6,000 rpm · 294 lb·ft at 4,400 rpm');
    await keepScreenshot(dyno.locator('li').filter({ hasText: 'Gravel Pit rolling road' }), 'dyno-import-run-phone.png');

    // The public page: the run in the list of runs and its eight points drawn as the power and torque curves.
    await page.goto(`${env.baseUrl}/c/${build.code}`);
    const section = page.locator('section#dyno');
    expect(await section.locator('ol.runs').innerText()).toContain('Gravel Pit rolling road');
    const curves = await section.locator('svg path').evaluateAll((paths) => paths.map((p) => p.getAttribute('d') ?? ''));
    expect(curves.filter((d) => d.startsWith('M') && (d.match(/L/g) ?? []).length === 7).length).toBeGreaterThanOrEqual(2);
    await keepScreenshot(section, 'dyno-import-public-desktop.png');
    await context.close();
  });

  it('fills the peaks from rows typed in, so the run is added without typing them', async () => {
    const { context, page, dyno, run } = await openNewRunOnPhone('Ines Marlow', 'Creek Road chassis dyno');
    await run.getByLabel('Type rows').check();
    // A slip of the finger on row 2: refused, naming the row.
    const rows = [['4000', '221.3', '290.6'], ['5000', '-277.4', '291.4'], ['6000', '310', '271.4']];
    for (const [i, row] of rows.entries()) {
      await run.getByRole('button', { name: 'Add a row' }).click();
      for (const [j, column] of (['rpm', 'power', 'torque'] as const).entries()) await run.getByLabel(`Row ${i + 1} ${column}`).fill(row[j]!);
    }
    const box = (label: string) => run.getByLabel(label, { exact: true });
    await run.getByRole('button', { name: 'Add the run' }).click();
    await expect.poll(() => run.getByRole('alert').filter({ hasText: 'Row 2: Curve power must be at least 0.' }).count()).toBe(1);
    await run.getByLabel('Row 2 power').scrollIntoViewIfNeeded();
    await keepScreenshot(page, 'dyno-typed-rows-error-phone.png');
    await run.getByLabel('Row 2 power').fill('277.4');
    await expect.poll(() => Promise.all(['Peak power', 'Rpm at peak power', 'Peak torque', 'Rpm at peak torque'].map((l) => box(l).inputValue()))).toEqual(['310', '6000', '291.4', '5000']);
    await run.getByRole('button', { name: 'Add the run' }).click();
    await expect.poll(() => run.count()).toBe(0);
    expect(await dyno.locator('li').filter({ hasText: 'Creek Road chassis dyno' }).innerText()).toContain('310 hp at 6,000 rpm · 291.4 lb·ft at 5,000 rpm');
    await context.close();
  });
});
