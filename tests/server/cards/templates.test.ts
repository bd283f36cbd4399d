import { describe, expect, it } from 'vitest';
import { CARD_DESIGNS, DEFAULT_CARD_SETTINGS, PAPERS, PAPER_SIZES_PT, type CardSettings } from '@shared/schemas/card';
import { SECTION_KINDS } from '@shared/schemas/build-sections';
import { availableFigures, cardContent, renderCard, renderCardPdf } from '@server/services/builds/cards';
import { emptyPublicBuild, longestPublicBuild, sparsePublicBuild, typicalPublicBuild } from '../../support/card-fixtures';
import { pdfText } from '../../support/pdf';

const settingsFor = (c: Pick<CardSettings, 'design' | 'paper' | 'orientation'>): CardSettings => ({ ...DEFAULT_CARD_SETTINGS, ...c, sections: [...SECTION_KINDS] });
const SHOW = { showName: 'Riverside Autumn Run', className: 'Restomod, 1960–1975', entryNumber: '117' };

// The sizes by definition: Letter 8.5 × 11 in, Tabloid 11 × 17 in, A4 210 × 297 mm, A3 297 × 420 mm.
const EXPECTED_PT = { letter: [612, 792], tabloid: [792, 1224], a4: [595.2756, 841.8898], a3: [841.8898, 1190.5512] } as const;

describe('windshield card templates', () => {
  it('knows the paper sizes by their definitions', () => {
    for (const paper of PAPERS) {
      expect(PAPER_SIZES_PT[paper].width).toBeCloseTo(EXPECTED_PT[paper][0], 3);
      expect(PAPER_SIZES_PT[paper].height).toBeCloseTo(EXPECTED_PT[paper][1], 3);
    }
  });

  // Exact paper, one page and the boxes of every design, paper and orientation: layout-*.test.ts.

  it('prints the title, figures with their provenance in words, section lines, credits, the short URL and the show', async () => {
    const build = typicalPublicBuild({ weight: { value: 1540, unit: 'kg', provenance: 'estimated' }, dynoRuns: [] });
    for (const design of CARD_DESIGNS) {
      // Tabloid, where all of it fits (nothing left off), so every part must be there. The show and class
      // without a number: an entry's number prints as large as the numbered card's, and takes room (below).
      const { pdf, leftOff } = await renderCard(build, { ...settingsFor({ design, paper: 'tabloid', orientation: 'portrait' }), units: 'metric' }, { show: { showName: SHOW.showName, className: SHOW.className } });
      expect(leftOff, design).toEqual([]);
      const text = (await pdfText(pdf)).replace(/\s+/g, ' ');
      expect(text).toMatch(/1969\s*NIGHT\s*SHIFT/); // the owner's title, with the model year
      expect(text).toMatch(/FASTBACK\s*COUPE/i); // the body line
      expect(text).toMatch(/est\./i); // 650 hp est. flywheel power, in words
      expect(text).toContain('127.0.0.1:3999/c/K7P2M9Q');
      expect(text).toMatch(/RIVERSIDE\s*AUTUMN\s*RUN/);
      expect(text).toContain('Restomod, 1960–1975');
      expect(text).toMatch(/1,540\s*kg/);
      if (design !== 'compact') expect(text).toContain('Kestrel Lane Paint');
      expect(text).toMatch(/ENGINE|Engine/);
      // With the entry's number: the number and the show print, and whatever gave way is named.
      const entry = await renderCard(build, { ...settingsFor({ design, paper: 'tabloid', orientation: 'portrait' }), units: 'metric' }, { show: SHOW });
      const entryText = (await pdfText(entry.pdf)).replace(/\s+/g, ' ');
      expect(entryText).toContain('117');
      expect(entryText).toMatch(/RIVERSIDE\s*AUTUMN\s*RUN/);
      if (entry.leftOff.length) expect(entryText).toContain('More on the phone');
    }
  });

  it('leaves out the sections and figures the owner turned off, in the units chosen', async () => {
    const settings: CardSettings = { ...DEFAULT_CARD_SETTINGS, design: 'data-sheet', sections: ['brakes'], figures: ['weight'], units: 'imperial' };
    const text = await pdfText(await renderCardPdf(typicalPublicBuild({ dynoRuns: [] }), settings));
    expect(text).toMatch(/B\s*R\s*A\s*K\s*E\s*S/);
    expect(text).not.toMatch(/D\s*R\s*I\s*V\s*E\s*T\s*R\s*A\s*I\s*N/);
    expect(text).toMatch(/3,395\s*lb/);
    expect(text).not.toMatch(/650\s*hp/);
  });

  it('prints the engine once on the data sheet: its rows, not the engine line again, and nothing of it when the Engine section is not chosen', async () => {
    const build = typicalPublicBuild({ dynoRuns: [] });
    const base: CardSettings = { ...DEFAULT_CARD_SETTINGS, design: 'data-sheet', units: 'imperial' };
    const withRows = (await pdfText(await renderCardPdf(build, { ...base, sections: ['engine', 'brakes'] }))).replace(/\s+/g, ' ');
    expect(withRows).toContain('Layout V8');
    expect(withRows.match(/supercharged/gi)).toHaveLength(1);
    const without = (await pdfText(await renderCardPdf(build, { ...base, sections: ['brakes'] }))).replace(/\s+/g, ' ');
    expect(without).not.toContain('Layout V8');
    expect(without).not.toMatch(/supercharged/i);
  });

  it('offers by default the figures the build has, in the order power, torque, weight, displacement, power-to-weight', () => {
    expect(DEFAULT_CARD_SETTINGS.figures).toEqual(['power', 'torque', 'weight', 'displacement', 'powerToWeight']);
    expect(availableFigures(typicalPublicBuild())).toEqual(['power', 'torque', 'weight', 'displacement', 'powerToWeight']);
    // A sparse build with only a power estimate still prints that figure, not an empty row.
    const sparse = cardContent(sparsePublicBuild(), DEFAULT_CARD_SETTINGS);
    expect(sparse.figures.map((f) => f.label)).toEqual(['Power']);
    expect(availableFigures(emptyPublicBuild())).toEqual([]);
  });

  it('says what it left off, and prints where the rest is', async () => {
    const { pdf, leftOff } = await renderCard(longestPublicBuild(), { ...settingsFor({ design: 'compact', paper: 'letter', orientation: 'portrait' }) });
    expect(leftOff.map((l) => l.block)).toEqual(expect.arrayContaining(['Story', 'Credits']));
    expect((await pdfText(pdf)).replace(/\s+/g, ' ')).toContain('More on the phone: 127.0.0.1:3999/c/K7P2M9Q');
    const whole = await renderCard(emptyPublicBuild(), settingsFor({ design: 'poster', paper: 'letter', orientation: 'portrait' }));
    expect(whole.leftOff).toEqual([]);
    expect(await pdfText(whole.pdf)).not.toContain('More on the phone');
  });
});
