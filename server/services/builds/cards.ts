import { createElement } from 'react';
import { coverPhotoOf } from '@shared/build-sheet/cover';
import { renderToBuffer } from '@react-pdf/renderer';
import QRCode from 'qrcode';
import { BUILD_STYLE_LABELS, type PublicBuild } from '@shared/schemas/build';
import { ENGINEERING_CAUTION } from '@shared/calc';
import { CARD_FIGURES, DEFAULT_CARD_SETTINGS, CardSettingsSchema, type CardLeftOff, type CardQuery, type CardSettings, type CardShow } from '@shared/schemas/card';
import { CardDocument, layoutCard } from '@templates/cards/card-document';
import type { CardContent, CardHighlightWords } from '@templates/cards/content';
import { registerCardFonts } from '@templates/cards/fonts';
import type { Build } from '../../models/build';
import { storage } from '../../storage/index';
import { keyOfMediaUrl } from '../../storage/keys';
import { computeKeyFigures } from '@shared/build-sheet/key-figures';
import { PROVENANCE_MARKS } from '@shared/build-sheet/choice-labels';
import { headlineOf } from '@shared/build-sheet/headline';
import { engineLine, sectionViews } from '@shared/build-sheet/spec-lines';
import { shownEngineering } from '@shared/build-sheet/engineering-shown';

/** Medium error correction (about 15% of the code can be lost to glare or a scuff) and a short URL: a low version, big modules. */
export const QR_ERROR_CORRECTION = 'M' as const;
const QR_INK = '#1C1B19';

export function qrMatrix(url: string): CardContent['qr'] {
  const { modules } = QRCode.create(url, { errorCorrectionLevel: QR_ERROR_CORRECTION });
  return { size: modules.size, dark: Array.from(modules.data, (v) => v === 1) };
}

export const qrPng = (url: string, width = 1200) =>
  QRCode.toBuffer(url, { type: 'png', errorCorrectionLevel: QR_ERROR_CORRECTION, margin: 4, width, color: { dark: QR_INK, light: '#FFFFFF' } });

export const qrSvg = (url: string) => QRCode.toString(url, { type: 'svg', errorCorrectionLevel: QR_ERROR_CORRECTION, margin: 4, color: { dark: QR_INK, light: '#FFFFFF' } });

/** "placard.example/c/K7P2M9Q": what a person can type if the code will not scan. */
export const shortUrlOf = (url: string) => url.replace(/^https?:\/\//, '');

/** The owner's saved choices, read leniently: a stored value that no longer parses falls back to the defaults. */
export function savedCardSettings(build: Pick<Build, 'cardSettings'>): CardSettings {
  const parsed = CardSettingsSchema.safeParse(build.cardSettings ?? {});
  return parsed.success ? parsed.data : DEFAULT_CARD_SETTINGS;
}

export async function saveCardSettings(build: Build, settings: CardSettings): Promise<void> {
  await build.update({ cardSettings: settings });
}

/** `question:12` → that highlight; `none` → no highlight (null); left out → undefined, the saved one. */
function highlightFromQuery(value: string | undefined): CardSettings['highlight'] | undefined {
  if (value === undefined) return undefined;
  if (value === 'none') return null;
  const [kind, id] = value.split(':');
  return { kind: kind === 'log' ? 'log' : 'question', id: Number(id) };
}

/** Query over saved settings over defaults. */
export function settingsFromQuery(saved: CardSettings, q: CardQuery): CardSettings {
  const highlight = highlightFromQuery(q.highlight);
  return {
    design: q.design ?? saved.design,
    paper: q.paper ?? saved.paper,
    orientation: q.orientation ?? saved.orientation,
    sections: q.sections ?? saved.sections,
    figures: q.figures ?? saved.figures,
    units: q.units ?? saved.units,
    highlight: highlight === undefined ? (saved.highlight ?? null) : highlight,
  };
}

export const showFromQuery = (q: CardQuery): CardShow | null => (q.showName || q.className || q.entryNumber ? { showName: q.showName, className: q.className, entryNumber: q.entryNumber } : null);

export type CoverImage = NonNullable<CardContent['cover']>;

export { availableFigures } from '@shared/build-sheet/key-figures';

/** The words and figures of a card, from the public face of the build only (never the model). */
export function cardContent(build: PublicBuild, settings: CardSettings, opts: { show?: CardShow | null; cover?: CoverImage | null; qrUrl?: string; highlight?: CardHighlightWords | null } = {}): CardContent {
  const units = settings.units;
  const { heading, kicker: name } = headlineOf(build);
  const style = build.style && build.style in BUILD_STYLE_LABELS ? BUILD_STYLE_LABELS[build.style as keyof typeof BUILD_STYLE_LABELS] : null;
  const figures = computeKeyFigures(build)
    .filter((f) => settings.figures.includes(f.key))
    .sort((a, b) => CARD_FIGURES.indexOf(a.key) - CARD_FIGURES.indexOf(b.key))
    .map((f) => {
      const [value = '', unit = ''] = f[units].text.split('\u00a0');
      const note = [f.note, f.measuredOn ? `measured ${f.measuredOn}` : ''].filter(Boolean).join(', ');
      return { label: f.label, value, unit, mark: PROVENANCE_MARKS[f.provenance], note };
    });
  const views = sectionViews(build.sections, units, settings.sections);
  // The worked-out figures of the sections printed on this card: the brake split with the brakes, the rest with the chassis.
  const engineering = (shownEngineering(build, units)?.figures ?? []).filter((f) => settings.sections.includes(f.key === 'brakeSplit' ? 'brakes' : 'chassis')).map(({ label, value }) => ({ label, value }));
  return {
    heading,
    name,
    byline: [style, build.ownerName ? `owned by ${build.ownerName}` : null].filter(Boolean).join('  ·  '),
    figures,
    engineLine: settings.sections.includes('engine') ? engineLine(build.sections.engine, units) : '',
    sections: views.map((v) => ({ kind: v.kind, label: v.label, summary: v.summary || v.madeBy || v.note || '', rows: v.rows, madeBy: v.madeBy })),
    credits: build.credits,
    story: build.story ?? '',
    engineering,
    caution: views.some((v) => v.caution) || engineering.length ? ENGINEERING_CAUTION : null,
    // A show's card marks its QR with the show and number (`numberedCardAddress`); the printed address stays the plain one.
    qr: qrMatrix(opts.qrUrl ?? build.url),
    shortUrl: shortUrlOf(build.url),
    cover: opts.cover ?? null,
    show: opts.show ?? null,
    highlight: opts.highlight ?? null,
  };
}

/** The stored photo a card prints: the cover (or the first photo), as JPEG, big enough for the paper. */
export function coverSourceKey(build: PublicBuild, settings: CardSettings): string | null {
  const photo = coverPhotoOf(build.photos);
  if (!photo || photo.sources.length === 0) return null;
  const want = settings.paper === 'tabloid' || settings.paper === 'a3' ? 1600 : 960;
  const source = photo.sources.find((s) => s.width >= want) ?? photo.sources[photo.sources.length - 1]!;
  return keyOfMediaUrl(source.jpeg);
}

/** The cover photo's bytes from storage, or null (no photo, or the file is gone: the card prints without it). */
export async function loadCoverImage(build: PublicBuild, settings: CardSettings): Promise<CoverImage | null> {
  const key = coverSourceKey(build, settings);
  if (!key) return null;
  const object = await storage.get(key);
  if (!object) return null;
  const chunks: Buffer[] = [];
  for await (const chunk of object.body) chunks.push(chunk as Buffer);
  const photo = coverPhotoOf(build.photos)!;
  return { data: Buffer.concat(chunks), format: 'jpg', width: photo.width, height: photo.height };
}

/** One card, one page, as a PDF, and what did not fit on it (the designer tells the owner). */
export async function renderCard(build: PublicBuild, settings: CardSettings, opts: { show?: CardShow | null; cover?: CoverImage | null; qrUrl?: string; highlight?: CardHighlightWords | null } = {}): Promise<{ pdf: Buffer; leftOff: CardLeftOff[] }> {
  registerCardFonts();
  const content = cardContent(build, settings, opts);
  const { page, leftOff } = layoutCard(content, settings.design, settings.paper, settings.orientation);
  const doc = createElement(CardDocument, { page, title: `${build.title} (${build.code})` });
  return { pdf: await renderToBuffer(doc as Parameters<typeof renderToBuffer>[0]), leftOff };
}

export const renderCardPdf = async (...args: Parameters<typeof renderCard>): Promise<Buffer> => (await renderCard(...args)).pdf;
