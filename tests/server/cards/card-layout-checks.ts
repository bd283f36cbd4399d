import { describe, expect, it } from 'vitest';
import { CARD_FIGURE_LABELS, DEFAULT_CARD_SETTINGS, ORIENTATIONS, PAPERS, paperClass, CARD_LEGIBILITY, type CardDesign, type CardLeftOff, type CardShow, type Orientation, type Paper } from '@shared/schemas/card';
import { SECTION_KINDS } from '@shared/schemas/build-sections';
import { ENGINEERING_CAUTION } from '@shared/calc';
import type { PublicBuild } from '@shared/schemas/build';
import { cardContent, qrMatrix, renderCard, type CoverImage } from '@server/services/cards';
import { pageBox } from '@templates/cards/theme';
import { capShare } from '@templates/cards/measure';
import { QR_QUIET } from '@templates/cards/parts';
import { ENTRY_SHOWS, LONGEST_SHOW, emptyPublicBuild, longTitlePublicBuild, longestPublicBuild, sparsePublicBuild, typicalPublicBuild } from '../../support/card-fixtures';
import { createDemoCardBuilds, type DemoCardBuild } from '../../support/demo-card-builds';
import { inside, overlaps, pageCount, rasterize, readCardLayout, readCardLayouts, readQr, type Box, type CardLayout } from '../../support/pdf';
import { Fragment, cloneElement, createElement } from 'react';
import { renderToBuffer } from '@react-pdf/renderer';
import { CardDocument, layoutCard } from '@templates/cards/card-document';
import { registerCardFonts } from '@templates/cards/fonts';

// The verification of every card layout: each design on every paper and orientation, for a corpus of
// builds, read back from the PDF with pdf.js. One file per design, so the three run side by side.

type Case = { name: string; build: PublicBuild; show: CardShow | null; cover: CoverImage | null; paper: Paper; orientation: Orientation; decode?: boolean };
const ALL = PAPERS.flatMap((paper) => ORIENTATIONS.map((orientation) => ({ paper, orientation })));
const EXACT_PT: Record<Paper, [number, number]> = { letter: [612, 792], tabloid: [792, 1224], a4: [595.2756, 841.8898], a3: [841.8898, 1190.5512] };
const norm = (s: string) => s.replace(/\s+/g, '').toUpperCase();

function corpus(demo: DemoCardBuild[]): Case[] {
  const every = (name: string, build: PublicBuild, show: CardShow | null, cover: CoverImage | null = null): Case[] => ALL.map((c) => ({ name, build, show, cover, ...c }));
  const [complete, ...others] = demo;
  return [
    ...every('full build, entry 1047', typicalPublicBuild(), ENTRY_SHOWS[2]!, null).map((c) => ({ ...c, decode: c.paper === 'letter' || c.paper === 'a3' })),
    ...every('demo complete build with its photo, entry 47', complete!.build, ENTRY_SHOWS[1]!, complete!.cover),
    ...every('empty build', emptyPublicBuild(), null),
    ...every('sparse build, entry 7', sparsePublicBuild(), ENTRY_SHOWS[0]!),
    ...every('120-character title, entry 9999', longTitlePublicBuild(), ENTRY_SHOWS[3]!),
    ...every('notes and credits at their longest, longest show name', longestPublicBuild(), LONGEST_SHOW),
    // The other demo builds, each on one paper, so every paper and orientation sees some of them.
    ...others.flatMap((d, i) => [ALL[i % 8]!].map((c) => ({ name: `demo ${d.name}`, build: d.build, show: i % 2 ? ENTRY_SHOWS[i % 4]! : null, cover: d.cover, ...c }))),
  ];
}

type Rendered = { pdf: Buffer | null; layout: CardLayout; leftOff: CardLeftOff[] };

/**
 * Lays out every case and prints them as pages of one document (as the bulk print of a show does),
 * so pdf.js reads the fonts once; the cases that also scan their QR code are rendered alone through
 * the card service too, exactly as an owner downloads them.
 */
async function renderAll(design: CardDesign, cases: Case[]): Promise<Rendered[]> {
  registerCardFonts();
  const laid = cases.map((c) => layoutCard(cardContent(c.build, settingsOf(design, c), { show: c.show, cover: c.cover }), design, c.paper, c.orientation));
  const doc = createElement(CardDocument, { page: createElement(Fragment, null, ...laid.map((l, i) => cloneElement(l.page, { key: i }))), title: `${design} corpus` });
  const layouts = await readCardLayouts(await renderToBuffer(doc as Parameters<typeof renderToBuffer>[0]));
  return Promise.all(
    cases.map(async (c, i) => {
      if (!c.decode) return { pdf: null, layout: { ...layouts[i]!, pages: 1 }, leftOff: laid[i]!.leftOff };
      const { pdf, leftOff } = await renderCard(c.build, settingsOf(design, c), { show: c.show, cover: c.cover });
      return { pdf, layout: await readCardLayout(pdf), leftOff };
    }),
  );
}

const settingsOf = (design: CardDesign, c: Case) => ({ ...DEFAULT_CARD_SETTINGS, design, paper: c.paper, orientation: c.orientation, sections: [...SECTION_KINDS] });

function check(design: CardDesign, c: Case, { pdf, layout, leftOff }: Rendered) {
  const label = `${design} ${c.paper} ${c.orientation}, ${c.name}`;
  const settings = settingsOf(design, c);
  const content = cardContent(c.build, settings, { show: c.show });
  const box = pageBox(c.paper, c.orientation);
  const leg = CARD_LEGIBILITY[paperClass(c.paper)];

  // Exact paper, one page.
  const [w, h] = c.orientation === 'portrait' ? EXACT_PT[c.paper] : [EXACT_PT[c.paper][1], EXACT_PT[c.paper][0]];
  expect(layout.pages, label).toBe(1);
  expect(layout.mediaBox.slice(0, 2), label).toEqual([0, 0]);
  expect(layout.mediaBox[2], label).toBeCloseTo(w, 3);
  expect(layout.mediaBox[3], label).toBeCloseTo(h, 3);

  // Everything inside the safe margins.
  const safe: Box = { x0: box.margin, y0: box.margin, x1: w - box.margin, y1: h - box.margin };
  for (const t of layout.texts) expect(inside(t, safe, 0.5), `${label}: "${t.str}" crosses the margin`).toBe(true);
  for (const img of layout.images) expect(inside(img, safe, 0.5), `${label}: the photo crosses the margin`).toBe(true);

  // The QR code: present, big enough, its quiet zone clear of text, inside the margins.
  const qr = layout.qr;
  expect(qr, `${label}: no QR code`).not.toBeNull();
  const side = qr!.x1 - qr!.x0;
  expect(side, `${label}: QR code ${side.toFixed(1)} pt`).toBeGreaterThanOrEqual(leg.qrPt - 0.5);
  const quiet = (side / qrMatrix(c.build.url).size) * QR_QUIET;
  const qrZone = { x0: qr!.x0 - quiet, y0: qr!.y0 - quiet, x1: qr!.x1 + quiet, y1: qr!.y1 + quiet };
  expect(inside(qrZone, safe, 0.5), `${label}: QR quiet zone crosses the margin`).toBe(true);

  // No two text boxes overlap, and no text sits on the photo or the QR code.
  const texts = layout.texts;
  for (let i = 0; i < texts.length; i++) {
    for (let j = i + 1; j < texts.length; j++) expect(overlaps(texts[i]!, texts[j]!, 0.25), `${label}: "${texts[i]!.str}" overlaps "${texts[j]!.str}"`).toBe(false);
    expect(overlaps(texts[i]!, qrZone, 0.25), `${label}: "${texts[i]!.str}" is on the QR code`).toBe(false);
    for (const img of layout.images) expect(overlaps(texts[i]!, img, 0.25), `${label}: "${texts[i]!.str}" is on the photo`).toBe(false);
  }
  for (const img of layout.images) expect(overlaps(img, qrZone), `${label}: the photo is on the QR code`).toBe(false);

  // Sizes: the title and the entry number, the key figures, and every other line.
  const cap = (t: (typeof texts)[number]) => t.size * capShare(t.face!);
  const heading = norm(content.heading);
  const titleItems = texts.filter((t) => t.face === 'display-700' && heading.includes(norm(t.str)) && t.str.trim() !== c.show?.entryNumber);
  expect(titleItems.length, `${label}: title printed`).toBeGreaterThan(0);
  for (const t of titleItems) expect(cap(t), `${label}: title "${t.str}"`).toBeGreaterThanOrEqual(leg.titleCapPt - 0.01);
  if (c.show?.entryNumber) {
    const number = texts.find((t) => t.str.trim() === c.show!.entryNumber && t.face === 'display-700');
    expect(number, `${label}: entry number printed`).toBeDefined();
    expect(cap(number!), `${label}: entry number`).toBeGreaterThanOrEqual(leg.entryCapPt - 0.01);
  }
  const values = new Set(content.figures.map((f) => f.value));
  const figureItems = texts.filter((t) => t.face === 'display-600' && values.has(t.str.trim()));
  if (values.size) expect(figureItems.length, `${label}: key figures printed`).toBeGreaterThan(0);
  for (const t of figureItems) expect(cap(t), `${label}: figure "${t.str}"`).toBeGreaterThanOrEqual(leg.figureCapPt - 0.01);
  // Small print allowed only for these: the footer, figure labels and notes, the QR caption, the entry label.
  const small = [ENGINEERING_CAUTION, 'PLACARD', 'ENTRY', 'Scan for the whole build', ...Object.values(CARD_FIGURE_LABELS), ...content.figures.map((f) => f.note), ...content.figures.map((f) => `${f.unit} ${f.mark}`)].map(norm).filter(Boolean);
  for (const t of texts) {
    if (small.some((s) => s.includes(norm(t.str).replace(/…$/, '')))) continue;
    expect(t.size, `${label}: "${t.str}" at ${t.size.toFixed(1)} pt`).toBeGreaterThanOrEqual(leg.linePt - 0.01);
  }

  // What did not fit is named, and the card says where the rest is.
  const all = norm(texts.map((t) => t.str).join(''));
  expect(all, label).toContain(norm(content.shortUrl));
  if (leftOff.length) expect(all, `${label}: the "more on the phone" line`).toContain(norm('More on the phone:'));

  if (pdf) {
    // Rendered alone through the service: one page, and a coarse scan (36 px per inch) reads the code back to the public address.
    expect(pageCount(pdf), label).toEqual({ tree: 1, objects: 1 });
    expect(readQr(rasterize(pdf, 36))?.data, `${label}: QR decode`).toBe(c.build.url);
  }
  return leftOff;
}

/** Renders `design` for the whole corpus and checks every card. */
export function describeCardLayouts(design: CardDesign) {
  describe(`${design} cards, read back from the PDF`, () => {
    it('never overlap, keep the margins, the minimum sizes, the QR code and the exact paper, for every build, paper and orientation', async () => {
      const cases = corpus(await createDemoCardBuilds());
      expect(cases.length).toBe(6 * 8 + 11);
      const rendered = await renderAll(design, cases);
      const leftOffs = cases.map((c, i) => ({ c, leftOff: check(design, c, rendered[i]!) }));
      // The longest build cannot fit whole anywhere: it is cut, and says so; the empty one never is.
      expect(leftOffs.filter((l) => l.c.name.startsWith('notes')).every((l) => l.leftOff.length > 0)).toBe(true);
      expect(leftOffs.filter((l) => l.c.name === 'empty build').every((l) => l.leftOff.length === 0)).toBe(true);
    }, 240_000);
  });
}


