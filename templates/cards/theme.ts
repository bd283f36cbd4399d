import { CARD_LEGIBILITY, CARD_MIN_MARGIN_PT, PAPER_SIZES_PT, paperClass, type Legibility, type Orientation, type Paper } from '@shared/schemas/card';

/** Placard's print palette: paper, ink, graphite, rule and one signal accent. */
export const INK = '#1C1B19';
export const PAPER = '#F5F0E6';
export const GRAPHITE = '#55524C';
export const RULE = '#D8D0C0';
export const SIGNAL = '#D9481C';
export const WHITE = '#FFFFFF';
/** The year on the dark panel that stands in for a missing photo: muted, yet 4.6:1 against INK (WCAG 2.1 contrast ratio), so it reads through glass. */
export const PANEL_YEAR = '#8A857C';

export type PageBox = {
  width: number;
  height: number;
  landscape: boolean;
  /** Type and spacing scale: 1 on US Letter, about 1.3 on Tabloid and A3. */
  k: number;
  /** Safe margin for home printers, never under 0.25 in (18 pt). */
  margin: number;
  leg: Legibility;
};

export function pageBox(paper: Paper, orientation: Orientation): PageBox {
  const { width, height } = PAPER_SIZES_PT[paper];
  const landscape = orientation === 'landscape';
  const k = Math.min(width, height) / 612;
  return {
    width: landscape ? height : width,
    height: landscape ? width : height,
    landscape,
    k,
    margin: Math.max(CARD_MIN_MARGIN_PT, Math.round(27 * k)),
    leg: CARD_LEGIBILITY[paperClass(paper)],
  };
}
