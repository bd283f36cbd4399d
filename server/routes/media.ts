import { Router } from 'express';
import { pipeline } from 'node:stream/promises';
import { openMediaFile } from '../services/media/media';
import { NotFoundError } from '../errors';

export const mediaRouter = Router();

/**
 * Stored files, public and without a session. A key is unique and never reused, so a file can be
 * cached for a year. Only keys of the exact stored shape are looked up, so no path can climb out.
 */
mediaRouter.get('/media/{*key}', async (req, res) => {
  const key = ([] as string[]).concat((req.params as { key?: string | string[] }).key ?? []).join('/');
  const object = await openMediaFile(key);
  if (!object) throw new NotFoundError('No such file.');
  res.set({
    'Content-Type': object.contentType,
    'Content-Length': String(object.size),
    'Cache-Control': 'public, max-age=31536000, immutable',
    ETag: `"${key.replace(/[^a-z0-9]/g, '')}"`,
  });
  if (req.fresh) {
    object.body.destroy();
    res.status(304).end();
    return;
  }
  if (req.method === 'HEAD') {
    object.body.destroy();
    res.end();
    return;
  }
  await pipeline(object.body, res).catch((err: unknown) => {
    if (!res.headersSent) throw err;
    req.log?.debug({ err, key }, 'media transfer cut short'); // the reader went away mid-file
  });
});
