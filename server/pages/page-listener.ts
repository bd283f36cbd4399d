import { EVERY_PAGE, PAGE_CHANGE_CHANNEL } from './page-dependencies';
import { publicPageCache, type PageCache } from './page-cache';

/**
 * What the page cache does with the database's page-change notifications (a ChannelListener made
 * where the server is assembled): drop the cached pages showing each named tag. While the listener is
 * away the cache trusts a page for a second only; when it is back every page is checked again before
 * it is trusted (the changes made meanwhile were not heard), yet kept for a database that goes away again.
 */
export function pageChangeHandlers(cache: PageCache = publicPageCache) {
  return {
    channel: PAGE_CHANGE_CHANNEL,
    name: 'placard-page-changes',
    onMessage: (payload: string) => cache.invalidate(payload ? payload.split(' ') : [EVERY_PAGE]),
    onListening: () => {
      cache.suspectAll();
      cache.listening = true;
    },
    onLost: () => {
      cache.listening = false;
    },
    meanwhile: 'public pages are checked against the database every second meanwhile',
  };
}
