// Rough text measures for laying out a card before react-pdf does. The per-character widths are
// the average advance of our two faces (measured on build-sheet text) with a margin of safety;
// every text box also carries maxLines, so an estimate that is off clips a line, never the page.

const DISPLAY_EM = 0.5; // Oswald 600, capitals and figures
const TEXT_EM = 0.47; // Source Sans 3, mixed case

export const displayWidth = (text: string, size: number) => text.length * DISPLAY_EM * size;
export const textWidth = (text: string, size: number) => text.length * TEXT_EM * size;

/** The largest size from max down to min at which the text fits the width in at most `lines` lines. */
export function fitDisplaySize(text: string, width: number, max: number, min: number, lines = 1): number {
  for (let size = max; size > min; size -= Math.max(0.5, size * 0.04)) {
    if (linesNeeded(text, width, size, DISPLAY_EM) <= lines) return size;
  }
  return min;
}

/** A heading's size and line count: one line when it can stay large, else two. */
export function fitHeading(text: string, width: number, max: number, min: number): { size: number; lines: number } {
  const one = fitDisplaySize(text, width, max, min, 1);
  if (one >= max * 0.72) return { size: one, lines: 1 };
  const two = fitDisplaySize(text, width, max, min, 2);
  return { size: two, lines: Math.max(1, Math.min(2, linesNeeded(text, width, two, DISPLAY_EM))) };
}

export function linesNeeded(text: string, width: number, size: number, em = TEXT_EM): number {
  if (!text) return 0;
  // Greedy word wrap on estimated widths: closer to what the renderer does than length / width.
  const charsPerLine = Math.max(1, Math.floor(width / (em * size)));
  let lines = 1;
  let used = 0;
  for (const word of text.split(/\s+/)) {
    const len = word.length;
    if (used === 0) used = Math.min(len, charsPerLine);
    else if (used + 1 + len <= charsPerLine) used += 1 + len;
    else {
      lines += Math.ceil(Math.max(len, 1) / charsPerLine);
      used = len % charsPerLine || charsPerLine;
    }
  }
  return lines;
}

export type FitItem = { text: string; /** lines taken by a label above the text, 0 when inline */ labelLines?: number };

/**
 * A text size for a list of blocks in a box: the largest from max to min at which every block fits
 * whole; at the smallest size each block gets a share of the lines left (maxLines), so the list
 * shrinks first and is cut with an ellipsis only when it cannot shrink further.
 */
export function fitBlocks(items: FitItem[], box: { width: number; height: number }, max: number, min: number, opts: { lineHeight?: number; gap?: number } = {}) {
  const lh = opts.lineHeight ?? 1.25;
  const gapEm = opts.gap ?? 0.5;
  const heightAt = (size: number) => blocksHeight(items, box.width, size, opts);
  let size = max;
  while (size > min && heightAt(size) > box.height) size = Math.max(min, size - Math.max(0.25, size * 0.05));
  const totalLines = Math.max(items.length, Math.floor(box.height / (size * lh)) - items.reduce((s, it) => s + (it.labelLines ?? 0), 0) - Math.ceil((items.length * gapEm) / lh));
  const wants = items.map((it) => Math.max(1, linesNeeded(it.text, box.width, size)));
  const want = wants.reduce((a, b) => a + b, 0);
  const maxLines = want <= totalLines ? wants : shareLines(wants, Math.max(items.length, totalLines));
  return { size, maxLines };
}

/** The height a list of blocks takes at a text size, each block whole. */
export function blocksHeight(items: FitItem[], width: number, size: number, opts: { lineHeight?: number; gap?: number } = {}) {
  const lh = opts.lineHeight ?? 1.25;
  const gapEm = opts.gap ?? 0.5;
  return items.reduce((sum, it) => sum + (linesNeeded(it.text, width, size) + (it.labelLines ?? 0)) * size * lh + gapEm * size, 0);
}

/** Splits `total` lines among blocks that want `wants`, short blocks first so they stay whole. */
function shareLines(wants: number[], total: number): number[] {
  const order = wants.map((w, i) => [w, i] as const).sort((a, b) => a[0] - b[0]);
  const out = new Array<number>(wants.length).fill(1);
  let left = total;
  order.forEach(([w, i], n) => {
    const fair = Math.max(1, Math.floor(left / (order.length - n)));
    out[i] = Math.min(w, fair);
    left -= out[i]!;
  });
  return out;
}

/**
 * Cuts a text at a word so it fits `lines` lines, with an ellipsis. (react-pdf's own textOverflow
 * drops the spaces of the line it cuts, so we cut before it lays out; maxLines stays as the hard stop.)
 */
export function clampText(text: string, width: number, size: number, lines: number, face: 'text' | 'display' = 'text'): string {
  const em = face === 'display' ? DISPLAY_EM : TEXT_EM;
  if (linesNeeded(text, width, size, em) <= lines) return text;
  const words = text.split(/\s+/);
  let lo = 0;
  let hi = words.length;
  while (lo < hi) {
    const mid = Math.ceil((lo + hi) / 2);
    if (linesNeeded(`${words.slice(0, mid).join(' ')}…`, width, size, em) <= lines) lo = mid;
    else hi = mid - 1;
  }
  if (lo === 0) return `${text.slice(0, Math.max(1, Math.floor((width * lines) / (em * size)) - 1))}…`;
  return `${words.slice(0, lo).join(' ').replace(/[,;:·\s]+$/, '')}…`;
}
