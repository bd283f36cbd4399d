import { describe, expect, it } from 'vitest';
import { keepScreenshot, openSignedIn, useBrowserAndServer } from '../support/browser';
import { createUser } from '../support/factories';
import { createBuild } from '../support/build-factory';

const env = useBrowserAndServer();

describe('lengths the sheet keeps in millimetres', () => {
  it('are typed in inches as well: the four-link’s centre of gravity height in inches is kept as millimetres', async () => {
    const { user, email, password } = await createUser({ name: 'Dace Morrow' });
    const build = await createBuild(user.id, { title: 'The Quarry Coupe' });
    const page = await env.browser.newPage({ viewport: { width: 1366, height: 900 }, locale: 'en-US' });
    await openSignedIn(page, env.baseUrl, email, password, `/builds/${build.id}`);

    const chassis = page.getByRole('form', { name: 'Chassis and suspension' });
    // A US browser works in inches: every box starts in inches.
    expect(await chassis.getByLabel('Centre of gravity height unit').inputValue()).toBe('in');
    const points = { 'Upper link, front pivot': [30, 16], 'Upper link, axle pivot': [2, 17], 'Lower link, front pivot': [32, 10], 'Lower link, axle pivot': [-2, 8] };
    for (const [pivot, [x, y]] of Object.entries(points)) {
      await chassis.getByLabel(`${pivot}: x`, { exact: true }).fill(String(x));
      await chassis.getByLabel(`${pivot}: y`, { exact: true }).fill(String(y));
    }
    const cg = chassis.getByLabel('Centre of gravity height', { exact: true });
    await cg.fill('18');
    // 18 in × 25.4 = 457.2 mm, exactly (NIST SP 811).
    await expect.poll(() => chassis.getByText('= 457.2 mm').count()).toBe(1);
    await expect.poll(async () => {
      const res = await page.request.get(`${env.baseUrl}/api/builds/${build.id}`);
      const body = (await res.json()) as { build: { sections: { chassis?: { rear?: { fourLink?: { cgHeightMm?: number; lowerRear?: { x: number } } } } } } };
      const link = body.build.sections.chassis?.rear?.fourLink;
      return [link?.cgHeightMm, link?.lowerRear?.x];
    }).toEqual([457.2, -50.8]);
    await cg.scrollIntoViewIfNeeded();
    await keepScreenshot(page, 'length-in-inches-desktop.png');

    // Shown again in millimetres, the same length.
    await chassis.getByLabel('Centre of gravity height unit').selectOption('mm');
    await expect.poll(() => cg.inputValue()).toBe('457.2');
    await page.close();
  });
  it('stores a four-link filled in part way, so it never holds back the rest of the chassis panel, and tells a range in the unit typed', async () => {
    const { user, email, password } = await createUser({ name: 'Dace Morrow' });
    const build = await createBuild(user.id, { title: 'The Flint Roadster' });
    const page = await env.browser.newPage({ viewport: { width: 1366, height: 900 }, locale: 'en-US' });
    await openSignedIn(page, env.baseUrl, email, password, `/builds/${build.id}`);
    const chassis = page.getByRole('form', { name: 'Chassis and suspension' });
    const stored = async () => {
      const res = await page.request.get(`${env.baseUrl}/api/builds/${build.id}`);
      const body = (await res.json()) as { build: { sections: { chassis?: { trackFront?: { value: number }; rear?: { fourLink?: { upperFront?: { x?: number; y?: number } } } } } } };
      return body.build.sections.chassis;
    };

    // One pivot's x only, then another field of the panel: both are stored.
    await chassis.getByLabel('Upper link, front pivot: x', { exact: true }).fill('22');
    await chassis.getByLabel('Front track', { exact: true }).fill('59');
    await expect.poll(async () => [(await stored())?.rear?.fourLink?.upperFront, (await stored())?.trackFront?.value]).toEqual([{ x: 558.8 }, 59]);
    await expect.poll(() => chassis.getByRole('status').textContent()).toBe('Saved');

    // Out of range in inches: the message leads with inches and names the box.
    const cg = chassis.getByLabel('Centre of gravity height', { exact: true });
    await cg.fill('9999');
    await chassis.getByText('Centre of gravity height must be between 3.94 and 59.06\u00a0in (100 to 1500 mm).').waitFor();
    await cg.scrollIntoViewIfNeeded();
    await keepScreenshot(page, 'length-in-inches-range-desktop.png');
    await page.close();
  });
});
