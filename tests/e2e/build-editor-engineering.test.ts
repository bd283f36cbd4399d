import { describe, expect, it } from 'vitest';
import type { Locator } from 'playwright-core';
import { keepScreenshot, signInInBrowser, useBrowserAndServer } from '../support/browser';
import { createUser } from '../support/factories';
import { createBuild } from '../support/build-factory';

const env = useBrowserAndServer();

async function fill(form: Locator, entries: Array<[string, string]>) {
  for (const [label, value] of entries) await form.getByLabel(label, { exact: true }).fill(value);
}

describe('brake and front-geometry numbers in the build editor', () => {
  it('an owner enters a front double wishbone and a brake setup and sees the figures and the three diagrams', async () => {
    const { user, email, password } = await createUser({ name: 'Ilse Marrow' });
    const build = await createBuild(user.id, { title: 'The Quarry Roadster' });
    const context = await env.browser.newContext({ viewport: { width: 1366, height: 900 }, locale: 'en-GB' });
    const page = await context.newPage();
    await signInInBrowser(page, env.baseUrl, email, password, `/builds/${build.id}`);

    // The worked example of tests/shared/calc/front-geometry.test.ts: RC 102 mm, fvsa 1860 mm.
    const chassis = page.getByRole('form', { name: 'Chassis and suspension' });
    await fill(chassis, [
      ['Upper arm, inner pivot: x', '420'],
      ['Upper arm, inner pivot: y', '440'],
      ['Upper arm, ball joint: x', '660'],
      ['Upper arm, ball joint: y', '470'],
      ['Lower arm, inner pivot: x', '300'],
      ['Lower arm, inner pivot: y', '180'],
      ['Lower arm, ball joint: x', '700'],
      ['Lower arm, ball joint: y', '160'],
      ['Tyre contact patch: x (half the track)', '760'],
    ]);
    const panel = page.getByTestId('numbers-panel');
    const geometry = panel.locator('[data-numbers-group="frontGeometry"]');
    await expect.poll(() => geometry.getByRole('row', { name: /Roll-centre height/ }).textContent()).toMatch(/102\smm/);
    await expect.poll(() => geometry.getByRole('row', { name: /Swing-arm length/ }).textContent()).toMatch(/1\D?860\smm/);
    expect(await geometry.getByRole('row', { name: /Camber gain per 25 mm of bump/ }).textContent()).toMatch(/[-−]0\.\d\d°/);
    expect(await geometry.getByText(/Estimates for presentation, not engineering approval/).count()).toBe(1);
    await expect.poll(() => panel.getByTestId('front-view-sketch').count()).toBe(1);
    expect(await panel.getByTestId('camber-curve-chart').count()).toBe(1);

    // The brake chain of tests/shared/calc/brakes.test.ts ("works the whole chain"): 70.8 % front.
    const brakes = page.getByRole('form', { name: 'Brakes' });
    const rotor = async (end: 'Front' | 'Rear', mm: string) => {
      const group = brakes.getByRole('group', { name: `${end} brakes` });
      await group.getByLabel('Rotor or drum diameter', { exact: true }).fill(mm);
      await group.getByLabel('Caliper pistons', { exact: true }).fill(end === 'Front' ? '4' : '1');
      await group.getByLabel('Caliper kind', { exact: true }).selectOption(end === 'Front' ? 'opposed' : 'floating');
      await group.getByLabel('Pad friction coefficient (μ)', { exact: true }).fill(end === 'Front' ? '0.45' : '0.4');
    };
    await rotor('Front', '330');
    await rotor('Rear', '300');
    await fill(brakes, [
      ['Front caliper piston diameter', '38'],
      ['Front pad radial height', '50'],
      ['Rear caliper piston diameter', '38'],
      ['Rear pad radial height', '40'],
      ['Pedal ratio', '6'],
      ['Master cylinder bore', '22.2'],
    ]);
    await brakes.getByLabel('Pedal force', { exact: true }).fill('400');
    const brakeGroup = panel.locator('[data-numbers-group="brakes"]');
    await expect.poll(() => brakeGroup.getByRole('row', { name: /Brake split front \/ rear/ }).textContent()).toMatch(/70\.8\s?% \/ 29\.2\s?%/);
    expect(await brakeGroup.getByRole('row', { name: /Front line pressure/ }).textContent()).toMatch(/62\.0\d?\sbar/);
    expect(await panel.getByTestId('brake-split-bar').getAttribute('aria-label')).toBe('Brake torque: 71 % front, 29 % rear');
    expect(await brakeGroup.getByText(/Estimates for presentation/).count()).toBe(1);

    await keepScreenshot(panel, 'build-editor-engineering-panel-desktop.png');
    await page.setViewportSize({ width: 390, height: 844 });
    await page.getByTestId('section-numbers-chassis').scrollIntoViewIfNeeded();
    await keepScreenshot(page.getByTestId('section-numbers-chassis'), 'build-editor-engineering-chassis-phone.png');
    await context.close();
  }, 120_000);
});
