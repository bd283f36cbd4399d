import { describe, expect, it } from 'vitest';
import { brotliDecompressSync } from 'node:zlib';
import { compressPage, PageCache } from '@server/pages/page-cache';

/** A page like a show's: many similar lines, which brotli's top quality packs much tighter than its quick one. */
const html = Array.from({ length: 700 }, (_, i) => `<li class="entry"><a href="/c/C${(i * 7919) % 100000}">No. ${i + 1} · ${1950 + (i % 40)} coupe, build ${i}</a><span class="muted">Class ${i % 6}</span></li>`).join('');
const pageOf = (tags: string[]) => ({ ...compressPage(html), tags, checkedAt: Date.now() });

describe('a cached page’s brotli copy', () => {
  it('is sent quickly made at first, then made smaller off the event loop once the page stays unchanged', async () => {
    const cache = new PageCache(500, 64 * 2 ** 20, 1000, 60_000, 0);
    const page = pageOf(['event:1']);
    const quick = page.br.length;
    cache.set('e', page);
    const bytesBefore = cache.bytes;
    await expect.poll(() => page.br.length).toBeLessThan(quick);
    expect(brotliDecompressSync(page.br).toString('utf8')).toBe(html);
    expect(cache.bytes).toBe(bytesBefore - (quick - page.br.length)); // the bound counts what is kept
  });

  it('is left as it is for a page dropped before its turn came', async () => {
    const cache = new PageCache(500, 64 * 2 ** 20, 1000, 60_000, 30);
    const dropped = pageOf(['event:1']);
    const kept = pageOf(['event:2']);
    const quick = dropped.br.length;
    cache.set('dropped', dropped);
    cache.set('kept', kept);
    cache.invalidate(['event:1']);
    await expect.poll(() => kept.br.length).toBeLessThan(quick); // the control: a kept page's turn did come
    expect(dropped.br.length).toBe(quick);
  });
});
