import { Router } from 'express';
import { PublicBuildSearchSchema } from '@shared/schemas/build';
import { listRecentPublicBuilds, searchPublicBuilds } from '../services/public/public-builds';
import { listOpenEvents } from '../services/shows/events';
import { presentPublicBuildTile } from '../presenters/public-build';
import { presentEventSummary } from '../presenters/event';
import { renderBadSearchPage, renderBuildListPage, renderHomePage } from './site-pages';
import { sendHtml } from './send-html';
import { cachedPage, sendCached } from './cached-page';
import { pageTags } from './page-dependencies';
import { nextRegistrationChange } from '../services/public/public-events';
import { publicDbWork } from '../services/platform/public-db-budget';

/** The home page (/) and every published build (/c): server HTML for anyone, no session, briefly cached. */
export const sitePagesRouter = Router();
const CACHE = 'public, max-age=60, stale-while-revalidate=600';
const RECENT_ON_HOME = 8;

// Rendered once per change (pageTags.home) and sent from the page cache: the same bytes for every visitor.
sitePagesRouter.get('/', async (req, res) => {
  const page = await cachedPage(req, 'home', {
    render: async () => {
      // One after another: a public page holds one pooled connection at a time (publicDbWork counts on it).
      const recent = await listRecentPublicBuilds(RECENT_ON_HOME);
      const shows = await listOpenEvents();
      const next = await nextRegistrationChange();
      return {
        html: renderHomePage(recent.map(presentPublicBuildTile), shows.map((e) => presentEventSummary(e))),
        tags: pageTags.home(),
        ...(next ? { expiresAt: next.getTime() } : {}),
      };
    },
  });
  sendCached(req, res, page!, { cacheControl: CACHE, vary: 'Accept-Encoding' });
});

sitePagesRouter.get('/c', async (req, res) => {
  const parsed = PublicBuildSearchSchema.safeParse(req.query);
  if (!parsed.success) {
    res.status(400);
    return sendHtml(req, res, renderBadSearchPage(parsed.error.issues.map((i) => i.message)), 'no-cache');
  }
  const found = await publicDbWork(() => searchPublicBuilds(parsed.data));
  sendHtml(req, res, renderBuildListPage({ search: parsed.data, builds: found.builds.map(presentPublicBuildTile), total: found.total, pages: found.pages }), CACHE);
});
