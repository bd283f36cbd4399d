import { Document, Page, View } from '@react-pdf/renderer';
import type { ReactElement } from 'react';
import type { CardDesign, CardLeftOff, Orientation, Paper } from '@shared/schemas/card';
import type { CardContent } from './content';
import { fitBlocks, place, type Fitted, type Placed } from './layout';
import type { DesignFn } from './design';
import { posterDesign } from './poster';
import { numberedCardNumberCapPt, numberedContentOf } from './numbered-card';
import { dataSheetDesign } from './data-sheet';
import { compactDesign } from './compact';
import { pageBox, INK, WHITE } from './theme';
import { TEXT } from './fonts';

const DESIGNS: Record<CardDesign, DesignFn> = { poster: posterDesign, 'data-sheet': dataSheetDesign, compact: compactDesign };

/** Draws the placed tree with flex boxes: columns stack, rows sit side by side, every block in a box of its own size. */
function draw(node: Placed, fitted: Fitted, key?: number): ReactElement {
  const geo = node.geo;
  if ('block' in geo) {
    return (
      <View key={key} style={{ width: geo.width, height: node.height, overflow: 'hidden', flexShrink: 0 }}>
        {fitted.laid.get(geo.block)!.draw(geo.width, node.height)}
      </View>
    );
  }
  const row = 'row' in geo;
  return (
    <View key={key} style={{ flexDirection: row ? 'row' : 'column', height: node.height, flexShrink: 0, ...(row ? {} : { width: geo.width }) }}>
      {node.children.map((child, i) => (
        <View key={i} style={{ flexShrink: 0, ...(i ? (row ? { marginLeft: geo.gap } : { marginTop: geo.gap }) : {}) }}>
          {draw(child, fitted)}
        </View>
      ))}
    </View>
  );
}

/** Lays a card out: the page element and the list of what did not fit. */
export function layoutCard(content: CardContent, design: CardDesign, paper: Paper, orientation: Orientation): { page: ReactElement; leftOff: CardLeftOff[] } {
  const box = pageBox(paper, orientation);
  const ch = box.height - 2 * box.margin;
  // A card for a show entry prints its number at least as large as the show's numbered card does.
  const numbered = numberedContentOf(content);
  const entryNumberScale = numbered ? numberedCardNumberCapPt(numbered) / box.leg.entryCapPt : undefined;
  const d = DESIGNS[design]({ content, k: box.k, leg: box.leg, contentHeight: ch, entryNumberScale }, box);
  const fitted = fitBlocks(d.geo, d.blocks, d.priority, ch);
  const placed = place(d.geo, ch, fitted, d.blocks);
  const page = (
    <Page size={[box.width, box.height]} wrap={false} style={{ backgroundColor: WHITE, padding: box.margin, fontFamily: TEXT, color: INK }}>
      <View style={{ height: ch, overflow: 'hidden' }}>{placed ? draw(placed, fitted) : null}</View>
    </Page>
  );
  return { page, leftOff: fitted.leftOff };
}

/** A windshield card: one document, one page, in the chosen design and paper. */
export function CardDocument({ page, title }: { page: ReactElement; title: string }) {
  return (
    <Document title={title} author="Placard" creator="Placard" producer="Placard">
      {page}
    </Document>
  );
}
