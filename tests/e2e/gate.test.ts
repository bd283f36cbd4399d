import { describe, expect, it } from 'vitest';
import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { chromium } from 'playwright-core';
import { CHROMIUM, CHROMIUM_ARGS, keepScreenshot, openSignedIn, useBrowserAndServer } from '../support/browser';
import { DEFAULT_PASSWORD } from '../support/factories';
import { showWithClasses } from '../support/event-factory';
import { enter, enterAs, memberOf, step } from '../support/show-day-factory';
import { PDFTOPPM } from '../support/pdf';
import { confirmEntryPayment } from '@server/services/entries/entries';
import { Entry } from '@server/models/entry';

const env = useBrowserAndServer();
export const FFMPEG = '/usr/bin/ffmpeg';

/** The owner's printed card, as a camera would see it: PDF → PNG (poppler) → a looping .y4m clip (ffmpeg). */
function cardAsCameraClip(pdf: Buffer): string {
  const dir = mkdtempSync(path.join(tmpdir(), 'placard-gate-'));
  writeFileSync(path.join(dir, 'card.pdf'), pdf);
  execFileSync(PDFTOPPM, ['-r', '72', '-png', '-singlefile', path.join(dir, 'card.pdf'), path.join(dir, 'card')]);
  const clip = path.join(dir, 'card.y4m');
  execFileSync(FFMPEG, ['-loglevel', 'error', '-loop', '1', '-i', path.join(dir, 'card.png'), '-t', '2', '-r', '5', '-vf', 'scale=trunc(iw/2)*2:trunc(ih/2)*2', '-pix_fmt', 'yuv420p', clip]);
  return clip;
}

describe('the gate on a phone', () => {
  it('checks a car in by scanning its card with the camera, then another by typing its number and taking cash', async () => {
    const { organiser, eventId, classIds } = await showWithClasses({ classes: [{ name: 'Hot rods' }, { name: 'Customs' }] });
    const paid = await enter(eventId, classIds[0]!, 'Scanned roadster');
    await confirmEntryPayment(paid.entry.id, 'ref-scan');
    const unpaid = await enterAs(paid.owner, eventId, classIds[1]!, 'Typed coupe');
    await step(organiser.client, eventId, 'close_registration', 'open_gate');
    const gate = await memberOf(eventId, 'gate', 'Gale Gatewood');

    const card = await paid.owner.client.get(`/api/builds/${paid.owner.build.id}/card.pdf`).buffer(true).parse((r, cb) => {
      const chunks: Buffer[] = [];
      r.on('data', (c: Buffer) => chunks.push(c));
      r.on('end', () => cb(null, Buffer.concat(chunks)));
    });
    expect(card.status).toBe(200);
    const clip = cardAsCameraClip(card.body as Buffer);

    const browser = await chromium.launch({
      executablePath: CHROMIUM,
      args: [...CHROMIUM_ARGS, '--use-fake-device-for-media-stream', '--use-fake-ui-for-media-stream', `--use-file-for-fake-video-capture=${clip}`],
    });
    try {
      const context = await browser.newContext({ viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true, permissions: ['camera'] });
      const page = await context.newPage();
      await openSignedIn(page, env.baseUrl, gate.email, DEFAULT_PASSWORD, `/shows/${eventId}/gate`);
      await page.getByRole('button', { name: 'Scan a card' }).click();
      const car = page.getByRole('region', { name: 'Scanned car' });
      await expect.poll(() => car.getByText('Scanned roadster').count()).toBe(1);
      expect(await car.getByText('No. 1').count()).toBe(1);
      expect(await car.getByText('Class: Hot rods').count()).toBe(1);
      expect(await car.getByText('Payment: Paid').count()).toBe(1);
      const button = car.getByRole('button', { name: 'Check in' });
      expect((await button.boundingBox())!.height).toBeGreaterThanOrEqual(48);
      await page.getByRole('button', { name: 'Stop camera' }).click();
      await button.click();
      await expect.poll(() => car.getByText('Checked in.').count()).toBe(1);
      expect(await car.getByRole('button', { name: /Undo/ }).count()).toBe(1);
      await expect.poll(() => page.getByLabel('Hot rods: 1 of 1 arrived').count(), { timeout: 15_000 }).toBe(1);
      await keepScreenshot(page, 'gate-scanned.png', { fullPage: true });
      expect((await Entry.findByPk(paid.entry.id))!.status).toBe('checked_in');

      await page.getByLabel('Entry number').fill(String(unpaid.entry.number));
      await page.getByRole('button', { name: 'Find' }).click();
      await expect.poll(() => car.getByText('Typed coupe').count()).toBe(1);
      expect(await car.getByText(/not paid yet/).count()).toBe(1);
      expect(await car.getByRole('button', { name: 'Check in', exact: true }).count()).toBe(0);
      await keepScreenshot(page, 'gate-unpaid.png', { fullPage: true });
      await car.getByRole('button', { name: 'Take €25.00 cash and check in' }).click();
      await expect.poll(() => car.getByText('Checked in.').count()).toBe(1);
      expect(await car.getByText('Payment: Paid').count()).toBe(1);
      await expect.poll(() => page.getByText('Arrived 2 / 2').count(), { timeout: 15_000 }).toBe(1);
      expect(await Entry.findByPk(unpaid.entry.id)).toMatchObject({ status: 'checked_in', paidAmount: 2500 });
    } finally {
      await browser.close();
    }
  });
});
