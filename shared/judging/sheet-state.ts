// What the judge's screens need about a sheet, kept free of zod: these screens are in the code every
// visitor downloads first (they must open offline), so they carry no schema library.

/** A phone sends one car's sheet at a time; this is room for a long sheet and a few replays. */
export const SCORE_ITEMS_PER_REQUEST_MAX = 200;

export const SHEET_STATES = ['scored', 'partly', 'not_yet'] as const;
export type SheetState = (typeof SHEET_STATES)[number];
export const SHEET_STATE_LABELS: Record<SheetState, string> = { scored: 'Scored', partly: 'Partly', not_yet: 'Not yet' };

/** A sheet counts once every line has points; anything less is still being filled in. */
export function sheetState(linesScored: number, lines: number): SheetState {
  if (lines > 0 && linesScored >= lines) return 'scored';
  return linesScored > 0 ? 'partly' : 'not_yet';
}
