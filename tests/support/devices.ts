import type { BrowserContextOptions, CDPSession, Page } from 'playwright-core';

/** A device a screen is checked on: the context options a page of its own would be made with. */
export type Device = { name: 'phone' | 'desktop'; options: BrowserContextOptions & { viewport: { width: number; height: number } } };

export const PHONE: Device = { name: 'phone', options: { viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true } };
export const DESKTOP: Device = { name: 'desktop', options: { viewport: { width: 1366, height: 900 } } };

const sessions = new WeakMap<Page, Promise<CDPSession>>();
const shownAs = new WeakMap<Page, Device>();

/**
 * Draws the screen now shown again as `device` would, without loading it again: Chromium's own
 * device emulation (the size, the screen, mobile or not, touch or not; what Playwright sets for a
 * context made with `device.options`), changed in place. The client picks its layout by width alone
 * (`tests/e2e/accessibility.test.ts` fails when a stylesheet or the client starts asking about the
 * pointer or touch, which a switch from a touch screen does not undo), so the screen re-drawn is the one
 * that device would load. Fails when the page does not then have the device's width.
 */
export async function showAs(page: Page, device: Device): Promise<void> {
  if (shownAs.get(page) === device) return;
  let session = sessions.get(page);
  if (!session) sessions.set(page, (session = page.context().newCDPSession(page)));
  const cdp = await session;
  const { width, height } = device.options.viewport;
  const mobile = device.options.isMobile === true;
  await Promise.all([
    cdp.send('Emulation.setDeviceMetricsOverride', {
      mobile,
      width,
      height,
      screenWidth: width,
      screenHeight: height,
      deviceScaleFactor: device.options.deviceScaleFactor ?? 1,
      screenOrientation: mobile && height > width ? { angle: 0, type: 'portraitPrimary' } : { angle: 0, type: 'landscapePrimary' },
    }),
    cdp.send('Emulation.setTouchEmulationEnabled', { enabled: device.options.hasTouch === true }),
  ]);
  const drawnAt = await page.evaluate(() => [innerWidth, navigator.maxTouchPoints > 0]);
  if (drawnAt[0] !== width || drawnAt[1] !== (device.options.hasTouch === true)) throw new Error(`the page did not turn into a ${device.name}: ${JSON.stringify(drawnAt)}`);
  shownAs.set(page, device);
}

