import { describe, expect, it } from 'vitest';
import { CARD_FIGURE_LABELS, CARD_HIGHLIGHT_LABELS, CARD_QR_MODULE_MIN_PT, DEFAULT_CARD_SETTINGS, ORIENTATIONS, PAPERS, paperClass, CARD_LEGIBILITY, type CardDesign, type CardLeftOff, type CardShow, type Orientation, type Paper } from '@shared/schemas/card';
import { SECTION_KINDS } from '@shared/schemas/build-sections';
import { ENGINEERING_CAUTION } from '@shared/calc';
import type { PublicBuild } from '@shared/schemas/build';
import { cardContent, qrMatrix, renderCard, type CoverImage } from '@server/services/builds/cards';
import type { CardHighlightWords } from '@templates/cards/content';
import { pageBox } from '@templates/cards/theme';
import { capShare } from '@templates/cards/measure';
import { QR_QUIET } from '@templates/cards/parts';
import { ENTRY_SHOWS, LONGEST_SHOW, emptyPublicBuild, longTitlePublicBuild, longestPublicBuild, sparsePublicBuild, typicalPublicBuild } from '../../support/card-fixtures';
import { demoCardBuildsInMemory, type DemoCardBuild } from '../../support/demo-card-builds';
import { cropPoints, inside, overlaps, pageCount, rasterize, rasterizePages, readCardLayout, readCardLayouts, readQr, type Box, type CardLayout, type Pixels } from '../../support/pdf';
import { Fragment, cloneElement, createElement } from 'react';
import { renderToBuffer } from '@react-pdf/renderer';
import { CardDocument, layoutCard } from '@templates/cards/card-document';
import { numberedCardNumberCapPt, numberedContentOf } from '@templates/cards/numbered-card';
import { registerCardFonts } from '@templates/cards/fonts';

// The verification of every card layout: each design on every paper and orientation, for a corpus of
// builds, read back from the PDF with pdf.js. One file per design, so the three run side by side.

type Case = { name: string; build: PublicBuild; show: CardShow | null; cover: CoverImage | null; paper: Paper; orientation: Orientation; alone?: boolean; highlight?: CardHighlightWords };

// The owner's chosen highlight: a usual answer on the full build, one at its longest on the longest build.
const USUAL_HIGHLIGHT: CardHighlightWords = { label: CARD_HIGHLIGHT_LABELS.question, heading: 'Is it drivable?', text: 'Driven to every show it enters, on its own wheels, and home again the same way.' };
const LONGEST_HIGHLIGHT: CardHighlightWords = { label: CARD_HIGHLIGHT_LABELS.log, heading: `2026-11-20 · ${'Longest post title '.repeat(7).slice(0, 120)}.`, text: 'A very long post about the winter work. '.repeat(150).slice(0, 6000) };
const ALL = PAPERS.flatMap((paper) => ORIENTATIONS.map((orientation) => ({ paper, orientation })));
const EXACT_PT: Record<Paper, [number, number]> = { letter: [612, 792], tabloid: [792, 1224], a4: [595.2756, 841.8898], a3: [841.8898, 1190.5512] };
const norm = (s: string) => s.replace(/\s+/g, '').toUpperCase();

function corpus(demo: readonly DemoCardBuild[]): Case[] {
  const every = (name: string, build: PublicBuild, show: CardShow | null, cover: CoverImage | null = null): Case[] => ALL.map((c) => ({ name, build, show, cover, ...c }));
  const [complete, ...others] = demo;
  return [
    ...every('full build with a highlight, entry 1047', typicalPublicBuild(), ENTRY_SHOWS[2]!, null).map((c) => ({ ...c, highlight: USUAL_HIGHLIGHT, alone: c.paper === 'letter' || c.paper === 'a3' })),
    ...every('demo complete build with its photo, entry 47', complete!.build, ENTRY_SHOWS[1]!, complete!.cover),
    ...every('empty build', emptyPublicBuild(), null),
    ...every('sparse build, entry 7', sparsePublicBuild(), ENTRY_SHOWS[0]!),
    ...every('120-character title, entry 9999', longTitlePublicBuild(), ENTRY_SHOWS[3]!),
    ...every('notes, credits and highlight at their longest, longest show name', longestPublicBuild(), LONGEST_SHOW).map((c) => ({ ...c, highlight: LONGEST_HIGHLIGHT })),
    // The other demo builds, each on one paper, so every paper and orientation sees some of them.
    ...others.flatMap((d, i) => [ALL[i % 8]!].map((c) => ({ name: `demo ${d.name}`, build: d.build, show: i % 2 ? ENTRY_SHOWS[i % 4]! : null, cover: d.cover, ...c }))),
  ];
}

type Rendered = { pdf: Buffer | null; layout: CardLayout; leftOff: CardLeftOff[]; scan: Pixels };

/**
 * The coarse scan every code must survive: 24 pixels per inch (under two pixels a module for a 50 mm
 * code). The decoder is given the code, its quiet zone and 5 mm of the card around it, as a phone
 * aimed at the code frames it; the whole page is not a fair picture at that size.
 */
const SCAN_DPI = 24;
const SCAN_AROUND_PT = 5 * (72 / 25.4);

/**
 * Lays out every case and prints them as pages of one document (as the bulk print of a show does),
 * so pdf.js reads the fonts once; the cases that also scan their QR code alone are rendered only
 * through the card service, exactly as an owner downloads them (and checked from that PDF).
 */
async function renderAll(design: CardDesign, cases: Case[]): Promise<Rendered[]> {
  registerCardFonts();
  const together = cases.filter((c) => !c.alone);
  const laid = together.map((c) => layoutCard(cardContent(c.build, settingsOf(design, c), { show: c.show, cover: c.cover, highlight: c.highlight }), design, c.paper, c.orientation));
  const doc = createElement(CardDocument, { page: createElement(Fragment, null, ...laid.map((l, i) => cloneElement(l.page, { key: i }))), title: `${design} corpus` });
  const all = await renderToBuffer(doc as Parameters<typeof renderToBuffer>[0]);
  const layouts = await readCardLayouts(all);
  const scans = rasterizePages(all, SCAN_DPI);
  expect({ pages: layouts.length, scans: scans.length }).toEqual({ pages: together.length, scans: together.length });
  return Promise.all(
    cases.map(async (c) => {
      const i = together.indexOf(c);
      if (i >= 0) return { pdf: null, layout: { ...layouts[i]!, pages: 1 }, leftOff: laid[i]!.leftOff, scan: scans[i]! };
      const { pdf, leftOff } = await renderCard(c.build, settingsOf(design, c), { show: c.show, cover: c.cover, highlight: c.highlight });
      return { pdf, layout: await readCardLayout(pdf), leftOff, scan: rasterize(pdf, SCAN_DPI) };
    }),
  );
}

const settingsOf = (design: CardDesign, c: Case) => ({ ...DEFAULT_CARD_SETTINGS, design, paper: c.paper, orientation: c.orientation, sections: [...SECTION_KINDS] });

function check(design: CardDesign, c: Case, { pdf, layout, leftOff, scan }: Rendered) {
  const label = `${design} ${c.paper} ${c.orientation}, ${c.name}`;
  const settings = settingsOf(design, c);
  const content = cardContent(c.build, settings, { show: c.show, highlight: c.highlight });
  const box = pageBox(c.paper, c.orientation);
  const leg = CARD_LEGIBILITY[paperClass(c.paper)];

  // Every problem found is collected, then asserted once: a failure lists them all.
  const problems: string[] = [];
  const fail = (why: string) => problems.push(`${label}: ${why}`);

  // Exact paper.
  const [w, h] = c.orientation === 'portrait' ? EXACT_PT[c.paper] : [EXACT_PT[c.paper][1], EXACT_PT[c.paper][0]];
  const mb = layout.mediaBox;
  if (layout.pages !== 1) fail(`${layout.pages} pages`);
  if (mb[0] !== 0 || mb[1] !== 0 || Math.abs(mb[2]! - w) > 0.001 || Math.abs(mb[3]! - h) > 0.001) fail(`MediaBox ${mb.join(' ')}, not 0 0 ${w} ${h}`);

  // Everything inside the safe margins.
  const safe: Box = { x0: box.margin, y0: box.margin, x1: w - box.margin, y1: h - box.margin };
  for (const t of layout.texts) if (!inside(t, safe, 0.5)) fail(`"${t.str}" crosses the margin`);
  for (const img of layout.images) if (!inside(img, safe, 0.5)) fail('the photo crosses the margin');

  // The QR code: present, big enough, its quiet zone clear of text and inside the margins.
  const qr = layout.qr;
  if (!qr) {
    fail('no QR code');
    expect(problems).toEqual([]);
    return { leftOff, panelYear: false };
  }
  const side = qr.x1 - qr.x0;
  if (side < leg.qrPt - 0.5) fail(`QR code ${side.toFixed(1)} pt, under ${leg.qrPt.toFixed(1)}`);
  const modules = qrMatrix(c.build.url).size;
  if (side / modules < CARD_QR_MODULE_MIN_PT - 0.01) fail(`QR modules ${(side / modules).toFixed(2)} pt, under ${CARD_QR_MODULE_MIN_PT}`);
  const quiet = (side / modules) * QR_QUIET;
  const qrZone = { x0: qr.x0 - quiet, y0: qr.y0 - quiet, x1: qr.x1 + quiet, y1: qr.y1 + quiet };
  if (!inside(qrZone, safe, 0.5)) fail('the QR quiet zone crosses the margin');
  const decoded = readQr(cropPoints(scan, qrZone, SCAN_DPI, SCAN_AROUND_PT))?.data;
  if (decoded !== c.build.url) fail(`the QR code reads ${decoded === undefined ? 'nothing' : `"${decoded}"`} at ${SCAN_DPI} px per inch`);

  // No two text boxes overlap, and no text sits on the photo or the QR code.
  const texts = layout.texts;
  for (let i = 0; i < texts.length; i++) {
    for (let j = i + 1; j < texts.length; j++) if (overlaps(texts[i]!, texts[j]!, 0.25)) fail(`"${texts[i]!.str}" overlaps "${texts[j]!.str}"`);
    if (overlaps(texts[i]!, qrZone, 0.25)) fail(`"${texts[i]!.str}" is on the QR code`);
    for (const img of layout.images) if (overlaps(texts[i]!, img, 0.25)) fail(`"${texts[i]!.str}" is on the photo`);
  }
  for (const img of layout.images) if (overlaps(img, qrZone)) fail('the photo is on the QR code');

  // Sizes: the title and the entry number, the key figures, and every other line.
  const cap = (t: (typeof texts)[number]) => t.size * capShare(t.face!);
  const heading = norm(content.heading);
  const titleItems = texts.filter((t) => t.face === 'display-700' && heading.includes(norm(t.str).replace(/…$/, '')) && t.str.trim() !== c.show?.entryNumber);
  if (!titleItems.length) fail('no title');
  for (const t of titleItems) if (cap(t) < leg.titleCapPt - 0.01) fail(`title "${t.str}" cap height ${cap(t).toFixed(1)} pt`);
  if (c.show?.entryNumber) {
    const number = texts.find((t) => t.str.trim() === c.show!.entryNumber && t.face === 'display-700');
    if (!number) fail('no entry number');
    else if (cap(number) < leg.entryCapPt - 0.01) fail(`entry number cap height ${cap(number).toFixed(1)} pt`);
    // As large as the show's numbered card prints it, so the gate and the judges read both alike.
    const numbered = numberedCardNumberCapPt(numberedContentOf(content)!);
    if (number && cap(number) < numbered - 0.01) fail(`entry number cap height ${cap(number).toFixed(1)} pt, under the numbered card's ${numbered.toFixed(1)} pt`);
  }
  const values = new Set(content.figures.map((f) => f.value));
  const figureItems = texts.filter((t) => t.face === 'display-600' && values.has(t.str.trim()));
  // Only an entry's card, whose number prints as large as the numbered card's, may give up its figures, and then says so.
  const figuresLeftOff = Boolean(c.show?.entryNumber) && leftOff.some((l) => l.block === 'Key figures');
  if (values.size && !figureItems.length && !figuresLeftOff) fail('no key figure');
  for (const t of figureItems) if (cap(t) < leg.figureCapPt - 0.01) fail(`figure "${t.str}" cap height ${cap(t).toFixed(1)} pt`);
  // Small print allowed only for these: the footer, figure labels and notes, the QR caption, the entry label.
  const small = [ENGINEERING_CAUTION, 'PLACARD', 'ENTRY', 'Scan for the whole build', ...Object.values(CARD_FIGURE_LABELS), ...content.figures.map((f) => f.note), ...content.figures.map((f) => `${f.unit} ${f.mark}`)].map(norm).filter(Boolean);
  for (const t of texts) {
    if (t.size >= leg.linePt - 0.01 || small.some((s) => s.includes(norm(t.str).replace(/…$/, '')))) continue;
    fail(`"${t.str}" at ${t.size.toFixed(1)} pt`);
  }

  // A card with no photo keeps its year legible on the dark panel: WCAG 2.1's contrast ratio for large text, at least 3:1.
  const year = content.heading.match(/^\d{4}\b/)?.[0];
  const panelYear = !c.cover && year ? texts.find((t) => t.face === 'display-600' && t.str.trim() === year) : undefined;
  if (panelYear) {
    const ratio = contrastRatio(cropPoints(scan, panelYear, SCAN_DPI, 0));
    if (ratio < 3) fail(`the year on the photo panel has a contrast of ${ratio.toFixed(2)}:1`);
  }

  // What did not fit is named, and the card says where the rest is.
  const all = norm(texts.map((t) => t.str).join(''));
  if (!all.includes(norm(content.shortUrl))) fail('no short URL');
  if (leftOff.length && !all.includes(norm('More on the phone:'))) fail('no "more on the phone" line');
  // The owner's chosen highlight is printed, or named as what did not fit.
  if (content.highlight && !all.includes(norm(content.highlight.label)) && !leftOff.some((l) => l.block === 'Highlight')) fail('the highlight is neither printed nor named as left off');
  expect(problems).toEqual([]);

  if (pdf) {
    // Rendered alone through the service, as an owner downloads it: one page (its code was scanned above).
    expect(pageCount(pdf), label).toEqual({ tree: 1, objects: 1 });
  }
  return { leftOff, panelYear: Boolean(panelYear) };
}

/** WCAG 2.1's contrast ratio between the lightest and darkest pixels (relative luminance of sRGB, §1.4.3's definition). */
function contrastRatio(img: Pixels): number {
  const lin = (c: number) => (c / 255 <= 0.03928 ? c / 255 / 12.92 : ((c / 255 + 0.055) / 1.055) ** 2.4);
  let lo = 1;
  let hi = 0;
  for (let i = 0; i < img.data.length; i += 4) {
    const l = 0.2126 * lin(img.data[i]!) + 0.7152 * lin(img.data[i + 1]!) + 0.0722 * lin(img.data[i + 2]!);
    lo = Math.min(lo, l);
    hi = Math.max(hi, l);
  }
  return (hi + 0.05) / (lo + 0.05);
}

/** Renders `design` for the whole corpus and checks every card. */
export function describeCardLayouts(design: CardDesign) {
  describe(`${design} cards, read back from the PDF`, () => {
    it('never overlap, keep the margins, the minimum sizes, the QR code and the exact paper, for every build, paper and orientation', async () => {
      const cases = corpus(await demoCardBuildsInMemory());
      expect(cases.length).toBe(6 * 8 + 11);
      const rendered = await renderAll(design, cases);
      const leftOffs = cases.map((c, i) => ({ c, ...check(design, c, rendered[i]!) }));
      // Some card in the corpus has no photo and shows its year on the dark panel (its contrast was checked).
      expect(leftOffs.some((l) => l.panelYear)).toBe(true);
      // The longest build cannot fit whole anywhere: it is cut, and says so; the empty one never is.
      expect(leftOffs.filter((l) => l.c.name.startsWith('notes')).every((l) => l.leftOff.length > 0)).toBe(true);
      expect(leftOffs.filter((l) => l.c.name === 'empty build').every((l) => l.leftOff.length === 0)).toBe(true);
    });
  });
}


