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
export function encodingFor(req: Request): 'br' | 'gzip' | 'identity' {
  if (!req.get('accept-encoding')) return 'identity';
  if (req.acceptsEncodings('br')) return 'br';
  if (req.acceptsEncodings('gzip')) return 'gzip';
  return 'identity';
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
