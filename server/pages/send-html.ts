import type { Request, Response } from 'express';
import { createHash } from 'node:crypto';
import { brotliCompressSync, constants as zlib, gzipSync } from 'node:zlib';

/**
 * Sends a server-rendered page compressed in the encoding the browser asks for, with a weak ETag so
 * a revisit is a 304 (Express's own negotiation: req.acceptsEncodings and req.fresh).
 */
export function sendHtml(req: Request, res: Response, html: string, cacheControl: string): void {
  const body = Buffer.from(html, 'utf8');
  res.set({ ETag: `W/"${createHash('sha1').update(body).digest('base64url').slice(0, 22)}"`, 'Cache-Control': cacheControl, Vary: 'Accept-Encoding' });
  res.type('html');
  if (req.fresh) return void res.status(304).end();
  const encoding = req.acceptsEncodings('br', 'gzip', 'identity');
  if (encoding === 'br') return void res.set('Content-Encoding', 'br').end(brotliCompressSync(body, { params: { [zlib.BROTLI_PARAM_QUALITY]: 5 } }));
  if (encoding === 'gzip') return void res.set('Content-Encoding', 'gzip').end(gzipSync(body, { level: 6 }));
  res.end(body);
}
