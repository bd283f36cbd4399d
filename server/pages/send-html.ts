import type { Request, Response } from 'express';
import { createHash } from 'node:crypto';
import { brotliCompressSync, constants as zlib, gzipSync } from 'node:zlib';

/**
 * Sends a server-rendered page compressed in the encoding the browser asks for, with a weak ETag so
 * a revisit is a 304 (Express's own negotiation: req.acceptsEncodings and req.fresh).
 */
/**
 * The encoding to send, asked of Express's own negotiation (req.acceptsEncodings: q=0 refusals, "*"):
 * brotli when accepted, else gzip, else none. Our order decides rather than the header's, because
 * browsers list "gzip, deflate, br" with equal weight and brotli is the smaller. A request naming no
 * encoding at all gets the plain bytes: a bare client (curl, a script) may not decompress.
 */
/** What an Accept-Encoding header takes, by header: browsers send a handful of different ones, so each is negotiated once. */
const accepted = new Map<string, { br: boolean; gzip: boolean }>();

/** Whether the request takes brotli and gzip (Express's negotiation: q-values, `*` and `identity;q=0` included). */
export function encodingsAccepted(req: Request): { br: boolean; gzip: boolean } {
  const header = req.get('accept-encoding');
  if (!header) return { br: false, gzip: false };
  let known = accepted.get(header);
  if (!known) {
    if (accepted.size >= 256) accepted.clear(); // odd headers by the thousand cannot grow it
    accepted.set(header, (known = { br: Boolean(req.acceptsEncodings('br')), gzip: Boolean(req.acceptsEncodings('gzip')) }));
  }
  return known;
}

export function encodingFor(req: Request): 'br' | 'gzip' | 'identity' {
  const { br, gzip } = encodingsAccepted(req);
  return br ? 'br' : gzip ? 'gzip' : 'identity';
}

export function sendHtml(req: Request, res: Response, html: string, cacheControl: string): void {
  const body = Buffer.from(html, 'utf8');
  res.set({ ETag: `W/"${createHash('sha1').update(body).digest('base64url').slice(0, 22)}"`, 'Cache-Control': cacheControl, Vary: 'Accept-Encoding' });
  res.type('html');
  if (req.fresh) return void res.status(304).end();
  const encoding = encodingFor(req);
  if (encoding === 'br') return void res.set('Content-Encoding', 'br').end(brotliCompressSync(body, { params: { [zlib.BROTLI_PARAM_QUALITY]: 5 } }));
  if (encoding === 'gzip') return void res.set('Content-Encoding', 'gzip').end(gzipSync(body, { level: 6 }));
  res.end(body);
}
