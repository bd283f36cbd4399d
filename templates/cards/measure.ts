import * as fontkit from 'fontkit';
import { FACES, type Face } from './fonts';

// Text measured with the real metrics of the shipped .woff files, through fontkit: the same font
// engine and files react-pdf draws with, so a line measured here is the line printed.

const fonts = new Map<Face, fontkit.Font>();
export function fontOf(face: Face): fontkit.Font {
  let font = fonts.get(face);
  if (!font) {
    font = fontkit.openSync(FACES[face].src);
    fonts.set(face, font);
  }
  return font;
}

const advances = new Map<string, number>();
/** Advance width of `text` in em (kerning included, as react-pdf lays it out). */
export function advanceEm(text: string, face: Face): number {
  const key = `${face}\u0000${text}`;
  let em = advances.get(key);
  if (em === undefined) {
    const font = fontOf(face);
    em = font.layout(text).advanceWidth / font.unitsPerEm;
    if (advances.size > 50_000) advances.clear();
    advances.set(key, em);
  }
  return em;
}

export const textWidth = (text: string, face: Face, size: number, letterSpacing = 0) => advanceEm(text, face) * size + letterSpacing * [...text].length;
/** Capital height as a share of the font size. */
export const capShare = (face: Face) => fontOf(face).capHeight / fontOf(face).unitsPerEm;
/** The font size whose capitals (and figures) stand `capPt` points tall. */
export const sizeForCap = (capPt: number, face: Face) => capPt / capShare(face);

/** A styled piece of text in a line. `scale` sizes it against the line's size (a unit beside a big figure). */
export type Span = { text: string; face: Face; color?: string; letterSpacing?: number; scale?: number };
/** One printed line: its spans, the size they are set at and the height the line takes. */
export type Line = { spans: Span[]; size: number; height: number };

// Lines are filled to a little under their box, so kerning across spans never pushes a word onto a line that does not exist.
const SLACK = 0.985;
const spanWidth = (s: Span, size: number) => textWidth(s.text, s.face, size * (s.scale ?? 1), s.letterSpacing ?? 0);
export const lineWidth = (spans: Span[], size: number) => spans.reduce((w, s) => w + spanWidth(s, size), 0);

/** Splits spans into words that keep their style; a word knows whether a space came before it. */
function words(spans: Span[]): Array<{ span: Span; spaced: boolean }> {
  const out: Array<{ span: Span; spaced: boolean }> = [];
  let pendingSpace = false;
  for (const s of spans) {
    for (const [i, part] of s.text.split(/(\s+)/).entries()) {
      if (i % 2 === 1) pendingSpace = true;
      else if (part) {
        out.push({ span: { ...s, text: part }, spaced: pendingSpace && out.length > 0 });
        pendingSpace = false;
      }
    }
  }
  return out;
}

/** Joins words into spans, merging neighbours of the same style. */
function join(ws: Array<{ span: Span; spaced: boolean }>): Span[] {
  const out: Span[] = [];
  for (const [i, w] of ws.entries()) {
    const text = (i > 0 && w.spaced ? ' ' : '') + w.span.text;
    const last = out[out.length - 1];
    if (last && last.face === w.span.face && last.color === w.span.color && last.letterSpacing === w.span.letterSpacing && last.scale === w.span.scale) last.text += text;
    else out.push({ ...w.span, text });
  }
  return out;
}

/** Breaks one over-long word into pieces that each fit the width. */
function breakWord(span: Span, size: number, width: number): Span[] {
  const pieces: Span[] = [];
  let rest = [...span.text];
  while (rest.length) {
    let n = rest.length;
    while (n > 1 && spanWidth({ ...span, text: rest.slice(0, n).join('') }, size) > width) n--;
    pieces.push({ ...span, text: rest.slice(0, n).join('') });
    rest = rest.slice(n);
  }
  return pieces;
}

const wraps = new Map<string, Span[][]>();
/** Greedy word wrap of styled spans into lines no wider than `width` at `size`. */
export function wrap(spans: Span[], size: number, width: number): Span[][] {
  const key = JSON.stringify([spans, size, width]);
  const hit = wraps.get(key);
  if (hit) return hit;
  const limit = width * SLACK;
  const lines: Span[][] = [];
  let current: Array<{ span: Span; spaced: boolean }> = [];
  let used = 0;
  for (const w of words(spans)) {
    // Word by word, each measured in its own face; a space is measured in the face of the word it precedes.
    const wordW = spanWidth(w.span, size);
    const spaceW = current.length && w.spaced ? spanWidth({ ...w.span, text: ' ' }, size) : 0;
    if (used + spaceW + wordW <= limit) {
      current.push(w);
      used += spaceW + wordW;
      continue;
    }
    if (current.length) lines.push(join(current));
    if (wordW <= limit) {
      current = [{ ...w, spaced: false }];
      used = wordW;
    } else {
      const pieces = breakWord(w.span, size, limit);
      for (const p of pieces.slice(0, -1)) lines.push([p]);
      current = [{ span: pieces[pieces.length - 1]!, spaced: false }];
      used = spanWidth(current[0]!.span, size);
    }
  }
  if (current.length) lines.push(join(current));
  if (wraps.size > 20_000) wraps.clear();
  wraps.set(key, lines);
  return lines;
}

/** The lines a paragraph takes, each `lineHeight` × size tall. */
export function setLines(spans: Span[], size: number, width: number, lineHeight: number): Line[] {
  return wrap(spans, size, width).map((s) => ({ spans: s, size, height: size * lineHeight }));
}

/** Ends a cut line with an ellipsis, dropping words until it fits. */
export function withEllipsis(line: Line, width: number): Line {
  const ws = words(line.spans);
  while (ws.length) {
    const spans = join(ws);
    const last = spans[spans.length - 1]!;
    last.text = `${last.text.replace(/[\s,;:·–-]+$/, '')}…`;
    if (lineWidth(spans, line.size) <= width * SLACK || ws.length === 1) return { ...line, spans };
    ws.pop();
  }
  return line;
}

export const linesHeight = (lines: Line[]) => lines.reduce((h, l) => h + l.height, 0);

/**
 * react-pdf puts a line's baseline one font ascent below the top of its box, which for Oswald
 * (ascent 1.19 em) sits the capitals low in a tight line. This is how far to lift a line so its ink
 * (capitals and figures, or ascenders and descenders for the text face) sits centred in its height.
 */
export function baselineShift(line: Line): number {
  const main = line.spans.reduce((a, s) => ((s.scale ?? 1) > (a.scale ?? 1) ? s : a), line.spans[0]!);
  const font = fontOf(main.face);
  const display = main.face.startsWith('display');
  const up = display ? font.capHeight / font.unitsPerEm : 0.72;
  const down = display ? 0.2 : 0.24;
  const ascent = Math.max(...line.spans.map((s) => (fontOf(s.face).ascent / fontOf(s.face).unitsPerEm) * line.size * (s.scale ?? 1)));
  const baseline = (line.height + (up - down) * line.size) / 2;
  return ascent - baseline;
}
