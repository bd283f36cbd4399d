import { describe, expect, it } from 'vitest';
import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { chromium } from 'playwright-core';
import { Entry } from '@server/models/entry';
import { confirmEntryPayment } from '@server/services/entries/entries';
import { CHROMIUM, CHROMIUM_ARGS, keepScreenshot, openSignedIn, useBrowserAndServer } from '../support/browser';
import { DEFAULT_PASSWORD } from '../support/factories';
import { showWithClasses } from '../support/event-factory';
import { enter, memberOf, step } from '../support/show-day-factory';
import { PDFTOPPM } from '../support/pdf';

const env = useBrowserAndServer();
const FFMPEG = '/usr/bin/ffmpeg';
const PHONE = { viewport: { width: 390, height: 844 }, deviceScaleFactor: 2, isMobile: true, hasTouch: true };

/** A printed card as a camera sees it: PDF → PNG → a looping .y4m clip for Chromium's fake camera. */
function cameraClipOf(pdf: Buffer): string {
  const dir = mkdtempSync(path.join(tmpdir(), 'placard-other-card-'));
  writeFileSync(path.join(dir, 'card.pdf'), pdf);
  execFileSync(PDFTOPPM, ['-r', '72', '-png', '-singlefile', path.join(dir, 'card.pdf'), path.join(dir, 'card')]);
  const clip = path.join(dir, 'card.y4m');
  execFileSync(FFMPEG, ['-loglevel', 'error', '-loop', '1', '-i', path.join(dir, 'card.png'), '-t', '2', '-r', '5', '-vf', 'scale=trunc(iw/2)*2:trunc(ih/2)*2', '-pix_fmt', 'yuv420p', clip]);
  return clip;
}

describe('the gate on a phone: walk-ups and another show’s card', () => {
  it('refuses a numbered card of another show by that show’s name', async () => {
    const here = await showWithClasses({ settings: { name: 'Harbour Lights Meet' }, classes: [{ name: 'Hot rods' }] });
    const other = await showWithClasses({ settings: { name: 'Pinewood Gathering' }, classes: [{ name: 'Customs' }] });
    const car = await enter(other.eventId, other.classIds[0]!, 'Visiting roadster');
    await confirmEntryPayment(car.entry.id, 'ref-other');
    await step(other.organiser.client, other.eventId, 'close_registration', 'open_gate');
    await step(here.organiser.client, here.eventId, 'close_registration', 'open_gate');
    const gate = await memberOf(here.eventId, 'gate', 'Harbour Gate');

    const card = await other.organiser.client.raw.get(`/api/events/${other.eventId}/gate/cards/${car.entry.number}`).buffer(true).parse((r, cb) => {
      const chunks: Buffer[] = [];
      r.on('data', (c: Buffer) => chunks.push(c));
      r.on('end', () => cb(null, Buffer.concat(chunks)));
    });
    expect(card.status).toBe(200);
    const clip = cameraClipOf(card.body as Buffer);

    const browser = await chromium.launch({ executablePath: CHROMIUM, args: [...CHROMIUM_ARGS, '--use-fake-device-for-media-stream', '--use-fake-ui-for-media-stream', `--use-file-for-fake-video-capture=${clip}`] });
    try {
      const context = await browser.newContext({ ...PHONE, permissions: ['camera'] });
      const page = await context.newPage();
      await openSignedIn(page, env.baseUrl, gate.email, DEFAULT_PASSWORD, `/gate/${here.eventId}`);
      await page.getByRole('heading', { name: /Gate · Harbour Lights Meet/ }).waitFor();
      await page.getByRole('button', { name: 'Scan a card' }).click();
      const scanned = page.getByRole('region', { name: 'Scanned car' });
      await expect.poll(() => scanned.getByText('This card is for Pinewood Gathering, not this one; the car is not entered here.').count(), { timeout: 15_000 }).toBe(1);
      await page.getByRole('button', { name: 'Stop camera' }).click();
      expect(await scanned.getByRole('button', { name: /Check in/ }).count()).toBe(0);
      await keepScreenshot(page, 'gate-other-show-card.png', { fullPage: true });
      expect((await Entry.findByPk(car.entry.id))!.status).toBe('confirmed');
    } finally {
      await browser.close();
    }
  });

  it('enters a walk-up at the gate: a number, paid in cash, its card prints; refused when the class is full', async () => {
    const { organiser, eventId, classIds } = await showWithClasses({ settings: { name: 'Harbour Lights Meet' }, classes: [{ name: 'Hot rods' }, { name: 'Customs', capacity: 1 }] });
    const booked = await enter(eventId, classIds[0]!, 'Booked coupe');
    await confirmEntryPayment(booked.entry.id, 'ref-booked');
    await step(organiser.client, eventId, 'close_registration', 'open_gate');
    const gate = await memberOf(eventId, 'gate', 'Harbour Gate');

    const context = await env.browser.newContext(PHONE);
    const page = await context.newPage();
    await openSignedIn(page, env.baseUrl, gate.email, DEFAULT_PASSWORD, `/gate/${eventId}`);
    await page.getByRole('heading', { name: /Gate · Harbour Lights Meet/ }).waitFor();
    await page.getByText('Walk-up entry').click();
    const walkUpForm = page.locator('details', { hasText: 'Walk-up entry' });
    await walkUpForm.getByRole('textbox', { name: 'Car' }).fill('Gate-day wagon');
    await walkUpForm.getByLabel('Entrant’s name').fill('Wendell Gatewood');
    await walkUpForm.getByLabel('Class').selectOption({ label: 'Customs' });
    await walkUpForm.getByRole('button', { name: 'Take €25.00 cash and enter' }).click();
    const print = page.getByRole('link', { name: 'Print card No. 2' });
    await print.waitFor();
    const scanned = page.getByRole('region', { name: 'Scanned car' });
    await expect.poll(() => scanned.getByText('Gate-day wagon').count()).toBe(1);
    expect(await scanned.getByText('Payment: Paid').count()).toBe(1);
    await keepScreenshot(page, 'gate-walk-up-entered.png', { fullPage: true });
    const walkUp = await Entry.findOne({ where: { eventId, walkUpName: 'Wendell Gatewood' } });
    expect(walkUp).toMatchObject({ number: 2, status: 'checked_in', paidAmount: 2500 });

    // The card link prints: the PDF opens for the gate person, with the walk-up's number on it.
    const href = await print.getAttribute('href');
    const pdf = await page.request.get(`${env.baseUrl}${href}`);
    expect(pdf.status()).toBe(200);
    expect(pdf.headers()['content-type']).toMatch(/pdf/);
    const dir = mkdtempSync(path.join(tmpdir(), 'placard-walk-up-card-'));
    writeFileSync(path.join(dir, 'card.pdf'), await pdf.body());
    expect(execFileSync('pdftotext', [path.join(dir, 'card.pdf'), '-'], { encoding: 'utf8' })).toMatch(/^2\s+E N T RY\s+HARBOUR LIGHTS MEET\s+Class Customs\s+GATE-DAY WAGON/);

    // Customs holds one car: a second walk-up in it is refused, and nothing is entered.
    await walkUpForm.getByRole('textbox', { name: 'Car' }).fill('One too many');
    await walkUpForm.getByLabel('Entrant’s name').fill('Late Larkin');
    await walkUpForm.getByLabel('Class').selectOption({ label: 'Customs' });
    await walkUpForm.getByRole('button', { name: 'Take €25.00 cash and enter' }).click();
    await expect.poll(() => walkUpForm.getByRole('alert').filter({ hasText: /full/i }).count()).toBe(1);
    await keepScreenshot(page, 'gate-walk-up-full.png', { fullPage: true });
    expect(await Entry.count({ where: { eventId, walkUpName: 'Late Larkin' } })).toBe(0);
  });
});
