import { Document, Page, Path, Svg, View } from '@react-pdf/renderer';
import type { ReactElement } from 'react';
import type { CardShow, Orientation, Paper } from '@shared/schemas/card';
import type { CardContent } from './content';
import type { Laid } from './layout';
import { footerBlock, layEntryBlock, qrBlockSide, titleBlock, type Ctx } from './blocks';
import { Lines, QR_QUIET } from './parts';
import { linesHeight, setLines, textWidth } from './measure';
import { pageBox, GRAPHITE, INK, WHITE } from './theme';
import { TEXT } from './fonts';

/**
 * The show's numbered card, one per confirmed entry, printed in bulk by the organiser: the entry
 * number as large as the page allows with the show and class beside it, the car's headline, and the
 * QR code. Everything else stays on the owner's own card.
 *
 * Bump NUMBERED_CARD_DESIGN whenever the drawing changes: the render cache keys each card by its
 * content and this name, so a new design re-draws every card once.
 */
export const NUMBERED_CARD_DESIGN = 'numbered-1';

export type NumberedCardContent = {
  show: Required<Pick<CardShow, 'showName' | 'className' | 'entryNumber'>>;
  heading: string;
  name: string | null;
  qr: CardContent['qr'];
  shortUrl: string;
};

/**
 * The QR code as one path of horizontal runs rather than one square per module: the same picture
 * with about a third of the path commands, which is most of the drawing time of a card this plain
 * (hundreds of cards per print).
 */
function QrRuns({ qr, size }: { qr: CardContent['qr']; size: number }) {
  const n = qr.size + QR_QUIET * 2;
  let d = '';
  for (let y = 0; y < qr.size; y++) {
    for (let x = 0; x < qr.size; x++) {
      if (!qr.dark[y * qr.size + x]) continue;
      let run = 1;
      while (x + run < qr.size && qr.dark[y * qr.size + x + run]) run++;
      d += `M${x + QR_QUIET} ${y + QR_QUIET}h${run}v1h-${run}z`;
      x += run - 1;
    }
  }
  return (
    <Svg width={size} height={size} viewBox={`0 0 ${n} ${n}`} style={{ backgroundColor: WHITE, flexShrink: 0 }}>
      <Path d={d} fill={INK} />
    </Svg>
  );
}

/**
 * The QR code with its short URL and caption, sized like the cards' QR block (`qrBlock`, whose
 * code is drawn one square per module), its code drawn as runs.
 */
function qrRunsBlock({ content, k, leg }: Ctx, scale: number): Laid {
  const side = qrBlockSide(content, leg.qrPt * scale);
  let urlSize = Math.max(leg.linePt, 13 * k);
  while (urlSize > 7 && textWidth(content.shortUrl, 'display-500', urlSize) > side * 0.97) urlSize -= 0.25;
  const url = setLines([{ text: content.shortUrl, face: 'display-500' }], urlSize, side, 1.25);
  const caption = setLines([{ text: 'Scan for the whole build', face: 'text-400' }], Math.max(leg.linePt * 0.9, 9), side, 1.3).slice(0, 1);
  return {
    height: side + linesHeight(url) + linesHeight(caption),
    draw: () => (
      <View style={{ width: side, alignItems: 'center' }}>
        <QrRuns qr={content.qr} size={side} />
        <Lines lines={url} align="center" />
        <Lines lines={caption} color={GRAPHITE} align="center" />
      </View>
    ),
  };
}

const NUMBER_SCALES = [4.6, 4, 3.4, 2.8, 2.2, 1.6, 1.25, 1];
const QR_SCALES = [1.6, 1.4, 1.2, 1];

/** The blocks' shared context: a card content with only what a numbered card prints. */
function ctxOf(content: NumberedCardContent, box: ReturnType<typeof pageBox>, contentHeight: number): Ctx {
  const card: CardContent = {
    heading: content.heading,
    name: content.name,
    byline: '',
    figures: [],
    engineLine: '',
    sections: [],
    credits: [],
    story: '',
    caution: null,
    qr: content.qr,
    shortUrl: content.shortUrl,
    cover: null,
    show: content.show,
  };
  return { content: card, k: box.k, leg: box.leg, contentHeight };
}

/** The measured parts of a numbered card that decide how large its number prints. */
function measureNumberedCard(content: NumberedCardContent, paper: Paper, orientation: Orientation) {
  const box = pageBox(paper, orientation);
  const width = box.width - 2 * box.margin;
  const ch = box.height - 2 * box.margin;
  const gap = 18 * box.k;
  const ctx = ctxOf(content, box, ch);
  const footer = footerBlock(ctx).lay(0, width)!;
  const qrAt = (i: number) => qrRunsBlock(ctx, QR_SCALES[i]!);
  const title = titleBlock(ctx);
  const titleMin = title.lay(title.steps - 1, width)!;
  const fixed = (entry: Laid, qr: Laid, t: Laid) => entry.height + qr.height + t.height + footer.height + 3 * gap;
  const smallestQr = qrAt(QR_SCALES.length - 1);
  // The number takes the largest scale that leaves room for the title at its floor and the smallest QR code.
  const numberScale = NUMBER_SCALES.find((scale) => fixed(layEntryBlock(content.show, width, { k: box.k, leg: box.leg, numberScale: scale }), smallestQr, titleMin) <= ch) ?? 1;
  return { box, width, ch, gap, footer, qrAt, title, titleMin, fixed, smallestQr, numberScale };
}

/** What a numbered card for this owner's card would print (its show block, headline and QR code). */
export const numberedContentOf = (content: CardContent): NumberedCardContent | null => {
  const { show } = content;
  if (!show?.entryNumber) return null;
  return { show: { showName: show.showName ?? '', className: show.className ?? '', entryNumber: show.entryNumber }, heading: content.heading, name: content.name, qr: content.qr, shortUrl: content.shortUrl };
};

/**
 * The cap height, in points, of the entry number on this content's numbered card as the show prints
 * it (Letter, portrait): the owner's own card for the entry prints its number at least this large.
 */
export function numberedCardNumberCapPt(content: NumberedCardContent): number {
  const { box, numberScale } = measureNumberedCard(content, 'letter', 'portrait');
  return box.leg.entryCapPt * numberScale;
}

/**
 * Lays the page out by measuring: the footer and the smallest QR code are kept, then the number
 * takes the largest scale that leaves room for the title at its floor, then the QR code and the
 * title grow into what is left, in that order.
 */
export function layoutNumberedCard(content: NumberedCardContent, paper: Paper = 'letter', orientation: Orientation = 'portrait'): ReactElement {
  const { box, width, ch, gap, footer, qrAt, title, titleMin, fixed, smallestQr, numberScale } = measureNumberedCard(content, paper, orientation);
  const entry = layEntryBlock(content.show, width, { k: box.k, leg: box.leg, numberScale });
  let qr = smallestQr;
  for (let i = 0; i < QR_SCALES.length; i++) {
    const laid = qrAt(i);
    if (fixed(entry, laid, titleMin) <= ch) {
      qr = laid;
      break;
    }
  }
  const titleRoom = ch - (entry.height + qr.height + footer.height + 3 * gap);
  let heading: Laid = title.lay(title.steps - 1, width, titleRoom) ?? titleMin;
  for (let step = 0; step < title.steps; step++) {
    const laid = title.lay(step, width);
    if (laid && laid.height <= titleRoom) {
      heading = laid;
      break;
    }
  }
  const spare = Math.max(0, ch - (entry.height + heading.height + qr.height + footer.height + 3 * gap));
  return (
    <Page size={[box.width, box.height]} wrap={false} style={{ backgroundColor: WHITE, padding: box.margin, fontFamily: TEXT, color: INK }}>
      <View style={{ height: ch, overflow: 'hidden', flexDirection: 'column' }}>
        <View style={{ height: entry.height, flexShrink: 0 }}>{entry.draw(width, entry.height)}</View>
        <View style={{ height: heading.height, marginTop: gap, flexShrink: 0 }}>{heading.draw(width, heading.height)}</View>
        <View style={{ height: qr.height, marginTop: gap + spare / 2, flexShrink: 0, alignItems: 'center' }}>{qr.draw(width, qr.height)}</View>
        <View style={{ height: footer.height, marginTop: gap + spare / 2, flexShrink: 0 }}>{footer.draw(width, footer.height)}</View>
      </View>
    </Page>
  );
}

/** A document of numbered cards, one page each, in the order given. */
export function NumberedCardsDocument({ pages, title }: { pages: ReactElement[]; title: string }) {
  return (
    <Document title={title} author="Placard" creator="Placard" producer="Placard">
      {pages}
    </Document>
  );
}
