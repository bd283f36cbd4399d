import { describe, expect, it } from 'vitest';
import type { Locator } from 'playwright-core';
import { keepScreenshot, openSignedIn, useBrowserAndServer } from '../support/browser';
import { createUser } from '../support/factories';
import { createBuild } from '../support/build-factory';
import { findBuild, setPublished } from '@server/services/builds/builds';

const env = useBrowserAndServer();

async function fill(form: Locator, entries: Array<[string, string]>) {
  for (const [label, value] of entries) await form.getByLabel(label, { exact: true }).fill(value);
}

describe('brake and front-geometry numbers in the build editor', () => {
  it('an owner enters a front double wishbone, a brake setup and a tilted weigh-in, sees the figures and the three diagrams, and shows them to visitors', async () => {
    const { user, email, password } = await createUser({ name: 'Ilse Marrow' });
    const build = await createBuild(user.id, { title: 'The Quarry Roadster' });
    const context = await env.browser.newContext({ viewport: { width: 1366, height: 900 }, locale: 'en-GB' });
    const page = await context.newPage();
    await openSignedIn(page, env.baseUrl, email, password, `/builds/${build.id}`);

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
    // Piston sizes one by one: the opposed front caliper's one side, the floating rear's only piston.
    await fill(brakes, [
      ['Front piston 1 diameter', '38'],
      ['Front piston 2 diameter', '38'],
      ['Front pad radial height', '50'],
      ['Rear piston 1 diameter', '38'],
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

    // A tilted reading in the weigh-ins panel gives the CG height: 1,000 kg, front raised 300 mm on a
    // 2,500 mm wheelbase, the rear scales 8.12 kg heavier: 468 mm (as tests/server/api/engineering-figures.test.ts).
    await chassis.getByLabel('Wheelbase', { exact: true }).fill('2500');
    await page.getByRole('button', { name: 'Add a weigh-in' }).click();
    const weighIn = page.getByRole('form', { name: 'Add a weigh-in' });
    await fill(weighIn, [['LF · Left front', '250'], ['RF · Right front', '250'], ['LR · Left rear', '250'], ['RR · Right rear', '250']]);
    await weighIn.getByLabel('Add a tilted reading (for the centre-of-gravity height)').check();
    await weighIn.getByLabel('Axle raised', { exact: true }).selectOption('front');
    await fill(weighIn, [['Height the axle was raised', '300'], ['Left rear scale, tilted (kg)', '254.06'], ['Right rear scale, tilted (kg)', '254.06'], ['Loaded wheel centre height', '300']]);
    await keepScreenshot(weighIn, 'build-editor-engineering-tilt-desktop.png');
    await weighIn.getByRole('button', { name: 'Add the weigh-in' }).click();
    await expect.poll(() => page.getByText(/Tilted: front axle raised 300 mm; the rear scales then read 254\.06 \+ 254\.06 kg/).count()).toBe(1);
    const cg = panel.locator('[data-numbers-group="cgHeight"]');
    await expect.poll(() => cg.getByRole('row', { name: /Centre-of-gravity height/ }).textContent()).toMatch(/468\smm/);

    // The owner chooses to show the figures; visitors then read them on the public page, with the caution.
    await brakes.getByLabel(/^Show the brake split on the public page/).check();
    await chassis.getByLabel(/^Show the front roll-centre height, camber gain and centre-of-gravity height/).check();
    await expect.poll(() => page.getByTestId('save-summary').locator('visible=true').textContent()).toBe('All changes saved');
    await setPublished(await findBuild(build.id), true);
    const visitor = await env.browser.newContext({ viewport: { width: 1366, height: 900 }, locale: 'en-GB' });
    const publicPage = await visitor.newPage();
    await publicPage.goto(`${env.baseUrl}/c/${build.code}?units=metric`);
    const worked = publicPage.locator('#worked-out');
    await expect.poll(() => worked.locator('dl').textContent()).toBe('Brake split71\u00a0% front / 29\u00a0% rear est.Front roll-centre height102\u00a0mm est.Front camber gain−0.85° per 25\u00a0mm of bump est.Centre-of-gravity height468\u00a0mm est.');
    expect(await worked.locator('.care').textContent()).toMatch(/^Estimates for presentation, not engineering approval/);
    expect(await worked.getByTestId('brake-split-bar').count()).toBe(1);
    // The sketch is drawn: its arms have a size on screen.
    const sketchBox = await worked.getByTestId('front-view-sketch').locator('line').first().boundingBox();
    expect(sketchBox?.width).toBeGreaterThan(100);
    await keepScreenshot(worked, 'public-build-worked-out-desktop.png');
    await publicPage.setViewportSize({ width: 390, height: 844 });
    await keepScreenshot(worked, 'public-build-worked-out-phone.png');
    await visitor.close();

    await page.setViewportSize({ width: 390, height: 844 });
    await page.getByTestId('section-numbers-chassis').scrollIntoViewIfNeeded();
    await keepScreenshot(page.getByTestId('section-numbers-chassis'), 'build-editor-engineering-chassis-phone.png');
    await page.getByTestId('section-numbers-brakes').scrollIntoViewIfNeeded();
    await keepScreenshot(page.getByTestId('section-numbers-brakes'), 'build-editor-engineering-brakes-phone.png');
    await context.close();
  }, 120_000);
});
