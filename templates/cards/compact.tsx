import { creditsBlock, engineBlock, entryBlock, figuresBlock, footerBlock, moreBlock, photoBlock, qrBlock, qrBlockSide, sectionLinesBlock, storyBlock, titleBlock } from './blocks';
import { only, type DesignFn } from './design';

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
    credits: creditsBlock(ctx),
    story: storyBlock(ctx),
    photo: photoBlock(ctx, undefined, { spareOnly: true }),
    more: moreBlock(ctx),
    footer: footerBlock(ctx),
  });
  const priority = ['footer', 'title', 'entry', 'qr', 'figures', 'engine', 'sections', 'credits', 'story', 'photo'] as const;
  if (!box.landscape) {
    return {
      blocks,
      priority: [...priority],
      geo: {
        col: [
          { block: 'entry', width: cw },
          { block: 'title', width: cw },
          { row: [{ col: [{ block: 'figures', width: sideW }], width: sideW, gap: g }, { col: [{ block: 'qr', width: qrW }], width: qrW, gap: g }], gap: g * 1.5 },
          { block: 'engine', width: cw },
          { block: 'sections', width: cw },
          { block: 'credits', width: cw },
          { block: 'story', width: cw },
          { block: 'photo', width: cw },
          { block: 'more', width: cw },
          { block: 'footer', width: cw },
        ],
        width: cw,
        gap: g,
      },
    };
  }
  return {
    blocks,
    priority: [...priority],
    geo: {
      col: [
        {
          row: [
            { col: [{ block: 'title', width: sideW }, { block: 'figures', width: sideW }, { block: 'engine', width: sideW }, { block: 'sections', width: sideW }, { block: 'credits', width: sideW }, { block: 'story', width: sideW }, { block: 'photo', width: sideW }, { block: 'more', width: sideW }], width: sideW, gap: g },
            { col: [{ block: 'entry', width: qrW }, { block: 'qr', width: qrW }], width: qrW, gap: g },
          ],
          gap: g * 1.5,
        },
        { block: 'footer', width: cw },
      ],
      width: cw,
      gap: g,
    },
  };
};
