import { creditsBlock, engineBlock, entryAcross, entryBlock, figuresBlock, footerBlock, moreBlock, photoBlock, qrBlock, qrBlockSide, sectionLinesBlock, storyBlock, titleBlock, highlightBlock } from './blocks';
import { only, type DesignFn } from './design';
import { column } from './layout';

/**
 * Poster: the cover photo large, the title in big condensed capitals, the headline figures on a
 * heavy rule, then one line per section beside the QR code. The photo takes whatever is left, so a
 * sparse build gets a bigger photo instead of blank paper.
 */
export const posterDesign: DesignFn = (ctx, box) => {
  const { k } = ctx;
  const cw = box.width - 2 * box.margin;
  const g = 12 * k;
  const qrW = qrBlockSide(ctx.content, ctx.leg.qrPt);
  const blocks = only({
    title: titleBlock(ctx),
    entry: entryBlock(ctx),
    qr: qrBlock(ctx),
    figures: figuresBlock(ctx),
    photo: photoBlock(ctx),
    engine: engineBlock(ctx),
    sections: sectionLinesBlock(ctx),
    highlight: highlightBlock(ctx),
    credits: creditsBlock(ctx),
    story: storyBlock(ctx),
    more: moreBlock(ctx),
    footer: footerBlock(ctx),
  });
  const priority = ['footer', 'title', 'entry', 'qr', 'figures', 'photo', 'engine', 'sections', 'highlight', 'credits', 'story'] as const;
  if (!box.landscape) {
    const leftW = cw - qrW - g;
    return {
      blocks,
      priority: [...priority],
      geo: column(['entry', 'photo', 'title', { row: [column(['figures', 'engine', 'sections', 'highlight', 'credits', 'story', 'more'], leftW, g), column(['qr'], qrW, g)], gap: g }, 'footer'], cw, g),
    };
  }
  const leftW = Math.max(qrW, Math.round(cw * 0.4));
  const rightW = cw - leftW - g * 1.5;
  return {
    blocks,
    priority: [...priority],
    // A card for a show entry prints its number as large as the show's numbered card: across the page, on top.
    geo: entryAcross(ctx, leftW)
      ? column(['entry', { row: [column(['photo', 'qr'], leftW, g), column(['title', 'figures', 'engine', 'sections', 'highlight', 'credits', 'story', 'more'], rightW, g)], gap: g * 1.5 }, 'footer'], cw, g)
      : column([{ row: [column(['entry', 'photo', 'qr'], leftW, g), column(['title', 'figures', 'engine', 'sections', 'highlight', 'credits', 'story', 'more'], rightW, g)], gap: g * 1.5 }, 'footer'], cw, g),
  };
};
