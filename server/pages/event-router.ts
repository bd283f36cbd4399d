import { Router } from 'express';
import { loadPublicEvent } from '../services/public/public-events';
import { presentPublicEvent } from '../presenters/public-event';
import { EVENT_NOT_FOUND_HTML, renderPublicEventPage } from './public-event-page';
import { eventCalendar } from './event-calendar';
import { cachedPage, sendCached } from './cached-page';
import { pageTags } from './page-dependencies';

/**
 * The public show page /e/<slug> and its calendar file: complete HTML with no script, rendered once
 * per change into the page cache, cached briefly by browsers and proxies and revalidated by ETag.
 */
export const eventPagesRouter = Router();
const CACHE = 'public, max-age=30, stale-while-revalidate=300';

/** The next moment the page changes by the clock alone: entries opening or closing. */
function nextClockChange(e: { status: string; registrationOpensAt: Date; registrationClosesAt: Date }, now = Date.now()): number | undefined {
  if (e.status !== 'registration_open') return undefined;
  return [e.registrationOpensAt.getTime(), e.registrationClosesAt.getTime()].filter((t) => t > now).sort((a, b) => a - b)[0];
}

eventPagesRouter.get('/e/:slug', async (req, res) => {
  const slug = String(req.params.slug);
  const page = await cachedPage(req, `e|${slug}`, {
    render: async () => {
      const found = await loadPublicEvent(slug);
      if (!found) return null;
      return {
        html: renderPublicEventPage(presentPublicEvent(found.event, found.entries, found.results)),
        tags: pageTags.event(found.event.id, found.entries.map((x) => x.buildId)),
        expiresAt: nextClockChange(found.event),
      };
    },
  });
  if (!page) return void res.status(404).type('html').set('Cache-Control', 'no-cache').send(EVENT_NOT_FOUND_HTML);
  sendCached(req, res, page, { cacheControl: CACHE, vary: 'Accept-Encoding' });
});

eventPagesRouter.get('/e/:slug/calendar.ics', async (req, res) => {
  const found = await loadPublicEvent(String(req.params.slug));
  if (!found) return void res.status(404).type('text/plain').send('No show here.');
  const e = presentPublicEvent(found.event, []);
  res.set({ 'Cache-Control': CACHE, 'Content-Disposition': `attachment; filename="${e.slug}.ics"` }).type('text/calendar; charset=utf-8').send(eventCalendar(e));
});
