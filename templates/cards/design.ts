import type { BlockId, BlockSpec, Geo } from './layout';
import type { Ctx } from './blocks';
import type { PageBox } from './theme';

/** A card design: where the blocks go (columns and rows of fixed widths) and which give way first. */
export type Design = {
  geo: Geo;
  blocks: Partial<Record<BlockId, BlockSpec>>;
  /** Most important first; the last gives way first. */
  priority: BlockId[];
};
export type DesignFn = (ctx: Ctx, box: PageBox) => Design;

/** Drops blocks a card does not have (no show, no figures, no credits). */
export const only = (blocks: Partial<Record<BlockId, BlockSpec | undefined>>) =>
  Object.fromEntries(Object.entries(blocks).filter(([, b]) => b)) as Partial<Record<BlockId, BlockSpec>>;
