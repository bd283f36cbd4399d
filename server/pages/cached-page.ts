import type { Request, Response } from 'express';
import { isDatabaseUnavailable } from '../services/platform/database-unavailable';
import { compressPage, publicPageCache, type CachedPage, type VoteSlot } from './page-cache';
import { piecesOf } from './page-pieces';
import { voteBoxMark } from './vote-box';
import { encodingFor } from './send-html';
import { PublicPagesBusyError, publicDbWork } from '../services/platform/public-db-budget';

/** What a render hands the cache: the page, the tags of what it shows, and when it must be looked at again. */
export type PageSource = { html: string; tags: string[]; version?: string; expiresAt?: number; votes?: VoteSlot[]; mustRevalidate?: boolean; /** False: sent but not kept (a page past the last, that anyone could ask for by the thousand). */ keep?: boolean };

export type PageLoader = {
  /** A cheap fingerprint of what the page shows (null: no such page), asked when the cache's trust has run out. */
  version?: () => Promise<string | null>;
  /** Loads and renders the page; null when there is no such page. */
  render: () => Promise<PageSource | null>;
};

function toCached(source: PageSource): CachedPage {
  const { html, tags, version, expiresAt, votes, mustRevalidate } = source;
  return {
    ...compressPage(html),
    tags,
    checkedAt: Date.now(),
    ...(version !== undefined ? { version } : {}),
    ...(expiresAt !== undefined ? { expiresAt } : {}),
    ...(votes?.length ? { votes, pieces: piecesOf(html, votes.map((v) => voteBoxMark(v.eventId))) } : {}),
    ...(mustRevalidate ? { mustRevalidate } : {}),
  };
}

/**
 * The page under `key` from the cache: sent as is while fresh, else checked by its version or
 * rendered once for everyone asking. While the database is away, a page already rendered is served.
 */
export async function cachedPage(req: Request, key: string, load: PageLoader): Promise<CachedPage | null> {
  const cache = publicPageCache;
  const hit = cache.get(key);
  const now = Date.now();
  if (hit && cache.isFresh(hit, now)) return hit;
  const before = cache.changeCount;
  try {
    if (hit?.version !== undefined && load.version) {
      const version = await publicDbWork(() => load.version!());
      if (!version) {
        cache.delete(key);
        return null;
      }
      if (version === hit.version) {
        hit.checkedAt = now;
        return hit;
      }
    }
    return await cache.once(`${key}|${before}`, async () => {
      const source = await publicDbWork(() => load.render());
      if (!source) {
        cache.delete(key);
        return null;
      }
      const page = toCached(source);
      if (source.keep === false) cache.delete(key);
      else cache.set(key, page, before);
      return page;
    });
  } catch (err) {
    // The database is away: a page we already rendered is still the show or build as last published.
    // So is a page whose re-render found the public share of the pool full: the crowd gets what it had.
    if (!hit || !(isDatabaseUnavailable(err) || err instanceof PublicPagesBusyError)) throw err;
    req.log.warn({ err }, 'database unavailable: public page served from the cache');
    return hit;
  }
}

/** Sends a cached page without visitor pieces: a 304 for a browser holding it, else the stored bytes in its encoding. */
export function sendCached(req: Request, res: Response, page: CachedPage, headers: { cacheControl: string; vary: string; type?: string }): void {
  res.set({ ETag: page.etag, 'Cache-Control': headers.cacheControl, Vary: headers.vary });
  // req.fresh compares If-None-Match with the ETag just set (weakly, as RFC 9110 asks for GET).
  if (req.fresh) return void res.status(304).end();
  const encoding = encodingFor(req);
  if (encoding !== 'identity') res.set('Content-Encoding', encoding);
  res.type(headers.type ?? 'html').end(encoding === 'br' ? page.br : encoding === 'gzip' ? page.gzip : page.identity);
}
