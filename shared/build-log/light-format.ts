// The light formatting of log posts and answers: paragraphs (a blank line), line breaks, *emphasis*
// and web addresses. Text is parsed into plain pieces that each screen draws with its own escaping
// (React on the pages and in the editor, XML escaping in the feed); no HTML a person typed is ever sent.

export type InlinePiece = { kind: 'text'; text: string } | { kind: 'em'; text: string } | { kind: 'link'; text: string; href: string };
/** A paragraph is its lines; a line is its pieces. */
export type Paragraph = InlinePiece[][];

// A bare http(s) address up to a space or an angle bracket or quote.
const ADDRESS = /https?:\/\/[^\s<>"']+/gi;
// Punctuation that ends a sentence rather than the address.
const TRAILING = /[.,;:!?)\]]+$/;

/** The address when it is a well-formed http(s) URL with a host, else null (then it stays plain text). */
export function safeLink(candidate: string): string | null {
  // URL is in every runtime we run on (browsers, Node), but shared/ compiles without DOM or Node types.
  const UrlCtor = (globalThis as unknown as { URL: new (s: string) => { protocol: string; hostname: string; href: string } }).URL;
  try {
    const url = new UrlCtor(candidate);
    if ((url.protocol !== 'http:' && url.protocol !== 'https:') || !url.hostname) return null;
    return url.href;
  } catch {
    return null;
  }
}

function emphasis(text: string): InlinePiece[] {
  const pieces: InlinePiece[] = [];
  // *words* with no space just inside the stars; a lone star stays a star.
  const re = /\*(?=\S)([^*\n]*?\S)\*/g;
  let at = 0;
  for (const m of text.matchAll(re)) {
    if (m.index > at) pieces.push({ kind: 'text', text: text.slice(at, m.index) });
    pieces.push({ kind: 'em', text: m[1]! });
    at = m.index + m[0].length;
  }
  if (at < text.length) pieces.push({ kind: 'text', text: text.slice(at) });
  return pieces;
}

export function inlinePieces(line: string): InlinePiece[] {
  const pieces: InlinePiece[] = [];
  let at = 0;
  for (const m of line.matchAll(ADDRESS)) {
    const raw = m[0].replace(TRAILING, '');
    const href = safeLink(raw);
    if (!href) continue;
    if (m.index > at) pieces.push(...emphasis(line.slice(at, m.index)));
    pieces.push({ kind: 'link', text: raw, href });
    at = m.index + raw.length;
  }
  if (at < line.length) pieces.push(...emphasis(line.slice(at)));
  return pieces;
}

/** Paragraphs split at blank lines, each of its lines in pieces. */
export function lightFormat(text: string): Paragraph[] {
  return text
    .replace(/\r\n?/g, '\n')
    .split(/\n[ \t]*\n+/)
    .map((p) => p.trim())
    .filter(Boolean)
    .map((p) => p.split('\n').map((line) => inlinePieces(line.trim())));
}

/** The words alone (a card line, a feed summary): stars dropped, addresses kept as written. */
export function plainWords(text: string): string {
  return lightFormat(text)
    .map((p) => p.map((line) => line.map((piece) => piece.text).join('')).join(' '))
    .join(' ');
}
