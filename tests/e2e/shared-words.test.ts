import { describe, expect, it } from 'vitest';
import { keepScreenshot, openSignedIn, useBrowserAndServer } from '../support/browser';
import { createUser } from '../support/factories';
import { createFullBuild } from '../support/build-factory';

const env = useBrowserAndServer();

// The words come from shared/: the range message in the unit the owner typed, the choice labels and
// the private details, on a phone and on a desktop.
describe('the editor says what shared/ says', () => {
  for (const viewport of [{ name: 'phone', width: 390, height: 844 }, { name: 'desktop', width: 1366, height: 900 }]) {
    it(`gives the range in the owner's unit and the shared choice labels (${viewport.name})`, async () => {
      const { user, email, password } = await createUser({ name: 'Rowan Teller' });
      const build = await createFullBuild(user.id, { vin: 'VIN-OF-THE-OWNER-1' });
      const context = await env.browser.newContext({ viewport, locale: 'en-US' });
      const page = await context.newPage();
      await openSignedIn(page, env.baseUrl, email, password, `/builds/${build.id}`);

      const engine = page.getByRole('form', { name: 'Engine' });
      await engine.getByLabel('Bore unit').selectOption('in');
      await engine.getByLabel('Bore', { exact: true }).fill('9');
      // Beside the field and in the form's list of what to fix: the same words, from the shared schema.
      const rangeMessage = engine.getByText(/Bore must be between 0\.79 and 7\.87\s*in \(20 to 200 mm\)\./);
      await expect.poll(() => rangeMessage.count()).toBeGreaterThan(0);
      await rangeMessage.first().scrollIntoViewIfNeeded();
      await keepScreenshot(page, `shared-words-range-${viewport.name}.png`);

      const chassis = page.getByRole('form', { name: 'Chassis and suspension' });
      expect(await chassis.getByLabel('Frame').locator('option:checked').innerText()).toBe('Custom tube');
      expect(await chassis.getByRole('group', { name: 'Front suspension' }).getByLabel('Type').locator('option:checked').innerText()).toBe('Double-wishbone');
      // The owner sees their own private details (the policy's viewPrivate).
      await expect.poll(() => page.getByLabel('VIN or chassis number').inputValue()).toBe('VIN-OF-THE-OWNER-1');
      await chassis.scrollIntoViewIfNeeded();
      await keepScreenshot(page, `shared-words-editor-${viewport.name}.png`);

      await page.goto(`${env.baseUrl}/builds`);
      await expect.poll(() => page.getByText('Power (wheels)').count()).toBe(1);
      await keepScreenshot(page, `shared-words-my-builds-${viewport.name}.png`, { fullPage: true });

      await page.goto(`${env.baseUrl}/c/${build.code}`);
      await expect.poll(() => page.getByText('Custom tube frame', { exact: false }).count()).toBeGreaterThan(0);
      expect(await page.getByText('VIN-OF-THE-OWNER-1').count()).toBe(0);
      await keepScreenshot(page, `shared-words-public-${viewport.name}.png`, { fullPage: true });
      await context.close();
    });
  }
});
