import { describe, expect, it } from 'vitest';
import { keepScreenshot, openSignedIn, useBrowserAndServer } from '../support/browser';
import { createUser } from '../support/factories';
import { createBuild } from '../support/build-factory';

const env = useBrowserAndServer();

describe('a figure’s live conversion', () => {
  it('shows a good spring rate in the other system, and never dresses up a negative one', async () => {
    const { user, email, password } = await createUser({ name: 'Tobin Raske' });
    const build = await createBuild(user.id, { title: 'The Cinder Sedan' });
    const page = await env.browser.newPage({ viewport: { width: 390, height: 844 }, locale: 'en-GB' });
    await openSignedIn(page, env.baseUrl, email, password, `/builds/${build.id}`);

    const chassis = page.getByRole('form', { name: 'Chassis and suspension' });
    const field = chassis.getByRole('group', { name: 'Spring rate' }).first();
    const box = field.getByLabel('Spring rate', { exact: true });
    await field.getByLabel('Spring rate unit').selectOption('N/mm');
    await box.fill('40');
    // 40 N/mm = 228 lb/in (1 lbf = 4.448222 N, 1 in = 25.4 mm; NIST SP 811).
    await expect.poll(() => field.innerText()).toMatch(/≈ 228\s*lb\/in/);

    await box.fill('-40');
    await expect.poll(() => box.getAttribute('aria-invalid')).toBe('true');
    await expect.poll(() => field.getByRole('alert').count()).toBeGreaterThan(0);
    expect(await field.innerText()).not.toContain('≈');
    await field.scrollIntoViewIfNeeded();
    await keepScreenshot(page, 'figure-input-negative-phone.png');
    await page.close();
  });
});
