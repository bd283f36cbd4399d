import { Router } from 'express';
import { PublicEventPageQuerySchema, type PublicEventPageQuery } from '@shared/schemas/public-event';
import { loadPublicEvent, loadPublicEventPage } from '../services/public/public-events';
import { publicDbWork } from '../services/platform/public-db-budget';
import { presentPublicEntryListing, presentPublicEvent } from '../presenters/public-event';
import { EVENT_NOT_FOUND_HTML, renderBadEventSearchPage, renderPublicEventPage } from './public-event-page';
import { eventCalendar } from './event-calendar';
import { cachedPage, sendCached } from './cached-page';
import { pageTags } from './page-dependencies';
import { sendHtml } from './send-html';

/**
 * The public show page /e/<slug> and its calendar file: complete HTML with no script, rendered once
 * per change into the page cache, cached briefly by browsers and proxies and revalidated by ETag.
 * The entry list is paged (`?class=&page=`) and searchable (`?q=`) with plain links and a GET form.
 */
export const eventPagesRouter = Router();
const CACHE = 'public, max-age=30, stale-while-revalidate=300';

/** The next moment the page changes by the clock alone: entries opening or closing. */
function nextClockChange(e: { status: string; registrationOpensAt: Date; registrationClosesAt: Date }, now = Date.now()): number | undefined {
  if (e.status !== 'registration_open') return undefined;
  return [e.registrationOpensAt.getTime(), e.registrationClosesAt.getTime()].filter((t) => t > now).sort((a, b) => a - b)[0];
}

/** Loads and renders one view of the show page (a page of one class or of every class, a search). */
async function renderEventPage(slug: string, query: PublicEventPageQuery) {
  const found = await loadPublicEventPage(slug, query);
  if (!found) return null;
  return {
    html: renderPublicEventPage(presentPublicEvent(found.event, [], found.results), presentPublicEntryListing(query, found.listing)),
    // The titles shown are those of this page's cars only: a change to another car's title leaves it be.
    tags: pageTags.event(found.event.id, found.listing.entries.map((x) => x.buildId)),
    expiresAt: nextClockChange(found.event),
    // Pages past the last and classes of other shows are answered but not kept: the cache holds what exists.
    keep: !found.listing.unknownClass && (query.page === 1 || found.listing.entries.length > 0),
  };
}

eventPagesRouter.get('/e/:slug', async (req, res) => {
  const slug = String(req.params.slug);
  const parsed = PublicEventPageQuerySchema.safeParse(req.query);
  if (!parsed.success) {
    res.status(400);
    return sendHtml(req, res, renderBadEventSearchPage({ name: 'Show', slug: encodeURIComponent(slug) }, parsed.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`)), 'no-cache');
  }
  const query = parsed.data;
  if (query.q) {
    // A search is not cached: its words are the visitor's, and a stream of searches must not push the
    // show's pages out of the cache. It costs one page of SQL and render, within the public share of the pool.
    const page = await publicDbWork(() => renderEventPage(slug, query));
    if (!page) return void res.status(404).type('html').set('Cache-Control', 'no-cache').send(EVENT_NOT_FOUND_HTML);
    return sendHtml(req, res, page.html, 'public, max-age=30');
  }
  // Each class and page is its own cached page (the cache's LRU and byte bound keep their number in check).
  const key = `e|${slug}|${query.class ?? ''}|${query.page}`;
  const page = await cachedPage(req, key, { render: () => renderEventPage(slug, query) });
  if (!page) return void res.status(404).type('html').set('Cache-Control', 'no-cache').send(EVENT_NOT_FOUND_HTML);
  sendCached(req, res, page, { cacheControl: CACHE, vary: 'Accept-Encoding' });
});

eventPagesRouter.get('/e/:slug/calendar.ics', async (req, res) => {
  const slug = String(req.params.slug);
  const page = await cachedPage(req, `ics|${slug}`, {
    render: async () => {
      const found = await loadPublicEvent(slug, { entries: false });
      if (!found) return null;
      return { html: eventCalendar(presentPublicEvent(found.event, [])), tags: pageTags.event(found.event.id, []) };
    },
  });
  if (!page) return void res.status(404).type('text/plain').send('No show here.');
  res.set('Content-Disposition', `attachment; filename="${encodeURIComponent(slug)}.ics"`);
  sendCached(req, res, page, { cacheControl: CACHE, vary: 'Accept-Encoding', type: 'text/calendar; charset=utf-8' });
});
