import { describe, expect, it } from 'vitest';
import { keepScreenshot, useBrowserAndServer } from '../support/browser';
import { createUser, uniqueEmail } from '../support/factories';
import { waitForMail } from '../support/mailbox';

const env = useBrowserAndServer();

describe('a newcomer in the browser', () => {
  it('signs up, confirms the address from the e-mail, signs out and signs back in', async () => {
    const admin = await createUser({ isSiteAdmin: true, name: 'Mail Reader' });
    const page = await env.browser.newPage({ viewport: { width: 390, height: 844 } });
    const email = uniqueEmail('browser');
    const password = 'a long browser password';

    await page.goto(`${env.baseUrl}/sign-up`);
    await page.getByRole('button', { name: 'Make my account' }).click();
    // The shared schema catches empty fields before anything is sent.
    await expect.poll(() => page.getByText('Enter a valid e-mail address.').count()).toBe(1);

    await page.getByLabel('Your name').fill('Kit Ellery');
    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password').fill(password);
    await page.getByRole('button', { name: 'Make my account' }).click();
    await page.getByRole('heading', { name: 'Check your inbox' }).waitFor();
    await page.getByText('Demo mode: mail is caught, not sent.').waitFor();
    await keepScreenshot(page, 'sign-up-check-inbox-phone.png', { fullPage: true });

    // Signed in before confirming (once the mail is there, as a person would): a banner asks for the confirmation.
    await waitForMail(email);
    await page.getByRole('link', { name: 'sign in', exact: true }).click();
    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password').fill(password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL(`${env.baseUrl}/builds`);
    const banner = page.getByRole('region', { name: 'Confirm your e-mail address' });
    await banner.waitFor();
    await keepScreenshot(page, 'verify-banner-phone.png', { fullPage: true });

    // The site admin reads the caught confirmation mail; the newcomer follows its link.
    const desk = await env.browser.newPage();
    await desk.goto(`${env.baseUrl}/sign-in`);
    await desk.getByLabel('E-mail').fill(admin.email);
    await desk.getByLabel('Password').fill(admin.password);
    await desk.getByRole('button', { name: 'Sign in' }).click();
    await desk.waitForURL(`${env.baseUrl}/admin/accounts`); // the site admin lands on the accounts
    await desk.getByRole('link', { name: 'Caught mail' }).click();
    await desk.getByRole('link', { name: new RegExp(`Confirm your e-mail address for Placard.*${email}`) }).click();
    const link = desk.getByRole('link', { name: /verify-email\?token=/ });
    await link.waitFor();
    await keepScreenshot(desk, 'caught-confirmation-mail.png', { fullPage: true });
    // The mail points at PUBLIC_BASE_URL; the test server listens elsewhere, so follow the same path here.
    const { pathname, search } = new URL((await link.getAttribute('href'))!);
    await desk.close();
    await page.goto(`${env.baseUrl}${pathname}${search}`);
    await page.getByText('Your e-mail address is confirmed.').waitFor();
    await keepScreenshot(page, 'verify-email-done-phone.png', { fullPage: true });
    await expect.poll(() => banner.count()).toBe(0);

    // Signing out lands on the home page (a whole new page load): wait for it before going on.
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.waitForURL(`${env.baseUrl}/`);
    await page.waitForLoadState('load');
    await expect.poll(() => page.getByRole('link', { name: 'Sign in' }).count()).toBeGreaterThan(0);

    await page.goto(`${env.baseUrl}/sign-in`);
    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password').fill('not my password');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await expect.poll(() => page.getByText('E-mail or password is not right.').count()).toBe(1);

    await page.getByLabel('Password').fill(password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL(`${env.baseUrl}/builds`);
    await page.getByText('Signed in as Kit Ellery.').waitFor();
    await keepScreenshot(page, 'signed-in-lands-on-my-builds-phone.png', { fullPage: true });
    expect(await banner.count()).toBe(0);

    // Signed in, the sign-in and sign-up pages say so instead of offering a form.
    for (const where of ['/sign-in', '/sign-up']) {
      await page.goto(`${env.baseUrl}${where}`);
      await page.getByText('You are signed in as Kit Ellery.').waitFor();
      expect(await page.getByLabel('Password').count()).toBe(0);
    }
    await page.getByRole('link', { name: 'Go to my builds' }).click();
    await page.waitForURL(`${env.baseUrl}/builds`);
    await page.close();
  });

  it('signs up on the way to a private page: the link, opened in the same browser, signs in and goes on there; elsewhere it only confirms', async () => {
    const email = uniqueEmail('on-the-way');
    const browser = await env.browser.newContext({ viewport: { width: 390, height: 844 } });
    const page = await browser.newPage();
    await page.goto(`${env.baseUrl}/account`);
    await page.waitForURL(/\/sign-in\?next=%2Faccount/);
    await page.getByRole('link', { name: 'New here? Make an account' }).click();
    await page.waitForURL(/\/sign-up\?next=%2Faccount/);
    await page.getByRole('heading', { name: 'Make an account' }).waitFor();
    await page.getByLabel('Your name').fill('Oren Castell');
    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password').fill('a long browser password');
    await page.getByRole('button', { name: 'Make my account' }).click();
    await page.getByRole('heading', { name: 'Check your inbox' }).waitFor();
    await keepScreenshot(page, 'sign-up-check-inbox-on-the-way-phone.png', { fullPage: true });

    // The mail's link, opened in a new tab of the same browser (as a mail app hands it over).
    const link = new URL((await waitForMail(email)).text.match(/http\S+verify-email\?token=\S+/)![0]);
    const tab = await browser.newPage();
    await tab.goto(`${env.baseUrl}${link.pathname}${link.search}`);
    await tab.waitForURL(`${env.baseUrl}/account`);
    await tab.getByText('Signed in as Oren Castell.').waitFor();
    expect(await tab.getByRole('region', { name: 'Confirm your e-mail address' }).count()).toBe(0);
    await keepScreenshot(tab, 'sign-up-link-signs-in-phone.png', { fullPage: true });
    await browser.close();

    // Someone else's browser: a second newcomer's link opened there confirms, and signs nobody in.
    const other = uniqueEmail('elsewhere');
    const signingUp = await env.browser.newPage();
    await signingUp.goto(`${env.baseUrl}/sign-up`);
    await signingUp.getByLabel('Your name').fill('Pell Varga');
    await signingUp.getByLabel('E-mail').fill(other);
    await signingUp.getByLabel('Password').fill('a long browser password');
    await signingUp.getByRole('button', { name: 'Make my account' }).click();
    await signingUp.getByRole('heading', { name: 'Check your inbox' }).waitFor();
    const otherLink = new URL((await waitForMail(other)).text.match(/http\S+verify-email\?token=\S+/)![0]);
    const elsewhere = await env.browser.newPage();
    await elsewhere.goto(`${env.baseUrl}${otherLink.pathname}${otherLink.search}`);
    await elsewhere.getByText('Your e-mail address is confirmed.').waitFor();
    await elsewhere.getByRole('link', { name: 'Sign in', exact: true }).first().waitFor();
    expect(new URL(elsewhere.url()).pathname).toBe('/verify-email');
    expect(await elsewhere.getByText(/Signed in as/).count()).toBe(0);
    await signingUp.close();
    await elsewhere.close();
  });

  it('sends a visitor to sign in before a private page, and back after', async () => {
    const page = await env.browser.newPage();
    await page.goto(`${env.baseUrl}/account`);
    await page.waitForURL(/\/sign-in\?next=%2Faccount/);
    await expect.poll(() => page.getByRole('heading', { name: 'Sign in' }).count()).toBe(1);
    await page.goto(`${env.baseUrl}/no/such/page`);
    await expect.poll(() => page.getByRole('heading', { name: 'Nothing parked here' }).count()).toBe(1);
    await page.close();
  });
});
