import { describe, expect, it } from 'vitest';
import { keepScreenshot, openSignedIn, useBrowserAndServer } from '../support/browser';
import { createUser } from '../support/factories';
import { createFullBuild } from '../support/build-factory';

const env = useBrowserAndServer();

describe('My builds in one unit system', () => {
  it.each([
    ['phone', { width: 390, height: 844 }],
    ['desktop', { width: 1366, height: 900 }],
  ] as const)('on a %s: every figure in the owner’s units, switched with one press and remembered', async (device, viewport) => {
    const owner = await createUser({ name: 'Wynn Halloran' });
    await createFullBuild(owner.user.id);
    const context = await env.browser.newContext({ viewport, locale: 'en-GB' });
    const page = await context.newPage();
    await openSignedIn(page, env.baseUrl, owner.email, owner.password);

    const card = page.getByRole('listitem').filter({ hasText: 'Night Shift' });
    const figures = () => card.locator('dd').allInnerTexts();
    await expect.poll(figures).toHaveLength(3);
    // Metric for a British browser: power in kW, displacement in litres, weight in kilograms; no hp, PS or cm³ beside them.
    expect((await figures()).join(' | ')).toMatch(/kW.*\|.*L.*\|.*kg/);
    expect((await figures()).join(' ')).not.toMatch(/hp|PS|cm³|lb/);
    await keepScreenshot(page, `my-builds-metric-${device}.png`, { fullPage: true });

    await page.getByRole('button', { name: 'Imperial' }).click();
    await expect.poll(async () => (await figures()).join(' | ')).toMatch(/hp.*\|.*in³.*\|.*lb/);
    await page.reload();
    await expect.poll(async () => (await figures()).join(' | ')).toMatch(/hp.*\|.*in³.*\|.*lb/);
    expect(await page.getByRole('button', { name: 'Imperial' }).getAttribute('aria-pressed')).toBe('true');
    await keepScreenshot(page, `my-builds-imperial-${device}.png`, { fullPage: true });
    await context.close();
  });
});
