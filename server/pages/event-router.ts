import { Router } from 'express';
import { loadPublicEvent } from '../services/public/public-events';
import { presentPublicEvent } from '../presenters/public-event';
import { EVENT_NOT_FOUND_HTML, renderPublicEventPage } from './public-event-page';
import { eventCalendar } from './event-calendar';

/**
 * The public show page /e/<slug> and its calendar file: complete HTML with no script, cached
 * briefly by browsers and proxies and revalidated by ETag (Express makes one from the body).
 */
export const eventPagesRouter = Router();
const CACHE = 'public, max-age=30, stale-while-revalidate=300';

eventPagesRouter.get('/e/:slug', async (req, res) => {
  const found = await loadPublicEvent(String(req.params.slug));
  if (!found) return void res.status(404).type('html').set('Cache-Control', 'no-cache').send(EVENT_NOT_FOUND_HTML);
  res.set('Cache-Control', CACHE).type('html').send(renderPublicEventPage(presentPublicEvent(found.event, found.entries, found.results)));
});

eventPagesRouter.get('/e/:slug/calendar.ics', async (req, res) => {
  const found = await loadPublicEvent(String(req.params.slug));
  if (!found) return void res.status(404).type('text/plain').send('No show here.');
  const e = presentPublicEvent(found.event, []);
  res.set({ 'Cache-Control': CACHE, 'Content-Disposition': `attachment; filename="${e.slug}.ics"` }).type('text/calendar; charset=utf-8').send(eventCalendar(e));
});
