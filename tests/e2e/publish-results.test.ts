import { describe, expect, it } from 'vitest';
import { keepScreenshot, openSignedIn, useBrowserAndServer } from '../support/browser';
import { DEFAULT_PASSWORD } from '../support/factories';
import { judgedShow } from '../support/results-factory';

const env = useBrowserAndServer();

const signIn = (page: import('playwright-core').Page, email: string, next: string) => openSignedIn(page, env.baseUrl, email, DEFAULT_PASSWORD, next);

describe('publishing results', () => {
  it('the organiser reviews, orders a tie by hand, publishes; the public page and the owner see the results', { timeout: 400_000 }, async () => {
    // Deuce and Flathead tie on every line (29.00); Merc is best of show (40.00); Ratrod 25.00.
    const show = await judgedShow({ hotRods: ['Deuce', 'Flathead', 'Ratrod'], customs: ['Merc'] });
    for (const j of [0, 1]) {
      await show.score(j, 'Deuce', [8, 6, 4], j === 0 ? ['Deep, even black paint', '', ''] : []);
      await show.score(j, 'Flathead', [8, 6, 4]);
      await show.score(j, 'Ratrod', [6, 6, 4]);
      await show.score(j, 'Merc', [10, 10, 5]);
    }

    const context = await env.browser.newContext({ viewport: { width: 1100, height: 900 } });
    const page = await context.newPage();
    await signIn(page, show.organiser.email, `/shows/${show.eventId}`);
    const panel = page.locator('section', { has: page.getByRole('heading', { name: 'Results', exact: true }) });
    await panel.getByText(/One tie is left shared by the rules/).waitFor();
    expect(await panel.getByRole('table', { name: 'Hot rods' }).innerText()).toMatch(/1st \(shared\)\s+\d+\s+Deuce\s+29\.00/);

    const tie = panel.getByRole('form', { name: 'Order the tie for Hot rods' });
    await tie.getByRole('button', { name: `Move ${show.car('Flathead').number} up` }).click();
    await tie.getByLabel('Reason for this order').fill('Cleaner underside on a second look');
    await tie.getByRole('button', { name: 'Save this order' }).click();
    await panel.getByText(/“Cleaner underside on a second look” \(Org Anizer\)/).waitFor();
    const hotRods = await panel.getByRole('table', { name: 'Hot rods' }).innerText();
    expect(hotRods).toMatch(/1st\s+\d+\s+Flathead\s+29\.00/);
    expect(hotRods).toMatch(/2nd\s+\d+\s+Deuce\s+29\.00/);
    await keepScreenshot(page, 'results-review-organiser.png', { fullPage: true });

    await panel.getByRole('button', { name: 'Publish results' }).click();
    const dialog = page.getByRole('dialog', { name: 'Publish results?' });
    await dialog.getByText(/Every entrant is e-mailed/).waitFor();
    await dialog.getByRole('button', { name: 'Publish results' }).click();
    await panel.getByText(/Published: the places below are on the show’s public page/).waitFor();
    await panel.getByRole('link', { name: 'Results sheet (PDF)' }).waitFor();
    expect(await panel.getByRole('link', { name: 'Results sheet (PDF)' }).getAttribute('href')).toBe(`/api/events/${show.eventId}/results/sheet.pdf?paper=letter`);
    await panel.getByText(/Best of show: \d+ Merc/).waitFor();
    await keepScreenshot(page, 'results-published-organiser.png', { fullPage: true });

    // The visitor's phone: the public show page, no script.
    const phone = await env.browser.newContext({ viewport: { width: 390, height: 844 }, javaScriptEnabled: false });
    const visitor = await phone.newPage();
    await visitor.goto(`${env.baseUrl}/e/${show.slug}`);
    const results = visitor.locator('section', { has: visitor.getByRole('heading', { name: 'Results', exact: true }) });
    expect(await results.getByRole('region', { name: 'Best of show' }).innerText()).toMatch(/1st\s+\d+\s+Merc\s+·\s+Customs\s+40\.00/i); // places print in capitals (CSS)
    const classText = await results.getByRole('region', { name: 'Results: Hot rods' }).innerText();
    expect(classText).toMatch(/1st\s+\d+\s+Flathead\s+29\.00[\s\S]*2nd\s+\d+\s+Deuce\s+29\.00[\s\S]*3rd\s+\d+\s+Ratrod\s+25\.00/i);
    expect(await results.getByRole('link', { name: 'Flathead' }).getAttribute('href')).toMatch(new RegExp(`/c/${show.car('Flathead').code}$`));
    await keepScreenshot(visitor, 'results-public-phone.png', { fullPage: true });
    await phone.close();

    // The owner of Deuce reads their own scores in the app.
    const ownerContext = await env.browser.newContext({ viewport: { width: 390, height: 844 } });
    const ownerPage = await ownerContext.newPage();
    await signIn(ownerPage, show.car('Deuce').owner.email, '/entries');
    await ownerPage.getByRole('button', { name: 'Your scores' }).click();
    const scores = ownerPage.getByLabel('Your scores');
    await scores.getByText(/2nd in Hot rods · total 29\.00/).waitFor();
    expect(await scores.getByRole('row', { name: /Paint and body/ }).innerText()).toMatch(/8\.00\s*\/ 10\s+8, 8/);
    await scores.getByText('“Deep, even black paint”').waitFor();
    await keepScreenshot(ownerPage, 'results-own-scores-phone.png', { fullPage: true });
    await ownerContext.close();
    await context.close();
  });
});
