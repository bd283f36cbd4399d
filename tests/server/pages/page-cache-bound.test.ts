import { describe, expect, it } from 'vitest';
import { randomBytes } from 'node:crypto';
import { compressPage, PageCache, publicPageCache } from '@server/pages/page-cache';
import { config } from '@server/config';

/** A page of `kb` KB of text that compresses poorly. */
const pageOf = (kb: number, tags: string[] = []) => ({ ...compressPage(randomBytes(kb * 512).toString('hex')), tags, checkedAt: Date.now() });
const weight = (p: ReturnType<typeof pageOf>) => p.identity.length + p.gzip.length + p.br.length;

describe('the page cache’s memory', () => {
  it('keeps the bytes of its pages under its bound, dropping the least recently used first', () => {
    const pages = ['a', 'b', 'c', 'd'].map((key) => pageOf(4, [`build:${key}`]));
    const bound = 3.5 * weight(pages[0]!);
    const cache = new PageCache(500, bound);
    for (const [i, key] of ['a', 'b', 'c'].entries()) cache.set(key, pages[i]!);
    // Every encoding counts: 4 KB of text and its gzip and brotli copies.
    expect(cache.bytes).toBeGreaterThanOrEqual(3 * weight(pages[0]!) * 0.95);
    cache.get('a'); // read: now the most recently used
    cache.set('d', pages[3]!);
    // Four such pages do not fit: b, the least recently used, went.
    expect(cache.keys()).toEqual(['c', 'a', 'd']);
    expect(cache.bytes).toBeLessThanOrEqual(bound);

    // Dropping by tag and clearing give the bytes back.
    cache.invalidate(['build:a']);
    expect(cache.keys()).toEqual(['c', 'd']);
    const two = cache.bytes;
    cache.set('c', pageOf(1));
    expect(cache.bytes).toBeLessThan(two);
    cache.clear();
    expect(cache.bytes).toBe(0);

    // A page bigger than the whole bound is not kept (it is still sent to whoever asked).
    cache.set('huge', pageOf(16));
    expect(cache.keys()).toEqual([]);
  });

  it('holds the public pages to PAGE_CACHE_MAX_MB', () => {
    expect(publicPageCache.maxBytes).toBe(config.pageCacheMaxBytes);
    expect(config.pageCacheMaxBytes).toBe(64 * 1024 * 1024);
  });
});
