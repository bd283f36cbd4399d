import { describe, it } from 'vitest';
import { keepScreenshot, useBrowserAndServer } from '../support/browser';
import { createUser } from '../support/factories';

const env = useBrowserAndServer();

describe('a forgotten password, in demo mode', () => {
  it('is reset through the e-mail the site admin reads under Caught mail', async () => {
    const admin = await createUser({ isSiteAdmin: true, name: 'Demo Admin' });
    const forgetful = await createUser({ name: 'Forgetful Owner' });

    const phone = await env.browser.newPage({ viewport: { width: 390, height: 844 } });
    await phone.goto(`${env.baseUrl}/sign-in`);
    await phone.getByRole('link', { name: 'Forgot your password?' }).click();
    // The screen loads lazily; until its heading shows, the sign-in form (with its own E-mail) is still up.
    await phone.getByRole('heading', { name: 'Reset your password' }).waitFor();
    await phone.getByLabel('E-mail').fill(forgetful.email);
    await phone.getByRole('button', { name: 'Send the link' }).click();
    await phone.getByText('a reset link is on its way').waitFor();
    await phone.getByText('Demo mode: mail is caught, not sent.').waitFor();

    const desk = await env.browser.newPage();
    await desk.goto(`${env.baseUrl}/sign-in`);
    await desk.getByLabel('E-mail').fill(admin.email);
    await desk.getByLabel('Password').fill(admin.password);
    await desk.getByRole('button', { name: 'Sign in' }).click();
    await desk.waitForURL(`${env.baseUrl}/admin/accounts`); // the site admin lands on the accounts
    await desk.getByRole('link', { name: 'Caught mail' }).click();
    await desk.getByRole('link', { name: new RegExp(`Reset your Placard password.*${forgetful.email}`) }).click();
    const link = desk.getByRole('link', { name: /reset-password\?token=/ });
    await link.waitFor();
    await keepScreenshot(desk, 'caught-mail.png', { fullPage: true });
    // The mail points at PUBLIC_BASE_URL; the test server listens elsewhere, so follow the same path here.
    const { pathname, search } = new URL((await link.getAttribute('href'))!);
    await phone.goto(`${env.baseUrl}${pathname}${search}`);

    await phone.getByLabel('New password').fill('short');
    await phone.getByRole('button', { name: 'Save the new password' }).click();
    await phone.getByText('Password must be at least 10 characters.').waitFor();
    await phone.getByLabel('New password').fill('a new and longer password');
    await phone.getByRole('button', { name: 'Save the new password' }).click();
    await phone.waitForURL(/\/sign-in\?reset=done/);
    await phone.getByText('Your password is changed.').waitFor();
    await phone.getByLabel('E-mail').fill(forgetful.email);
    await phone.getByLabel('Password').fill('a new and longer password');
    await phone.getByRole('button', { name: 'Sign in' }).click();
    await phone.waitForURL(`${env.baseUrl}/builds`);
    await phone.getByText('Signed in as Forgetful Owner.').waitFor();
  });
});
