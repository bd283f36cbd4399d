import { Document, Page, View } from '@react-pdf/renderer';
import type { ReactElement } from 'react';
import type { CardShow, Orientation, Paper } from '@shared/schemas/card';
import type { CardContent } from './content';
import type { Laid } from './layout';
import { footerBlock, layEntryBlock, qrBlock, titleBlock, type Ctx } from './blocks';
import { pageBox, INK, WHITE } from './theme';
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

/**
 * Lays the page out by measuring: the footer and the smallest QR code are kept, then the number
 * takes the largest scale that leaves room for the title at its floor, then the QR code and the
 * title grow into what is left, in that order.
 */
export function layoutNumberedCard(content: NumberedCardContent, paper: Paper = 'letter', orientation: Orientation = 'portrait'): ReactElement {
  const box = pageBox(paper, orientation);
  const width = box.width - 2 * box.margin;
  const ch = box.height - 2 * box.margin;
  const gap = 18 * box.k;
  const ctx = ctxOf(content, box, ch);
  const footer = footerBlock(ctx).lay(0, width)!;
  const qrAt = (i: number) => qrBlock(ctx, QR_SCALES[i]).lay(0, width)!;
  const title = titleBlock(ctx);
  const titleMin = title.lay(title.steps - 1, width)!;
  const fixed = (entry: Laid, qr: Laid, t: Laid) => entry.height + qr.height + t.height + footer.height + 3 * gap;

  const smallestQr = qrAt(QR_SCALES.length - 1);
  let entry = layEntryBlock(content.show, width, { k: box.k, leg: box.leg, numberScale: 1 });
  for (const scale of NUMBER_SCALES) {
    const laid = layEntryBlock(content.show, width, { k: box.k, leg: box.leg, numberScale: scale });
    if (fixed(laid, smallestQr, titleMin) <= ch) {
      entry = laid;
      break;
    }
  }
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
