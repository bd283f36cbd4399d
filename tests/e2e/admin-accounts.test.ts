import { describe, expect, it } from 'vitest';
import path from 'node:path';
import { SCREENSHOT_DIR, useBrowserAndServer } from '../support/browser';
import { createUser } from '../support/factories';
import { createBuild } from '../support/build-factory';
import { waitForMail } from '../support/mailbox';

const env = useBrowserAndServer();

describe('the site admin’s accounts page', () => {
  it('opens an account, disables it (its public page goes offline), enables it again and sends it a reset link', async () => {
    const admin = await createUser({ isSiteAdmin: true, name: 'Keeper Of Accounts' });
    const owner = await createUser({ name: 'Odalys Brennecke' });
    const build = await createBuild(owner.user.id, { title: 'Bronze fastback', published: true });

    const page = await env.browser.newPage({ viewport: { width: 1280, height: 900 } });
    await page.goto(`${env.baseUrl}/sign-in`);
    await page.getByLabel('E-mail').fill(admin.email);
    await page.getByLabel('Password').fill(admin.password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL(/\/(account|builds)$/);
    await page.goto(`${env.baseUrl}/admin/accounts`);
    await page.getByLabel('Search by name or e-mail').fill('Brennecke');
    await page.getByText('1 account in all.').waitFor();
    await page.getByRole('button', { name: 'Open Odalys Brennecke' }).click();
    const panel = page.getByRole('region', { name: 'Odalys Brennecke' });
    await panel.getByText('1 build', { exact: true }).waitFor();
    await panel.getByText('Bronze fastback').waitFor();
    await panel.getByText('Never').waitFor(); // never signed in

    await panel.getByRole('button', { name: 'Disable the account' }).click();
    const dialog = page.getByRole('dialog', { name: 'Disable Odalys Brennecke?' });
    await dialog.getByText('public pages of their 1 published build go').waitFor();
    await page.screenshot({ path: path.join(SCREENSHOT_DIR, 'admin-disable-confirm.png') });
    await dialog.getByRole('button', { name: 'Disable' }).click();
    await panel.getByText(/Disabled since \d{4}-\d{2}-\d{2}/).waitFor();
    await page.getByRole('cell', { name: 'Disabled' }).waitFor();
    await page.screenshot({ path: path.join(SCREENSHOT_DIR, 'admin-account-disabled.png'), fullPage: true });
    expect((await fetch(`${env.baseUrl}/c/${build.code}`)).status).toBe(404);

    await panel.getByRole('button', { name: 'Enable the account' }).click();
    await panel.getByText('Active').waitFor();
    expect((await fetch(`${env.baseUrl}/c/${build.code}`)).status).toBe(200);

    await panel.getByRole('button', { name: 'Send a password-reset e-mail' }).click();
    await panel.getByText(`A reset link went to ${owner.email}.`).waitFor();
    expect((await waitForMail(owner.email)).subject).toMatch(/Reset your Placard password/);

    // The admin's own row cannot be disabled.
    await page.getByLabel('Search by name or e-mail').fill(admin.email);
    await page.getByRole('button', { name: 'Open Keeper Of Accounts' }).click();
    expect(await page.getByRole('button', { name: 'Disable the account' }).isDisabled()).toBe(true);

    const phone = await env.browser.newPage({ viewport: { width: 390, height: 844 } });
    await phone.context().addCookies(await page.context().cookies());
    await phone.goto(`${env.baseUrl}/admin/accounts`);
    await phone.getByText(/\d+ accounts? in all\./).waitFor();
    // Nothing pushes the page sideways on a phone: each account is a block, not a wide table row.
    expect(await phone.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
    await phone.getByRole('button', { name: `Open ${owner.user.name}` }).click();
    await phone.getByRole('region', { name: owner.user.name }).getByText('Bronze fastback').waitFor();
    await phone.screenshot({ path: path.join(SCREENSHOT_DIR, 'admin-accounts-phone.png'), fullPage: true });
  });
});
