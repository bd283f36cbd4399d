import { createHash } from 'node:crypto';
import { brotliCompressSync, constants as zlib, gzipSync } from 'node:zlib';

/**
 * A rendered page in the three encodings we send, with the version of the build it shows. `votes` lists
 * the car's shows that take people's choice votes now: each response then adds the visitor's own box to each.
 * `mustRevalidate` marks a car on a show whose voting could open or close at any moment.
 */
export type CachedPage = {
  version: string;
  etag: string;
  identity: Buffer;
  gzip: Buffer;
  br: Buffer;
  checkedAt: number;
  votes?: VoteSlot[];
  mustRevalidate?: boolean;
};

/** A show on the page that takes votes now: where its box goes, where its form posts, and the car's number there. */
export type VoteSlot = { eventId: number; url: string; anchor: string; entryNumber: number };

export function compressPage(html: string, version: string): Omit<CachedPage, 'checkedAt'> {
  const identity = Buffer.from(html, 'utf8');
  return {
    version,
    // Weak: the same page is sent in three encodings under one validator.
    etag: `W/"${createHash('sha1').update(identity).digest('base64url').slice(0, 22)}"`,
    identity,
    gzip: gzipSync(identity, { level: 9 }),
    br: brotliCompressSync(identity, { params: { [zlib.BROTLI_PARAM_QUALITY]: 11, [zlib.BROTLI_PARAM_SIZE_HINT]: identity.length } }),
  };
}

/**
 * In-process LRU of rendered public pages, keyed by code and unit system. Each entry carries the
 * build's version (see publicVersion), so any server process can check it is current with one
 * cheap query; under a crowd an entry checked in the last `revalidateAfterMs` is served as is.
 */
export class PageCache {
  private entries = new Map<string, CachedPage>();
  private pending = new Map<string, Promise<CachedPage | null>>();

  constructor(
    public maxEntries = 500,
    /** How long a checked entry is trusted without asking the database again. */
    public revalidateAfterMs = 1000,
  ) {}

  get(key: string): CachedPage | undefined {
    const hit = this.entries.get(key);
    if (hit) {
      this.entries.delete(key); // re-insert: Map order is our recency order
      this.entries.set(key, hit);
    }
    return hit;
  }

  set(key: string, page: CachedPage): void {
    this.entries.delete(key);
    this.entries.set(key, page);
    while (this.entries.size > this.maxEntries) this.entries.delete(this.entries.keys().next().value!);
  }

  delete(key: string): void {
    this.entries.delete(key);
  }

  clear(): void {
    this.entries.clear();
  }

  get size() {
    return this.entries.size;
  }

  /** Renders once when many visitors ask for the same cold page at the same moment. */
  once(key: string, render: () => Promise<CachedPage | null>): Promise<CachedPage | null> {
    const running = this.pending.get(key);
    if (running) return running;
    const p = render().finally(() => this.pending.delete(key));
    this.pending.set(key, p);
    return p;
  }
}

export const publicPageCache = new PageCache();
