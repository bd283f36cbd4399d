import { creditsBlock, engineBlock, engineeringBlock, entryAcross, entryBlock, figuresBlock, footerBlock, moreBlock, photoBlock, qrBlock, qrBlockSide, sectionRowsBlock, storyBlock, titleBlock, highlightBlock } from './blocks';
import { only, type DesignFn } from './design';
import { column, fitBlocks, type BlockId, type Geo } from './layout';

/**
 * Data sheet: the title and the show beside the QR code, the figures on a rule, then every chosen
 * section as a block of label / value rows poured into columns. The photo (or, without one, a dark
 * panel with the year) fills what the rows leave.
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
    // The engine's own rows say all the engine line says (and more): one of them, not both.
    engine: ctx.content.sections.some((s) => s.kind === 'engine' && s.rows.length) ? undefined : engineBlock(ctx),
    engineering: engineeringBlock(ctx),
    sections: sectionRowsBlock(ctx, box.landscape ? 3 : 2),
    highlight: highlightBlock(ctx),
    credits: creditsBlock(ctx),
    // Without a photo the dark panel with the year takes what the rows leave, so a sparse sheet is not half blank.
    photo: photoBlock(ctx, [0.25, 0.15]),
    story: storyBlock(ctx),
    more: moreBlock(ctx),
    footer: footerBlock(ctx),
  });
  // The worked-out figures the owner chose come before the section rows, which cut cleanly at any line.
  const priority: BlockId[] = ['footer', 'title', 'entry', 'qr', 'figures', 'engine', 'engineering', 'sections', 'highlight', 'credits', 'photo', 'story'];
  // The head: title and show beside the code, the figures below. A long title (and a long show name)
  // can make that head so tall that the figures fall off the card; then the figures move up beside
  // the code, with the title across the page above when that keeps more. The head that keeps the
  // most important blocks whole wins; ties keep the usual one.
  const beside = (ids: BlockId[]): Geo => ({ row: [column(ids, headW, g), column(['qr'], qrW, g)], gap: g * 1.5 });
  // A card for a show entry prints its number as large as the show's numbered card: across the page, on top.
  const heads: Array<Array<BlockId | Geo>> = entryAcross(ctx, headW)
    ? [
        ['entry', beside(['title']), 'figures'],
        ['entry', beside(['title', 'figures'])],
        ['entry', 'title', beside(['figures'])],
      ]
    : [
        [beside(['title', 'entry']), 'figures'],
        [beside(['title', 'entry', 'figures'])],
        ['title', beside(['entry', 'figures'])],
        ['title', 'entry', beside(['figures'])],
      ];
  const geoWith = (head: Array<BlockId | Geo>): Geo => column([...head, 'engine', 'engineering', 'sections', 'highlight', 'credits', 'story', 'photo', 'more', 'footer'], cw, g);
  // How many blocks, most important first, a head keeps whole.
  const kept = (geo: Geo) => {
    const lostLabels = new Set(fitBlocks(geo, blocks, priority, ctx.contentHeight).leftOff.map((l) => l.block));
    const lost = priority.findIndex((id) => blocks[id] && lostLabels.has(blocks[id].label));
    return lost < 0 ? priority.length : lost;
  };
  // Only a head that loses the figures (or more) is worth changing the card's usual look for.
  const figuresAt = priority.indexOf('figures');
  let best = geoWith(heads[0]!);
  let bestKept = kept(best);
  for (const head of heads.slice(1)) {
    if (bestKept > figuresAt) break;
    const geo = geoWith(head);
    const keeps = kept(geo);
    if (keeps > bestKept) [best, bestKept] = [geo, keeps];
  }
  return { blocks, priority, geo: best };
};
