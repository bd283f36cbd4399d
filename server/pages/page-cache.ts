import { createHash } from 'node:crypto';
import { brotliCompress, brotliCompressSync, constants as zlib, gzipSync } from 'node:zlib';
import { EVERY_PAGE } from './page-dependencies';
import { config } from '../config';
import type { PagePieces } from './page-pieces';

/**
 * A rendered public page in the three encodings we send. `tags` say what it shows (page-dependencies.ts):
 * a change to any of them drops it. `version` (car pages) is the fallback check against the database;
 * `expiresAt` is a moment the page changes by the clock alone (entries open). `votes` lists the car's
 * shows that take people's choice votes now: each response then fills the visitor's own box into `pieces`.
 */
export type CachedPage = {
  etag: string;
  identity: Buffer;
  gzip: Buffer;
  br: Buffer;
  tags: readonly string[];
  checkedAt: number;
  version?: string;
  expiresAt?: number;
  votes?: VoteSlot[];
  pieces?: PagePieces;
  mustRevalidate?: boolean;
};

/** A show on the page that takes votes now: where its box goes, where its form posts, and the car's number there. */
export type VoteSlot = { eventId: number; url: string; anchor: string; entryNumber: number };

export function compressPage(html: string): Pick<CachedPage, 'etag' | 'identity' | 'gzip' | 'br'> {
  const identity = Buffer.from(html, 'utf8');
  return {
    // Weak: the same page is sent in three encodings under one validator.
    etag: `W/"${createHash('sha1').update(identity).digest('base64url').slice(0, 22)}"`,
    identity,
    gzip: gzipSync(identity, { level: 9 }),
    // Quick brotli first (about 1 ms for an 80 KB page, where quality 11 takes over 100 ms of the event loop):
    // on show day a page changes with every check-in. A page left unchanged is made smaller later (refineBrotli).
    br: brotliCompressSync(identity, { params: { [zlib.BROTLI_PARAM_QUALITY]: QUICK_BROTLI, [zlib.BROTLI_PARAM_SIZE_HINT]: identity.length } }),
  };
}

const QUICK_BROTLI = 5;
const SMALLEST_BROTLI = zlib.BROTLI_MAX_QUALITY;

/** The memory a page holds: its three encodings and, for a voting car's page, its compressed pieces. */
function bytesOf(page: CachedPage): number {
  const sum = (bufs: Buffer[]) => bufs.reduce((n, b) => n + b.length, 0);
  const pieces = page.pieces ? sum(page.pieces.parts) + sum(page.pieces.deflated) : 0;
  return page.identity.length + page.gzip.length + page.br.length + pieces + 256;
}

/**
 * In-process LRU of rendered public pages, bounded in count and in bytes. While this process hears the database's page-change
 * notifications (page-listener.ts) an entry is trusted for `trustWhileListeningMs` and dropped at once
 * when a change names one of its tags; without them (not started, or reconnecting) it is trusted for
 * `revalidateAfterMs` only. Either way a page past its trust is checked again (car pages: one cheap
 * version query) or re-rendered, so a lost notification cannot leave a page stale for long.
 */
export class PageCache {
  private entries = new Map<string, CachedPage>();
  private keysByTag = new Map<string, Set<string>>();
  private pending = new Map<string, Promise<CachedPage | null>>();
  /** Counts invalidations; with the count at each tag's last one, a render that raced a change to what it shows is not trusted. */
  private changes = 0;
  private tagChangedAt = new Map<string, number>();
  private forgottenBefore = 0;
  private storedBytes = 0;
  /** Set by the page listener while its LISTEN connection is up. */
  listening = false;

  constructor(
    public maxEntries = 500,
    /** The bytes the pages may hold together (every encoding and piece); the least recently used go first past it. */
    public maxBytes = 64 * 1024 * 1024,
    /** How long a checked entry is trusted with no notifications to tell of a change. */
    public revalidateAfterMs = 1000,
    /** How long a checked entry is trusted while notifications arrive: the fallback for a lost one. */
    public trustWhileListeningMs = 60_000,
    /** How long a page must stay unchanged before its brotli copy is remade at the smallest size, off the event loop. */
    public refineAfterMs = 2000,
  ) {}

  /**
   * Remakes a kept page's brotli copy at quality 11 on libuv's thread pool once it has stayed unchanged for
   * `refineAfterMs`, and swaps it in if the page is still the one kept: pages that change by the second are
   * never worth it, and the ones visitors keep reading get the smallest bytes without the event loop waiting.
   */
  private refineBrotli(key: string, page: CachedPage): void {
    const kept = () => this.entries.get(key) === page;
    setTimeout(() => {
      if (!kept()) return;
      brotliCompress(page.identity, { params: { [zlib.BROTLI_PARAM_QUALITY]: SMALLEST_BROTLI, [zlib.BROTLI_PARAM_SIZE_HINT]: page.identity.length } }, (err, smaller) => {
        if (err || !kept() || smaller.length >= page.br.length) return;
        this.storedBytes += smaller.length - page.br.length;
        page.br = smaller;
      });
    }, this.refineAfterMs).unref();
  }

  /** Whether a page may be sent without asking the database anything. */
  isFresh(page: CachedPage, now = Date.now()): boolean {
    const trust = this.listening ? this.trustWhileListeningMs : this.revalidateAfterMs;
    return now - page.checkedAt < trust && (page.expiresAt === undefined || now < page.expiresAt);
  }

  get(key: string): CachedPage | undefined {
    const hit = this.entries.get(key);
    if (hit) {
      this.entries.delete(key); // re-insert: Map order is our recency order
      this.entries.set(key, hit);
    }
    return hit;
  }

  /** The number of invalidations so far: take it before loading what a page shows, hand it to set(). */
  get changeCount(): number {
    return this.changes;
  }

  /** Stores a page rendered from data read after `changeCountBefore`; one that raced a change is kept but checked on its next request. */
  set(key: string, page: CachedPage, changeCountBefore = this.changes): void {
    if (this.changedSince(page.tags, changeCountBefore)) page.checkedAt = 0;
    this.delete(key);
    // A page bigger than the whole bound is sent but not kept.
    if (bytesOf(page) > this.maxBytes) return;
    this.entries.set(key, page);
    this.storedBytes += bytesOf(page);
    for (const tag of page.tags) {
      let keys = this.keysByTag.get(tag);
      if (!keys) this.keysByTag.set(tag, (keys = new Set()));
      keys.add(key);
    }
    while (this.entries.size > this.maxEntries || this.storedBytes > this.maxBytes) this.delete(this.entries.keys().next().value!);
    if (this.entries.get(key) === page) this.refineBrotli(key, page);
  }

  /** What the stored pages hold, in bytes. */
  get bytes(): number {
    return this.storedBytes;
  }

  /** The keys stored, least recently used first. */
  keys(): string[] {
    return [...this.entries.keys()];
  }

  private changedSince(tags: readonly string[], count: number): boolean {
    if (count === this.changes) return false;
    if (count < this.forgottenBefore) return true;
    return tags.some((tag) => (this.tagChangedAt.get(tag) ?? -1) >= count);
  }

  delete(key: string): void {
    const page = this.entries.get(key);
    if (!page) return;
    this.entries.delete(key);
    this.storedBytes -= bytesOf(page);
    for (const tag of page.tags) {
      const keys = this.keysByTag.get(tag);
      keys?.delete(key);
      if (keys?.size === 0) this.keysByTag.delete(tag);
    }
  }

  /** Drops every page holding any of these tags (EVERY_PAGE: all of them). */
  invalidate(tags: Iterable<string>): void {
    if (this.tagChangedAt.size > 50_000) {
      this.tagChangedAt.clear();
      this.forgottenBefore = this.changes;
    }
    const at = this.changes++;
    for (const tag of tags) {
      if (tag === EVERY_PAGE) return this.clear();
      this.tagChangedAt.set(tag, at);
      for (const key of [...(this.keysByTag.get(tag) ?? [])]) this.delete(key);
    }
  }

  /**
   * Every page may be out of date (changes were made while notifications were not heard): each is
   * checked or rendered again on its next request, but kept meanwhile, so a database that goes away
   * again still leaves visitors the page as last published.
   */
  suspectAll(): void {
    this.forgottenBefore = ++this.changes;
    this.tagChangedAt.clear();
    for (const page of this.entries.values()) page.checkedAt = 0;
  }

  clear(): void {
    this.forgottenBefore = ++this.changes;
    this.tagChangedAt.clear();
    this.entries.clear();
    this.keysByTag.clear();
    this.storedBytes = 0;
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

export const publicPageCache = new PageCache(500, config.pageCacheMaxBytes);
