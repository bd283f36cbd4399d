import { Router } from 'express';
import { PublicBuildListQuerySchema, type PublicBuildTileListResponse } from '@shared/schemas/build';
import { parseQuery } from '../middlewares/validate';
import { listRecentPublicBuilds, loadPublicBuild } from '../services/public/public-builds';
import { presentPublicBuild, presentPublicBuildResponse, presentPublicBuildTile } from '../presenters/public-build';
import { NotFoundError } from '../errors';
import { loadPublicEvent } from '../services/public/public-events';
import { listOpenEvents } from '../services/shows/events';
import { presentEventSummary } from '../presenters/event';
import { presentPublicEvent } from '../presenters/public-event';
import { publicDbWork } from '../services/platform/public-db-budget';

/** Public JSON, mounted before the session: anyone may read a published build. Its queries run within the public share of the pool (publicDbWork). */
export const publicApiRouter = Router();

publicApiRouter.get('/public/builds/:code', async (req, res) => {
  const build = await publicDbWork(() => loadPublicBuild(String(req.params.code).toUpperCase()));
  // Unknown and unpublished answer alike, so the API tells no one which codes exist.
  if (!build) throw new NotFoundError('No published build has that code.');
  res.set('Cache-Control', 'public, max-age=30').json(presentPublicBuildResponse(presentPublicBuild(build)));
});

publicApiRouter.get('/public/builds', async (req, res) => {
  const { limit } = parseQuery(req, PublicBuildListQuerySchema);
  const body: PublicBuildTileListResponse = { builds: (await publicDbWork(() => listRecentPublicBuilds(limit))).map(presentPublicBuildTile) };
  res.set('Cache-Control', 'public, max-age=60').json(body);
});

/** The public show page's JSON twin: the same allow-list as /e/<slug>. */
publicApiRouter.get('/public/events/:slug', async (req, res) => {
  const found = await publicDbWork(() => loadPublicEvent(String(req.params.slug)));
  if (!found) throw new NotFoundError('No public show at that address.');
  res.set('Cache-Control', 'public, max-age=30').json({ event: presentPublicEvent(found.event, found.entries, found.results) });
});

/** Shows taking entries now, soonest first: the home page and the entrant's "find a show". */
publicApiRouter.get('/public/events', async (_req, res) => {
  const events = await publicDbWork(() => listOpenEvents());
  res.set('Cache-Control', 'public, max-age=60').json({ events: events.map((e) => presentEventSummary(e)) });
});
