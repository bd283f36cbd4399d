import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { Entry } from '@server/models/entry';
import { confirmEntryPayment } from '@server/services/entries/entries';
import { openSignedIn, useBrowserAndServer } from '../support/browser';
import { DEFAULT_PASSWORD } from '../support/factories';
import { showWithClasses } from '../support/event-factory';
import { enter } from '../support/show-day-factory';
import { SHEET } from '../support/judging-factory';

const env = useBrowserAndServer();
const DESKTOP = { width: 1366, height: 900 };

async function organiserPage(email: string, next: string, timezoneId = 'UTC'): Promise<Page> {
  // The browser's clock is in another zone than the show's, so a time shown in the browser's zone is caught.
  const context = await env.browser.newContext({ viewport: DESKTOP, timezoneId });
  const page = await context.newPage();
  await openSignedIn(page, env.baseUrl, email, DEFAULT_PASSWORD, next);
  return page;
}

describe('the organiser on a desktop', () => {
  it('renames a class and changes its capacity; removing one asks first, and Keep it keeps it', async () => {
    const show = await showWithClasses({ classes: [{ name: 'Customs' }, { name: 'Pickups' }] });
    const page = await organiserPage(show.organiser.email, `/shows/${show.eventId}`);
    const panel = page.locator('section', { has: page.getByRole('heading', { name: 'Classes', exact: true }) });
    await panel.getByRole('button', { name: 'Edit Customs' }).click();
    const form = panel.getByRole('form', { name: 'Edit Customs' });
    await form.getByLabel('Class name').fill('Hot rods to 1948');
    await form.getByLabel('Capacity').fill('12');
    await form.getByRole('button', { name: 'Save class' }).click();
    await panel.getByText('Hot rods to 1948', { exact: true }).waitFor();
    await panel.getByText('Up to 12 cars').waitFor();

    await panel.getByRole('button', { name: 'Remove Pickups' }).click();
    const dialog = page.getByRole('dialog', { name: 'Remove Pickups?' });
    await dialog.waitFor();
    await dialog.getByRole('button', { name: 'Keep it' }).click();
    await dialog.waitFor({ state: 'hidden' });
    expect(await panel.getByText('Pickups', { exact: true }).count()).toBe(1);

    await panel.getByRole('button', { name: 'Remove Pickups' }).click();
    await dialog.getByRole('button', { name: 'Remove class' }).click();
    await panel.getByText('Pickups', { exact: true }).waitFor({ state: 'detached' });
    const classes = (await show.organiser.client.get(`/api/events/${show.eventId}`)).body.event.classes as Array<{ name: string; capacity: number | null }>;
    expect(classes.map((c) => [c.name, c.capacity])).toEqual([['Hot rods to 1948', 12]]);
    await page.context().close();
  });

  it('saves the judging sheet and says Saved; each row’s Remove stays inside the panel', async () => {
    const show = await showWithClasses();
    expect((await show.organiser.client.put(`/api/events/${show.eventId}/criteria`, { criteria: SHEET })).status).toBe(200);
    const page = await organiserPage(show.organiser.email, `/shows/${show.eventId}`);
    const panel = page.locator('section', { has: page.getByRole('heading', { name: 'Judging sheet', exact: true }) });
    await panel.getByRole('button', { name: 'Add a criterion' }).click();
    await panel.getByLabel('Criterion 4', { exact: true }).fill('Stance');
    await panel.getByRole('button', { name: 'Save the sheet' }).click();
    await panel.getByText('Saved.').waitFor();
    expect(await panel.getByLabel('Criterion 4', { exact: true }).inputValue()).toBe('Stance');

    const box = (await panel.boundingBox())!;
    const removes = panel.getByRole('button', { name: /^Remove criterion/ });
    expect(await removes.count()).toBe(4);
    for (const remove of await removes.all()) {
      const r = (await remove.boundingBox())!;
      expect(r.x).toBeGreaterThanOrEqual(box.x);
      expect(r.x + r.width).toBeLessThanOrEqual(box.x + box.width);
    }
    await page.context().close();
  });

  it('sees the money at a glance: collected by method, a refund done, fees still owed', async () => {
    const show = await showWithClasses({ classes: [{ name: 'Hot rods' }] });
    const online = await enter(show.eventId, show.classIds[0]!, 'Online coupe');
    const refunded = await enter(show.eventId, show.classIds[0]!, 'Refunded wagon');
    const cash = await enter(show.eventId, show.classIds[0]!, 'Cash roadster');
    await enter(show.eventId, show.classIds[0]!, 'Unpaid sedan');
    await confirmEntryPayment(online.entry.id, 'ref-online');
    await confirmEntryPayment(refunded.entry.id, 'ref-refunded');
    // The payment service's refund of a withdrawn entry, as its webhook would leave it.
    await Entry.update({ status: 'withdrawn', refundDue: 2500, refundedAmount: 2500, refundRef: 're_1', refundedAt: new Date() }, { where: { id: refunded.entry.id } });
    expect((await show.organiser.client.post(`/api/entries/${cash.entry.id}/mark-paid`, { note: 'Cash' })).status).toBe(200);

    const page = await organiserPage(show.organiser.email, `/shows/${show.eventId}/entries`);
    const money = page.getByRole('region', { name: 'Money' });
    await money.getByRole('row', { name: /^Online/ }).waitFor();
    expect(await money.getByRole('row', { name: /^Online/ }).innerText()).toMatch(/€50\.00\s+€25\.00\s+€0\.00/);
    expect(await money.getByRole('row', { name: /^By hand/ }).innerText()).toMatch(/€25\.00\s+€0\.00\s+€0\.00/);
    expect(await money.getByRole('row', { name: /^All/ }).innerText()).toMatch(/€75\.00\s+€25\.00\s+€0\.00/);
    await money.getByText('Fees still owed: €25.00').waitFor();
    await page.context().close();
  });

  it('reads an entry’s history in words and in the show’s time zone', async () => {
    const show = await showWithClasses({ classes: [{ name: 'Customs' }, { name: 'Hot rods to 1948' }] });
    const car = await enter(show.eventId, show.classIds[0]!, 'Chopped coupe');
    expect((await show.organiser.client.post(`/api/entries/${car.entry.id}/class`, { classId: show.classIds[1] })).status).toBe(200);
    expect((await show.organiser.client.post(`/api/entries/${car.entry.id}/mark-paid`, { note: 'Cash at the club night' })).status).toBe(200);
    const entered = (await Entry.findByPk(car.entry.id))!.createdAt;
    // The show is in Europe/Berlin; the browser in Los Angeles.
    const berlin = new Intl.DateTimeFormat('en-GB', { timeZone: 'Europe/Berlin', hour: '2-digit', minute: '2-digit' }).format(entered);

    const page = await organiserPage(show.organiser.email, `/shows/${show.eventId}/entries`, 'America/Los_Angeles');
    await page.getByRole('button', { name: 'Chopped coupe' }).click();
    const history = page.getByRole('list', { name: 'History' });
    await history.getByText('Class: Customs → Hot rods to 1948').waitFor();
    await history.getByText(/Paid: €25\.00/).waitFor();
    await history.getByText(/Note: Cash at the club night/).waitFor();
    expect(await history.innerText()).not.toMatch(/paidAmount|className|→ 2500/);
    const created = history.getByRole('listitem').filter({ hasText: 'Entered' });
    expect(await created.locator('time').innerText()).toContain(berlin);
    await page.context().close();
  });
});
