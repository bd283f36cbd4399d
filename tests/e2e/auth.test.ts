import { describe, expect, it } from 'vitest';
import path from 'node:path';
import { SCREENSHOT_DIR, useBrowserAndServer } from '../support/browser';
import { uniqueEmail } from '../support/factories';

const env = useBrowserAndServer();

describe('a newcomer in the browser', () => {
  it('signs up, signs out and signs back in', async () => {
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
    await page.waitForURL(`${env.baseUrl}/account`);
    await expect.poll(() => page.getByRole('heading', { name: 'Account' }).count()).toBe(1);
    await page.screenshot({ path: path.join(SCREENSHOT_DIR, 'account-phone.png'), fullPage: true });

    await page.getByRole('button', { name: 'Sign out' }).click();
    await expect.poll(() => page.getByRole('link', { name: 'Sign in' }).count()).toBeGreaterThan(0);

    await page.goto(`${env.baseUrl}/sign-in`);
    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password').fill('not my password');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await expect.poll(() => page.getByText('E-mail or password is not right.').count()).toBe(1);

    await page.getByLabel('Password').fill(password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL(`${env.baseUrl}/account`);
    await page.getByText('Signed in as Kit Ellery.').waitFor();
    await page.close();
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
