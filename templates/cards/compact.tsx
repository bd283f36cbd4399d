import { creditsBlock, engineBlock, entryAcross, entryBlock, figuresBlock, footerBlock, moreBlock, photoBlock, qrBlock, qrBlockSide, sectionLinesBlock, storyBlock, titleBlock, highlightBlock } from './blocks';
import { only, type DesignFn } from './design';
import { column } from './layout';

/**
 * Compact: few words, all of them big, and the largest QR code of the three designs. The figures
 * stack beside the code; section lines, credits and story follow only while there is room.
 */
export const compactDesign: DesignFn = (ctx, box) => {
  const { k } = ctx;
  const cw = box.width - 2 * box.margin;
  const g = 14 * k;
  const qrScale = 1.2;
  const qrW = qrBlockSide(ctx.content, ctx.leg.qrPt * qrScale);
  const sideW = cw - qrW - g * 1.5;
  const big = { ...ctx, leg: { ...ctx.leg, linePt: ctx.leg.linePt * 1.2 } };
  const blocks = only({
    title: titleBlock(ctx, 1.9),
    entry: entryBlock(ctx),
    qr: qrBlock(ctx, qrScale),
    figures: figuresBlock(ctx, { maxCols: box.landscape ? 3 : 1, growTo: 1.8 }),
    engine: engineBlock(big),
    sections: sectionLinesBlock(big),
    highlight: highlightBlock(ctx),
    credits: creditsBlock(ctx),
    story: storyBlock(ctx),
    photo: photoBlock(ctx, undefined, { spareOnly: true }),
    more: moreBlock(ctx),
    footer: footerBlock(ctx),
  });
  const priority = ['footer', 'title', 'entry', 'qr', 'figures', 'engine', 'sections', 'highlight', 'credits', 'story', 'photo'] as const;
  if (!box.landscape) {
    return {
      blocks,
      priority: [...priority],
      geo: column(['entry', 'title', { row: [column(['figures'], sideW, g), column(['qr'], qrW, g)], gap: g * 1.5 }, 'engine', 'sections', 'highlight', 'credits', 'story', 'photo', 'more', 'footer'], cw, g),
    };
  }
  // A card for a show entry prints its number as large as the show's numbered card: across the page, on top.
  const across = entryAcross(ctx, qrW);
  return {
    blocks,
    priority: [...priority],
    geo: column([...(across ? ['entry' as const] : []), { row: [column(['title', 'figures', 'engine', 'sections', 'highlight', 'credits', 'story', 'photo', 'more'], sideW, g), column(across ? ['qr'] : ['entry', 'qr'], qrW, g)], gap: g * 1.5 }, 'footer'], cw, g),
  };
};
