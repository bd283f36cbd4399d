import { describe, expect, it } from 'vitest';
import { CARD_DESIGNS, CARD_MIN_MARGIN_PT, CARD_MIN_QR_PT, DEFAULT_CARD_SETTINGS, ORIENTATIONS, PAPERS, PAPER_SIZES_PT, type CardSettings } from '@shared/schemas/card';
import { SECTION_KINDS } from '@shared/schemas/build-sections';
import { renderCardPdf } from '@server/services/cards';
import { pageBox, qrSize } from '@templates/cards/theme';
import { longestPublicBuild, typicalPublicBuild } from '../../support/card-fixtures';
import { mediaBoxes, pageCount, pdfText, rasterize, readQr } from '../../support/pdf';

const ALL = CARD_DESIGNS.flatMap((design) => PAPERS.flatMap((paper) => ORIENTATIONS.map((orientation) => ({ design, paper, orientation }))));
const settingsFor = (c: (typeof ALL)[number]): CardSettings => ({ ...DEFAULT_CARD_SETTINGS, ...c, sections: [...SECTION_KINDS], figures: ['power', 'torque', 'weight', 'powerToWeight', 'displacement'] });
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

  it.each(ALL)('renders $design on $paper $orientation at exactly the paper size, on one page', async (c) => {
    const pdf = await renderCardPdf(typicalPublicBuild(), settingsFor(c), { show: SHOW });
    expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');
    const boxes = mediaBoxes(pdf);
    expect(boxes).toHaveLength(1);
    const [x0, y0, x1, y1] = boxes[0]!;
    const [w, h] = EXPECTED_PT[c.paper];
    expect(x0).toBe(0);
    expect(y0).toBe(0);
    expect(x1).toBeCloseTo(c.orientation === 'portrait' ? w : h, 2);
    expect(y1).toBeCloseTo(c.orientation === 'portrait' ? h : w, 2);
    expect(pageCount(pdf)).toEqual({ tree: 1, objects: 1 });
  });

  it('keeps a margin of at least 0.25 in and a QR code of at least 1.5 in in every layout', () => {
    for (const c of ALL) {
      const box = pageBox(c.paper, c.orientation);
      expect(box.margin).toBeGreaterThanOrEqual(CARD_MIN_MARGIN_PT);
      // The drawn block holds the quiet zone too: the code inside it (≤ 33 of 41 modules) is still 1.5 in.
      expect((qrSize(c.design, box) * 33) / 41).toBeGreaterThanOrEqual(CARD_MIN_QR_PT);
    }
  });

  it.each(ALL)('keeps the longest possible build on one page: $design, $paper, $orientation', async (c) => {
    const pdf = await renderCardPdf(longestPublicBuild(), settingsFor(c), { show: { showName: 'A'.repeat(80), className: 'B'.repeat(60), entryNumber: '88888888' } });
    expect(pageCount(pdf)).toEqual({ tree: 1, objects: 1 });
    expect(mediaBoxes(pdf)).toHaveLength(1);
  });

  it('prints the title, figures with their provenance in words, section lines, credits, the short URL and the show', async () => {
    const build = typicalPublicBuild({ weight: { value: 1540, unit: 'kg', provenance: 'estimated' }, dynoRuns: [] });
    for (const design of CARD_DESIGNS) {
      const text = (await pdfText(await renderCardPdf(build, { ...settingsFor({ design, paper: 'letter', orientation: 'portrait' }), units: 'metric' }, { show: SHOW }))).replace(/\s+/g, ' ');
      expect(text).toMatch(/1969\s*NIGHT\s*SHIFT/); // the owner's title, with the model year
      expect(text).toMatch(/FASTBACK\s*COUPE/i); // the body line
      expect(text).toMatch(/est\./i); // 650 hp est. flywheel power, in words
      expect(text).toContain('127.0.0.1:3999/c/K7P2M9Q');
      expect(text).toContain('117');
      expect(text).toMatch(/RIVERSIDE\s*AUTUMN\s*RUN/);
      expect(text).toContain('Restomod, 1960–1975');
      expect(text).toMatch(/1,540\s*kg/);
      if (design !== 'compact') expect(text).toContain('Kestrel Lane Paint');
      expect(text).toMatch(/ENGINE|Engine/);
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

  it('prints a QR code that scans back to the URL and nothing in the outer quarter inch', async () => {
    for (const c of ALL.filter((x) => x.paper === 'letter' || x.paper === 'a3')) {
      const dpi = 72;
      const img = rasterize(await renderCardPdf(longestPublicBuild(), settingsFor(c), { show: SHOW }), dpi);
      const qr = readQr(img);
      expect(qr?.data, `${c.design} ${c.paper} ${c.orientation}`).toBe('http://127.0.0.1:3999/c/K7P2M9Q');
      const side = Math.hypot(qr!.location.topRightCorner.x - qr!.location.topLeftCorner.x, qr!.location.topRightCorner.y - qr!.location.topLeftCorner.y);
      expect(side / dpi, `${c.design} ${c.paper} ${c.orientation}`).toBeGreaterThanOrEqual(1.47); // the code itself, quiet zone aside: 1.5 in less a pixel of detection
      const edge = Math.ceil(0.25 * dpi) - 1;
      for (let y = 0; y < img.height; y++) {
        for (let x = 0; x < img.width; x++) {
          if (x >= edge && x < img.width - edge && y >= edge && y < img.height - edge) continue;
          const i = (y * img.width + x) * 4;
          expect(img.data[i]! + img.data[i + 1]! + img.data[i + 2]!, `${c.design} ${c.paper} ${c.orientation} ink at ${x},${y}`).toBeGreaterThan(750);
        }
      }
    }
  }, 60_000);
});
