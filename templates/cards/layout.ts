import type { ReactElement } from 'react';
import type { CardLeftOff } from '@shared/schemas/card';

// The card layout engine: blocks measured with the fonts' real metrics, stacked in columns and rows
// (drawn with react-pdf's flex layout, every block in a box of its measured height), and fitted by
// a declared priority order. Nothing is positioned absolutely, so nothing can overlap.

export type BlockId = 'entry' | 'title' | 'qr' | 'figures' | 'photo' | 'engine' | 'engineering' | 'sections' | 'credits' | 'highlight' | 'story' | 'more' | 'footer';

/** A block laid out at one size: its height and how to draw it in a box of a given size. */
export type Laid = { height: number; draw: (width: number, height: number) => ReactElement; leftOff?: CardLeftOff[] };

export type BlockSpec = {
  label: string;
  /** Size steps, 0 the largest; the last is the block's minimum (the legibility floor). */
  steps: number;
  /** Lays the block out; with `maxHeight` a cuttable block prints what fits (null when nothing does). */
  lay(step: number, width: number, maxHeight?: number): Laid | null;
  cuttable?: boolean;
  /** Takes the space its column has left over (the photo). */
  grow?: boolean;
  /** Never dropped (the QR code, the entry block, the footer). */
  keep?: boolean;
};

export type Geo = { block: BlockId; width: number } | { col: Geo[]; width: number; gap: number } | { row: Geo[]; gap: number };

/** A column of the given width: a block named by its id takes the column's width, a nested row or column its own. */
export const column = (items: Array<BlockId | Geo>, width: number, gap: number): Geo => ({ col: items.map((item) => (typeof item === 'string' ? { block: item, width } : item)), width, gap });

type State = { step: Partial<Record<BlockId, number>>; cut: Partial<Record<BlockId, number>>; dropped: Set<BlockId> };
export type Fitted = { state: State; laid: Map<BlockId, Laid>; leftOff: CardLeftOff[] };

/** Whether anything worth naming was cut or left off (a block with no label is decoration). */
export const anyCut = (s: Pick<State, 'cut' | 'dropped'>, blocks: Partial<Record<BlockId, BlockSpec>>) =>
  [...s.dropped].some((id) => blocks[id]?.label) || Object.keys(s.cut).length > 0;

function layAll(geo: Geo, blocks: Partial<Record<BlockId, BlockSpec>>, state: State, out: Map<BlockId, Laid>) {
  if ('block' in geo) {
    const spec = blocks[geo.block];
    if (!spec || state.dropped.has(geo.block)) return;
    const laid = geo.block === 'more' ? (anyCut(state, blocks) ? spec.lay(0, geo.width) : null) : spec.lay(state.step[geo.block] ?? 0, geo.width, state.cut[geo.block]);
    if (laid && laid.height > 0) out.set(geo.block, laid);
    return;
  }
  for (const g of 'col' in geo ? geo.col : geo.row) layAll(g, blocks, state, out);
}

const present = (geo: Geo, laid: Map<BlockId, Laid>): boolean => ('block' in geo ? laid.has(geo.block) : ('col' in geo ? geo.col : geo.row).some((g) => present(g, laid)));

/** Natural height of a node: a column stacks its children with gaps, a row is as tall as its tallest child. */
export function heightOf(geo: Geo, laid: Map<BlockId, Laid>): number {
  if ('block' in geo) return laid.get(geo.block)?.height ?? 0;
  const kids = ('col' in geo ? geo.col : geo.row).filter((g) => present(g, laid));
  const hs = kids.map((g) => heightOf(g, laid));
  return 'col' in geo ? hs.reduce((a, b) => a + b, 0) + Math.max(0, kids.length - 1) * geo.gap : Math.max(0, ...hs);
}

/**
 * Fits the blocks into `height`: every block starts at its minimum size; if that fits, blocks grow
 * back in priority order as far as the page allows; if not, the lowest-priority blocks are cut
 * (cuttable ones print what fits) or left off, until it fits. The "more on the phone" block appears
 * as soon as anything is cut.
 */
export function fitBlocks(geo: Geo, blocks: Partial<Record<BlockId, BlockSpec>>, priority: BlockId[], height: number): Fitted {
  // Every block is laid out once per size, width and cut: the search below asks for the same ones often.
  const cache = new Map<string, Laid | null>();
  const memo = Object.fromEntries(
    Object.entries(blocks).map(([id, spec]) => [
      id,
      {
        ...spec,
        lay(step: number, width: number, maxHeight?: number) {
          const key = `${id}|${step}|${width}|${maxHeight ?? ''}`;
          if (!cache.has(key)) cache.set(key, spec.lay(step, width, maxHeight));
          return cache.get(key)!;
        },
      },
    ]),
  ) as Partial<Record<BlockId, BlockSpec>>;
  const ids = priority.filter((id) => blocks[id]);
  const state: State = { step: Object.fromEntries(ids.map((id) => [id, blocks[id]!.steps - 1])), cut: {}, dropped: new Set() };
  const evaluate = () => {
    const laid = new Map<BlockId, Laid>();
    layAll(geo, memo, state, laid);
    return { laid, h: heightOf(geo, laid) };
  };
  const fits = () => evaluate().h <= height + 0.01;

  if (fits()) {
    // Grow: the most important block first takes the largest size that still fits.
    for (const id of ids) {
      const min = state.step[id]!;
      for (let s = 0; s < min; s++) {
        state.step[id] = s;
        if (fits()) break;
        state.step[id] = min;
      }
    }
  } else {
    for (const id of [...ids].reverse()) {
      const spec = blocks[id]!;
      if (spec.keep) continue;
      if (spec.cuttable) {
        const full = spec.lay(state.step[id]!, widthOf(geo, id) ?? 0)?.height ?? 0;
        let lo = 0;
        let hi = full;
        for (let i = 0; i < 14 && hi - lo > 0.5; i++) {
          const mid = (lo + hi) / 2;
          state.cut[id] = mid;
          if (fits()) lo = mid;
          else hi = mid;
        }
        state.cut[id] = lo;
        const part = spec.lay(state.step[id]!, widthOf(geo, id) ?? 0, lo);
        if (!part || part.height <= 0) {
          delete state.cut[id];
          state.dropped.add(id);
        }
      } else state.dropped.add(id);
      if (fits()) break;
    }
  }
  const { laid } = evaluate();
  const leftOff: CardLeftOff[] = [];
  for (const id of ids) {
    // A block with no label (the dark panel standing in for a photo) is decoration: never reported.
    if (state.dropped.has(id)) {
      if (blocks[id]!.label) leftOff.push({ block: blocks[id]!.label, detail: 'left off' });
    }
    else leftOff.push(...(laid.get(id)?.leftOff ?? []));
  }
  return { state, laid, leftOff };
}

function widthOf(geo: Geo, id: BlockId): number | undefined {
  if ('block' in geo) return geo.block === id ? geo.width : undefined;
  for (const g of 'col' in geo ? geo.col : geo.row) {
    const w = widthOf(g, id);
    if (w !== undefined) return w;
  }
  return undefined;
}

const growable = (geo: Geo, blocks: Partial<Record<BlockId, BlockSpec>>): boolean =>
  'block' in geo ? !!blocks[geo.block]?.grow : ('col' in geo ? geo.col : geo.row).some((g) => growable(g, blocks));

/** Where each node goes: a column hands its spare height to its first growable child; a row gives every child its own height. */
export type Placed = { geo: Geo; height: number; children: Placed[] };
export function place(geo: Geo, available: number, fitted: Fitted, blocks: Partial<Record<BlockId, BlockSpec>>): Placed | null {
  if (!present(geo, fitted.laid)) return null;
  if ('block' in geo) return { geo, height: available, children: [] };
  const kids = ('col' in geo ? geo.col : geo.row).filter((g) => present(g, fitted.laid));
  if ('row' in geo) return { geo, height: available, children: kids.map((g) => place(g, available, fitted, blocks)!) };
  const natural = kids.map((g) => heightOf(g, fitted.laid));
  const spare = Math.max(0, available - natural.reduce((a, b) => a + b, 0) - Math.max(0, kids.length - 1) * geo.gap);
  const growIndex = kids.findIndex((g) => growable(g, blocks));
  return { geo, height: available, children: kids.map((g, i) => place(g, natural[i]! + (i === growIndex ? spare : 0), fitted, blocks)!) };
}
