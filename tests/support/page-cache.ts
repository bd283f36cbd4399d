import { afterAll, beforeAll } from 'vitest';
import { publicPageCache } from '@server/pages/page-cache';
import { pageChangeHandlers } from '@server/pages/page-listener';
import { ChannelListener } from '@server/db/channel-listener';
import { config } from '@server/config';
import { randomUUID } from 'node:crypto';
import { sequelize } from '@server/db/sequelize';
import { PAGE_CHANGE_CHANNEL } from '@server/pages/page-dependencies';

/**
 * For a test file that must see a change on the next public page: every request checks the page's
 * version instead of trusting the cache for its usual second. Restored after the file, since the
 * files of one worker share the server's modules.
 */
export function checkPageVersionOnEveryRequest(): void {
  let trust = { revalidateAfterMs: 0, trustWhileListeningMs: 0 };
  beforeAll(() => {
    trust = { revalidateAfterMs: publicPageCache.revalidateAfterMs, trustWhileListeningMs: publicPageCache.trustWhileListeningMs };
    Object.assign(publicPageCache, { revalidateAfterMs: 0, trustWhileListeningMs: 0 });
  });
  afterAll(() => {
    Object.assign(publicPageCache, trust);
  });
}

/**
 * For a test file that proves changes reach cached pages through the database's notifications: this
 * process listens as a server does, and trusts a page for a minute, so only a notification refreshes it.
 */
export function listenForPageChanges(): void {
  const listener = new ChannelListener({ connectionString: config.databaseUrl, ...pageChangeHandlers(publicPageCache) });
  let trust = { revalidateAfterMs: 0, trustWhileListeningMs: 0 };
  beforeAll(async () => {
    trust = { revalidateAfterMs: publicPageCache.revalidateAfterMs, trustWhileListeningMs: publicPageCache.trustWhileListeningMs };
    Object.assign(publicPageCache, { revalidateAfterMs: 60_000, trustWhileListeningMs: 60_000 });
    await listener.start();
    if (!publicPageCache.listening) throw new Error('the page-change listener did not connect');
  });
  afterAll(async () => {
    await listener.stop();
    Object.assign(publicPageCache, trust, { listening: false });
  });
}

/**
 * Waits until this process has heard every page change committed so far: notifications arrive in
 * commit order, so a marker sent now is heard after them.
 */
export async function pageChangesHeard(): Promise<void> {
  const marker = `heard:${randomUUID()}`;
  const cache = publicPageCache;
  const invalidate = cache.invalidate.bind(cache);
  const heard = new Promise<void>((resolve) => {
    cache.invalidate = (tags) => {
      const list = [...tags];
      invalidate(list);
      if (list.includes(marker)) {
        cache.invalidate = invalidate;
        resolve();
      }
    };
  });
  await sequelize.query(`SELECT pg_notify('${PAGE_CHANGE_CHANNEL}', '${marker}')`);
  await heard;
}
