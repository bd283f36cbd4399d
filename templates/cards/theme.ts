import { CARD_MIN_MARGIN_PT, CARD_MIN_QR_PT, PAPER_SIZES_PT, type Orientation, type Paper } from '@shared/schemas/card';

/** Placard's print palette: paper, ink, graphite, rule and one signal accent. */
export const INK = '#1C1B19';
export const PAPER = '#F5F0E6';
export const GRAPHITE = '#55524C';
export const RULE = '#D8D0C0';
export const SIGNAL = '#D9481C';
export const WHITE = '#FFFFFF';

export type PageBox = {
  width: number;
  height: number;
  landscape: boolean;
  /** Type and spacing scale: 1 on US Letter, about 1.3 on Tabloid and A3. */
  k: number;
  /** Safe margin for home printers, never under 0.25 in (18 pt). */
  margin: number;
};

export function pageBox(paper: Paper, orientation: Orientation): PageBox {
  const { width, height } = PAPER_SIZES_PT[paper];
  const landscape = orientation === 'landscape';
  const k = Math.min(width, height) / 612;
  return { width: landscape ? height : width, height: landscape ? width : height, landscape, k, margin: Math.max(CARD_MIN_MARGIN_PT, Math.round(30 * k)) };
}

/**
 * The printed size of the QR block in each design, in points, quiet zone included. The code itself
 * (version 4 at most: 33 modules inside 41 with the quiet zone) is never under 1.5 in.
 */
export const QR_BLOCK_MIN_PT = Math.ceil((CARD_MIN_QR_PT * 41) / 33);
export function qrSize(design: 'poster' | 'data-sheet' | 'compact', box: PageBox): number {
  const base = design === 'poster' ? 150 : design === 'data-sheet' ? 140 : box.landscape ? 230 : 200;
  return Math.max(QR_BLOCK_MIN_PT, Math.round(base * box.k));
}
