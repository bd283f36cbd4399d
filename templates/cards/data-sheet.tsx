import { creditsBlock, engineBlock, entryBlock, figuresBlock, footerBlock, moreBlock, photoBlock, qrBlock, qrBlockSide, sectionRowsBlock, storyBlock, titleBlock } from './blocks';
import { only, type DesignFn } from './design';

/**
 * Data sheet: the title and the show beside the QR code, the figures on a rule, then every chosen
 * section as a block of label / value rows poured into columns. A sparse build's photo fills what
 * the rows leave.
 */
export const dataSheetDesign: DesignFn = (ctx, box) => {
  const { k } = ctx;
  const cw = box.width - 2 * box.margin;
  const g = 12 * k;
  const qrW = qrBlockSide(ctx.content, ctx.leg.qrPt);
  const headW = cw - qrW - g * 1.5;
  const blocks = only({
    title: titleBlock(ctx, 1.4),
    entry: entryBlock(ctx),
    qr: qrBlock(ctx),
    figures: figuresBlock(ctx, { growTo: 1.3 }),
    engine: engineBlock(ctx),
    sections: sectionRowsBlock(ctx, box.landscape ? 3 : 2),
    credits: creditsBlock(ctx),
    photo: ctx.content.cover ? photoBlock(ctx, [0.25, 0.15]) : undefined,
    story: storyBlock(ctx),
    more: moreBlock(ctx),
    footer: footerBlock(ctx),
  });
  return {
    blocks,
    priority: ['footer', 'title', 'entry', 'qr', 'figures', 'engine', 'sections', 'credits', 'photo', 'story'],
    geo: {
      col: [
        { row: [{ col: [{ block: 'title', width: headW }, { block: 'entry', width: headW }], width: headW, gap: g }, { col: [{ block: 'qr', width: qrW }], width: qrW, gap: g }], gap: g * 1.5 },
        { block: 'figures', width: cw },
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
};
