import { describe, expect, it } from 'vitest';
import { randomUUID } from 'node:crypto';
import type { Browser, Page } from 'playwright-core';
import { keepScreenshot, openSignedIn, useBrowserAndServer } from '../support/browser';
import { createUser } from '../support/factories';
import { createBuild } from '../support/build-factory';
import { waitForMail } from '../support/mailbox';

const env = useBrowserAndServer();

async function signInAs(browser: Browser, baseUrl: string, who: { email: string; password: string }, viewport: { width: number; height: number }): Promise<Page> {
  const page = await browser.newPage({ viewport });
  await openSignedIn(page, baseUrl, who.email, who.password, '/admin/accounts');
  return page;
}

/** Accounts whose e-mails share one tag, so a search shows exactly them; long addresses test the wrapping. */
async function threeSams() {
  const tag = `tag${randomUUID().slice(0, 8)}`;
  const names = ['Sam Ferrier', 'Samira Quennell-Abernathy', 'Samson Oddleigh'];
  for (const [i, name] of names.entries()) {
    const { user } = await createUser({ name, email: `${name.split(' ')[0]!.toLowerCase()}.workshop-correspondence-${i}.${tag}@example.test`, mayOrganise: i === 1 });
    if (i === 0) await user.update({ lastSignInAt: new Date() }); // one row with a date and a time to wrap
  }
  return { tag, names };
}

describe('the site admin’s accounts page', () => {
  it('opens an account, disables it (its owner is told so at sign-in, no reset link is offered), enables it again and sends it a reset link', async () => {
    const admin = await createUser({ isSiteAdmin: true, name: 'Keeper Of Accounts' });
    const owner = await createUser({ name: 'Odalys Brennecke' });
    const build = await createBuild(owner.user.id, { title: 'Bronze fastback', published: true });

    const page = await signInAs(env.browser, env.baseUrl, admin, { width: 1280, height: 900 });
    await page.getByLabel('Search by name or e-mail').fill('Brennecke');
    await page.getByText('1 account matches “Brennecke”.').waitFor();
    await page.getByRole('button', { name: 'Open Odalys Brennecke' }).click();
    const panel = page.getByRole('region', { name: 'Odalys Brennecke' });
    await panel.getByText('1 build', { exact: true }).waitFor();
    await panel.getByText('Bronze fastback').waitFor();
    await panel.getByText('Never').waitFor(); // never signed in

    await panel.getByRole('button', { name: 'Disable the account' }).click();
    const dialog = page.getByRole('dialog', { name: 'Disable Odalys Brennecke?' });
    await dialog.getByText('public pages of their 1 published build go').waitFor();
    await keepScreenshot(page, 'admin-disable-confirm.png');
    await dialog.getByRole('button', { name: 'Disable' }).click();
    await panel.getByText(/Disabled since \d{4}-\d{2}-\d{2}/).waitFor();
    await page.getByRole('cell', { name: 'Disabled' }).waitFor();
    // A disabled account is offered no reset link, and the panel says why.
    await panel.getByText('No password-reset e-mail while the account is disabled: enable it first.', { exact: false }).waitFor();
    expect(await panel.getByRole('button', { name: 'Send a password-reset e-mail' }).count()).toBe(0);
    await keepScreenshot(page, 'admin-account-disabled.png', { fullPage: true });
    expect((await fetch(`${env.baseUrl}/c/${build.code}`)).status).toBe(404);

    // Its owner, with the right password, is told the account is turned off; a wrong password hears the usual answer.
    const ownerPage = await env.browser.newPage({ viewport: { width: 390, height: 844 } });
    await ownerPage.goto(`${env.baseUrl}/sign-in`);
    await ownerPage.getByLabel('E-mail').fill(owner.email);
    await ownerPage.getByLabel('Password').fill(owner.password);
    await ownerPage.getByRole('button', { name: 'Sign in' }).click();
    await ownerPage.getByText('This account is turned off. Ask the site admin.').waitFor();
    await keepScreenshot(ownerPage, 'sign-in-turned-off.png');
    await ownerPage.getByLabel('Password').fill(`${owner.password}-wrong`);
    await ownerPage.getByRole('button', { name: 'Sign in' }).click();
    await ownerPage.getByText('E-mail or password is not right.').waitFor();
    expect(await ownerPage.getByText('This account is turned off').count()).toBe(0);
    await ownerPage.close();

    await panel.getByRole('button', { name: 'Enable the account' }).click();
    await panel.getByText('Active').waitFor();
    expect((await fetch(`${env.baseUrl}/c/${build.code}`)).status).toBe(200);

    await panel.getByRole('button', { name: 'Send a password-reset e-mail' }).click();
    await panel.getByText(`A reset link went to ${owner.email}.`).waitFor();
    const mail = await waitForMail(owner.email);
    expect(mail.subject).toMatch(/Reset your Placard password/);
    expect(mail.text).toMatch(/The site admin of Placard sent you this link/);

    // The admin's own row cannot be disabled.
    await page.getByLabel('Search by name or e-mail').fill(admin.email);
    await page.getByRole('button', { name: 'Open Keeper Of Accounts' }).click();
    expect(await page.getByRole('button', { name: 'Disable the account' }).isDisabled()).toBe(true);
  });

  it('says how many accounts a search matched, or that none did', async () => {
    const admin = await createUser({ isSiteAdmin: true, name: 'Keeper Of Counts' });
    const { tag } = await threeSams();
    const page = await signInAs(env.browser, env.baseUrl, admin, { width: 1366, height: 900 });
    await page.getByText(/^[\d,]+ accounts in all\.$/).waitFor();
    const search = page.getByLabel('Search by name or e-mail');
    await search.fill(tag);
    await page.getByRole('status').getByText(`3 accounts match “${tag}”.`).waitFor();
    await search.fill(`zzz${tag}`);
    await page.getByRole('status').getByText(`No account matches “zzz${tag}”.`).waitFor();
    await page.getByText('Try part of a name or an e-mail.').waitFor();
    expect(await page.getByText(/in all\./).count()).toBe(0);
  });

  it('fits the table inside its box at 1024, 1366 and 1920 px: every column shows, nothing scrolls sideways', async () => {
    const admin = await createUser({ isSiteAdmin: true, name: 'Keeper Of Widths' });
    const { tag, names } = await threeSams();
    const page = await signInAs(env.browser, env.baseUrl, admin, { width: 1366, height: 900 });
    for (const width of [1024, 1366, 1920]) {
      await page.setViewportSize({ width, height: 900 });
      await page.goto(`${env.baseUrl}/admin/accounts`);
      await page.getByLabel('Search by name or e-mail').fill(tag);
      await page.getByText(`3 accounts match “${tag}”.`).waitFor();
      const box = page.getByTestId('accounts-table-box');
      await box.getByRole('button', { name: `Open ${names[1]}` }).waitFor();
      const fit = await box.evaluate((el) => {
        const outer = el.getBoundingClientRect();
        const cells = [...el.querySelectorAll('th, td')].map((c) => c.getBoundingClientRect());
        return {
          sideways: el.scrollWidth - el.clientWidth,
          page: document.documentElement.scrollWidth - window.innerWidth,
          outside: cells.filter((r) => r.left < outer.left - 0.5 || r.right > outer.right + 0.5).length,
          columns: el.querySelectorAll('th').length,
        };
      });
      expect(fit, `at ${width} px`).toEqual({ sideways: 0, page: 0, outside: 0, columns: 7 });
      // The Open button is whole and inside the box, so its label reads "Open", not a clipped "Op".
      const open = (await box.getByRole('button', { name: `Open ${names[0]}` }).boundingBox())!;
      const outer = (await box.boundingBox())!;
      expect(open.x + open.width).toBeLessThanOrEqual(outer.x + outer.width);
      await keepScreenshot(page, `admin-accounts-${width}.png`, { fullPage: true });
    }
  });

  it('on a phone shows a card per account: labelled values, each switch on its role’s line, buttons named for the account', async () => {
    const admin = await createUser({ isSiteAdmin: true, name: 'Keeper Of Phones' });
    const { tag, names } = await threeSams();
    const phone = await signInAs(env.browser, env.baseUrl, admin, { width: 390, height: 844 });
    await phone.getByLabel('Search by name or e-mail').fill(tag);
    await phone.getByText(`3 accounts match “${tag}”.`).waitFor();
    expect(await phone.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);

    for (const name of names) {
      const card = phone.getByRole('listitem', { name });
      await card.getByRole('button', { name: `Open ${name}` }).waitFor();
      expect(await card.getByRole('term').allTextContents()).toEqual(['E-mail', 'Status', 'Joined', 'Last sign-in']);
      for (const role of ['May organise', 'Site admin']) {
        const label = (await card.getByText(role, { exact: true }).boundingBox())!;
        const toggle = (await card.getByRole('switch', { name: `${role}: ${name}` }).boundingBox())!;
        // Same line: the switch's middle sits level with its label, to the label's right.
        expect(Math.abs(label.y + label.height / 2 - (toggle.y + toggle.height / 2))).toBeLessThan(4);
        expect(toggle.x).toBeGreaterThan(label.x + label.width);
      }
    }
    expect(await phone.getByRole('listitem', { name: names[1] }).getByRole('switch', { name: `May organise: ${names[1]}` }).getAttribute('aria-checked')).toBe('true');
    await keepScreenshot(phone, 'admin-accounts-phone.png', { fullPage: true });

    await phone.getByRole('button', { name: `Open ${names[0]}` }).click();
    await phone.getByRole('region', { name: names[0] }).getByText('No builds yet.').waitFor();
    await keepScreenshot(phone, 'admin-account-open-phone.png', { fullPage: true });
  });
});
