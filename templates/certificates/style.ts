import { StyleSheet } from '@react-pdf/renderer';
import { PAPER_SIZES_PT } from '@shared/schemas/card';
import type { PrintPaper } from '@shared/schemas/results';
import { DISPLAY, TEXT } from '../cards/fonts';
import { GRAPHITE, INK, RULE, SIGNAL } from '../cards/theme';

/** Print-true page sizes in points, portrait: Letter 612 × 792, A4 595.28 × 841.89. */
export const pageSize = (paper: PrintPaper): [number, number] => [PAPER_SIZES_PT[paper].width, PAPER_SIZES_PT[paper].height];

/**
 * Capitals are set in the string, not by a style: react-pdf breaks lines on the text as written, so a
 * transformed line can run past its box.
 */
export const caps = (text: string) => text.toLocaleUpperCase('en');

/** Half an inch: inside what home printers reach on every side. */
export const MARGIN = 36;
/**
 * Text is set this far inside the margin: react-pdf's line breaking lets a wrapped line of large
 * type run a couple of points past its box (measured: 2.2 pt on a 24 pt heading), so the inset
 * keeps every glyph inside the half inch. The layout test reads the boxes back.
 */
export const TEXT_INSET = 6;

export const s = StyleSheet.create({
  page: { paddingVertical: MARGIN, paddingHorizontal: MARGIN + TEXT_INSET, fontFamily: TEXT, fontSize: 10, color: INK, backgroundColor: '#FFFFFF' },
  brand: { fontFamily: DISPLAY, fontWeight: 600, fontSize: 9, letterSpacing: 2, color: SIGNAL },
  showName: { fontFamily: DISPLAY, fontWeight: 600, fontSize: 24, lineHeight: 1.15 },
  meta: { fontSize: 10, color: GRAPHITE, marginTop: 2 },
  rule: { borderBottomWidth: 2, borderBottomColor: INK, marginTop: 8, marginBottom: 10 },
  h2: { fontFamily: DISPLAY, fontWeight: 600, fontSize: 14, marginTop: 12, marginBottom: 4 },
  row: { flexDirection: 'row', borderBottomWidth: 0.75, borderBottomColor: RULE, paddingVertical: 4, alignItems: 'flex-start' },
  head: { flexDirection: 'row', borderBottomWidth: 1, borderBottomColor: INK, paddingBottom: 2 },
  headText: { fontSize: 8, letterSpacing: 1, color: GRAPHITE },
  cPlace: { width: 72 },
  cNumber: { width: 40, textAlign: 'right', paddingRight: 10 },
  cTitle: { flex: 1, paddingRight: 8 },
  cTotal: { width: 56, textAlign: 'right', paddingRight: 10 },
  cNote: { width: 150, fontSize: 8.5, color: GRAPHITE },
  owner: { fontSize: 8.5, color: GRAPHITE, marginTop: 1 },
  figure: { fontFamily: DISPLAY, fontWeight: 500, fontSize: 11 },
  muted: { color: GRAPHITE },
  footer: { position: 'absolute', left: MARGIN, right: MARGIN, bottom: 18, fontSize: 8, color: GRAPHITE, flexDirection: 'row', justifyContent: 'space-between' },
});
