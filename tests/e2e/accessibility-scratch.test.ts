import { it } from 'vitest';
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { useBrowserAndServer, signInInBrowser } from '../support/browser';
import { createUser, DEFAULT_PASSWORD } from '../support/factories';
import { createFullBuild } from '../support/build-factory';

const env = useBrowserAndServer();
const AXE = readFileSync(createRequire(import.meta.url).resolve('axe-core/axe.min.js'), 'utf8');
it('times', { timeout: 300_000 }, async () => {
  const { user, email } = await createUser({ name: 'T T' });
  const full = await createFullBuild(user.id);
  const page = await (await env.browser.newContext({ viewport: { width: 390, height: 844 }, isMobile: true, bypassCSP: true })).newPage();
  await signInInBrowser(page, env.baseUrl, email, DEFAULT_PASSWORD, `/builds/${full.id}`);
  await page.locator('h1').first().waitFor();
  await page.waitForTimeout(1500);
  let t = performance.now();
  await page.addScriptTag({ content: AXE });
  console.log('inject', performance.now() - t);
  console.log('dom size', await page.evaluate(() => document.querySelectorAll('*').length));
  for (const opts of [{ resultTypes: ['violations'] }, { resultTypes: ['violations'] }, { resultTypes: ['violations'], selectors: false }, { resultTypes: ['violations'], rules: { 'color-contrast': { enabled: false } } }]) {
    t = performance.now();
    await page.evaluate(async (o) => (window as any).axe.run(document, o), opts);
    console.log(JSON.stringify(opts), performance.now() - t);
  }
  for (const opts of [{ runOnly: ['label'] }, { runOnly: ['label'], preload: false }, { runOnly: ['label'], preload: false, selectors: false, ancestry: false, xpath: false }, { resultTypes: ['violations'], preload: false }, { resultTypes: ['violations'], preload: false, rules: { 'target-size': { enabled: false } } }]) {
    t = performance.now();
    await page.evaluate(async (o) => (window as any).axe.run(document, o), opts);
    console.log(JSON.stringify(opts), performance.now() - t);
  }
  const raw = await page.evaluate(async () => { const t = performance.now(); await (window as any).axe.run(document, { runOnly: ['label'], preload: false }); return performance.now() - t; });
  console.log('in-page label', raw);
});
