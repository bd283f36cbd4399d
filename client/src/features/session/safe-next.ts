// Characters a browser ignores or reads as "/" inside a URL, which can turn "/…" into another origin.
const unsafeChar = (c: string) => c === '\\' || c.charCodeAt(0) < 0x20 || c.charCodeAt(0) === 0x7f;
const BASE = 'https://placard.invalid';

/**
 * Only same-site paths are followed after sign-in, never another origin. "/\elsewhere.example"
 * is "//elsewhere.example" to a browser, so such paths are refused, and what is left is resolved
 * as a browser would and kept only when it stays on our origin.
 */
export function safeNext(next: string | null): string {
  const fallback = '/builds';
  if (!next || !next.startsWith('/') || [...next].some(unsafeChar)) return fallback;
  let url: URL;
  try {
    url = new URL(next, BASE);
  } catch {
    return fallback;
  }
  if (url.origin !== BASE) return fallback;
  // "/.//host", "/..//host" and "/%2e//host" resolve to the path "//host", which a router or a
  // browser then reads as another origin: a path we follow starts with exactly one slash.
  if (url.pathname.startsWith('//')) return fallback;
  return `${url.pathname}${url.search}${url.hash}`;
}
