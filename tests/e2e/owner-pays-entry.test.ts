import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { config } from '@server/config';
import { User } from '@server/models/user';
import { Entry } from '@server/models/entry';
import { launchBrowser, keepScreenshot, openSignedIn } from '../support/browser';
import { createBuild } from '../support/build-factory';
import { showWithClasses } from '../support/event-factory';
import { DEFAULT_PASSWORD, uniqueEmail } from '../support/factories';
import { waitForMailAbout } from '../support/mailbox';
import { useFakePayments } from '../support/payments';

// An owner's whole way into a paid show: sign up, confirm the address, enter a car, pay on the
// payment service's page (the local fake), come back and see the entry confirmed.
const env = useFakePayments();
let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
  // The payment service sends the payer back to PUBLIC_BASE_URL; here that is this file's server.
  config.publicBaseUrl = env.baseUrl;
});
afterAll(async () => browser?.close());

describe('an owner entering a paid show', () => {
  it('confirms the e-mail, enters, pays the fee and sees the entry confirmed', async () => {
    const { slug, eventId, organiser } = await showWithClasses({ settings: { name: 'Lantern Hill Drive-In', entryFee: 3000, currency: 'USD' }, classes: [{ name: 'Early iron' }] });
    const page = await browser.newPage({ viewport: { width: 390, height: 844 } });
    const email = uniqueEmail('payer');

    await page.goto(`${env.baseUrl}/sign-up`);
    await page.getByLabel('Your name').fill('Rae Paysworth');
    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password').fill('a long payer password');
    await page.getByRole('button', { name: 'Make my account' }).click();
    await page.getByRole('heading', { name: 'Check your inbox' }).waitFor();

    // Entering needs a confirmed address: follow the mail's link (its path, on this server).
    const mail = await waitForMailAbout(email, /confirm/i);
    const link = /https?:\/\/\S+verify-email\?token=[\w-]+/.exec(mail.text)![0];
    const { pathname, search } = new URL(link);
    await page.goto(`${env.baseUrl}${pathname}${search}`);
    // Opened in the browser that signed up, the link confirms and signs in: on to My builds.
    await page.waitForURL(`${env.baseUrl}/builds`);
    await page.getByText('Signed in as Rae Paysworth.').waitFor();

    // A published build of theirs (made directly: the build editor has its own browser test).
    const user = (await User.findOne({ where: { email } }))!;
    await createBuild(user.id, { title: 'Sectioned sedan delivery', published: true });

    await page.goto(`${env.baseUrl}/enter/${slug}`);
    await page.getByLabel('Your car').selectOption({ label: 'Sectioned sedan delivery' });
    await page.getByLabel('Class').selectOption({ label: 'Early iron (No limit on places)' }); // each class says its places left
    await page.getByRole('button', { name: 'Enter the car' }).click();
    await page.waitForURL(`${env.baseUrl}/entries`);
    await page.getByText('Pay the entry fee of $30.00 to confirm number 1.').waitFor();
    await keepScreenshot(page, 'entry-awaiting-payment-phone.png', { fullPage: true });

    await page.getByRole('button', { name: 'Pay $30.00' }).click();
    await page.waitForURL(/\/pay\//);
    await page.getByText('Entry 1 — Lantern Hill Drive-In').waitFor();
    await keepScreenshot(page, 'fake-checkout-phone.png', { fullPage: true });
    await page.getByRole('button', { name: 'Pay $30.00' }).click();

    await page.waitForURL(/\/entries\?paid=\d+/);
    await page.getByText('Paid, thank you: number 1 in Lantern Hill Drive-In is confirmed.').waitFor();
    await keepScreenshot(page, 'entry-paid-phone.png', { fullPage: true });
    const entry = (await Entry.findOne({ where: { ownerId: user.id } }))!;
    expect(entry).toMatchObject({ status: 'confirmed', paidAmount: 3000 });
    await waitForMailAbout(email, /paid|confirmed/i);

    // The organiser sees the paid entry in the show's entries table.
    const desk = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    await openSignedIn(desk, env.baseUrl, organiser.email, DEFAULT_PASSWORD, `/shows/${eventId}/entries`);
    const row = desk.getByRole('row', { name: /Sectioned sedan delivery/ });
    await row.waitFor();
    await expect.poll(() => row.innerText()).toMatch(/Rae Paysworth[\s\S]*Confirmed[\s\S]*Paid/);
    await keepScreenshot(desk, 'organiser-sees-paid-entry.png', { fullPage: true });
  });
});
