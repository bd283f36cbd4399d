import type { Request, RequestHandler } from 'express';
import { AppError } from '../errors';

const READS = new Set(['GET', 'HEAD', 'OPTIONS']);

/** A body is on its way: chunked, or a length above zero (browsers send `Content-Length: 0` on a bodyless POST). */
const carriesBody = (req: Request) => req.headers['transfer-encoding'] !== undefined || Number(req.headers['content-length'] ?? 0) > 0;

/**
 * State-changing API requests send JSON. Any other body (text/plain, form data, XML, or none named)
 * is a 415 before anything reads it, so it can never be taken for an empty object and replace
 * saved data with nothing. Multipart is let through only to the upload routes named here.
 */
export function jsonBodiesOnly(uploadPaths: readonly RegExp[]): RequestHandler {
  return (req, _res, next) => {
    if (READS.has(req.method) || !carriesBody(req) || req.is('application/json')) return next();
    if (req.method === 'POST' && req.is('multipart/form-data') && uploadPaths.some((p) => p.test(req.path))) return next();
    throw new AppError(415, 'UNSUPPORTED_MEDIA_TYPE', 'Send the request body as JSON (Content-Type: application/json).');
  };
}

const emptyBodies = new WeakSet<object>();

/** For express.json's `verify`: remembers a request whose JSON body was zero bytes (the parser would make it `{}`). */
export const noteEmptyBody = (req: object, _res: unknown, buf: Buffer) => {
  if (buf.length === 0) emptyBodies.add(req);
};

/** After express.json: a zero-byte body is no body (`req.body` stays undefined), not an empty object. */
export const emptyBodyIsNoBody: RequestHandler = (req, _res, next) => {
  if (emptyBodies.has(req)) req.body = undefined;
  next();
};
