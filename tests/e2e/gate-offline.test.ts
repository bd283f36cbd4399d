import { describe, expect, it } from 'vitest';
import { AuditLine } from '@server/models/audit-line';
import { Entry } from '@server/models/entry';
import { confirmEntryPayment } from '@server/services/entries/entries';
import { keepScreenshot, openSignedIn, useBrowserAndServer } from '../support/browser';
import { DEFAULT_PASSWORD } from '../support/factories';
import { showWithClasses } from '../support/event-factory';
import { enter, enterAs, memberOf, step } from '../support/show-day-factory';

const env = useBrowserAndServer();

describe('the gate on a phone with no signal', () => {
  it('checks three cars in offline (one with cash), survives a reload, and each is checked in once on the server when the signal returns', async () => {
    const { organiser, eventId, classIds } = await showWithClasses({ classes: [{ name: 'Hot rods' }, { name: 'Customs' }] });
    const first = await enter(eventId, classIds[0]!, 'Field roadster');
    await confirmEntryPayment(first.entry.id, 'ref-off-1');
    const second = await enterAs(first.owner, eventId, classIds[1]!, 'Cash coupe');
    const third = await enterAs(first.owner, eventId, classIds[1]!, 'Quiet wagon');
    await confirmEntryPayment(third.entry.id, 'ref-off-3');
    await step(organiser.client, eventId, 'close_registration', 'open_gate');
    const gate = await memberOf(eventId, 'gate', 'Field Gate');

    const context = await env.browser.newContext({ viewport: { width: 390, height: 844 }, deviceScaleFactor: 2, isMobile: true, hasTouch: true });
    const page = await context.newPage();
    await openSignedIn(page, env.baseUrl, gate.email, DEFAULT_PASSWORD, `/shows/${eventId}`);
    await page.getByRole('link', { name: 'Check cars in' }).click();
    await page.waitForURL(`**/gate/${eventId}`);
    await page.getByRole('heading', { name: /Gate · Autumn Field Meet/ }).waitFor();
    await expect.poll(() => page.evaluate(async () => (await navigator.serviceWorker.getRegistration('/gate'))?.active?.state)).toBe('activated');
    await expect.poll(() => page.getByText(/Arrived 0 \/ 3/).count()).toBe(1);

    await context.setOffline(true);
    await page.reload();
    await page.getByText('No signal').waitFor();
    const car = page.getByRole('region', { name: 'Scanned car' });
    for (const [entry, title, cash] of [[first, 'Field roadster', false], [second, 'Cash coupe', true], [third, 'Quiet wagon', false]] as const) {
      await page.getByLabel('Entry number').fill(String(entry.entry.number));
      await page.getByRole('button', { name: 'Find' }).click();
      await expect.poll(() => car.getByText(title).count()).toBe(1);
      await car.getByRole('button', { name: cash ? 'Take €25.00 cash and check in' : 'Check in' }).click();
      await car.getByText('Checked in on this phone.', { exact: false }).waitFor();
      if (cash) await keepScreenshot(page, 'gate-offline-cash.png', { fullPage: true });
    }
    await page.reload();
    await expect.poll(() => page.getByText('3 check-ins not yet sent').count()).toBe(1);
    // The phone's copy knows the car is in: a second try says so.
    await page.getByLabel('Entry number').fill(String(first.entry.number));
    await page.getByRole('button', { name: 'Find' }).click();
    await expect.poll(() => car.getByText(/already checked in/).count()).toBe(1);
    await keepScreenshot(page, 'gate-offline-queued.png', { fullPage: true });
    expect(await Entry.count({ where: { eventId, status: 'checked_in' } })).toBe(0);

    await context.setOffline(false);
    await expect.poll(() => page.getByText('Everything is sent.').count(), { timeout: 15_000 }).toBe(1);
    await keepScreenshot(page, 'gate-offline-sent.png', { fullPage: true });
    for (const e of [first, second, third]) {
      expect((await Entry.findByPk(e.entry.id))!.status).toBe('checked_in');
      expect(await AuditLine.count({ where: { entryId: e.entry.id, action: 'checked_in' } })).toBe(1);
    }
    expect(await Entry.findByPk(second.entry.id)).toMatchObject({ paidAmount: 2500 });
    expect(await AuditLine.count({ where: { entryId: second.entry.id, action: 'marked_paid' } })).toBe(1);
  });
});
