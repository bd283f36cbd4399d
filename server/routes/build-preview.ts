import { Router } from 'express';
import { z } from 'zod';
import { IdParamSchema } from '@shared/schemas/params';
import { parseParams, parseQuery } from '../middlewares/validate';
import { currentUser, requireUser } from '../middlewares/authenticate';
import { authorizeBuild } from '../policies/build';
import { loadFullBuildOrThrow } from '../services/builds/builds';
import { presentPublicBuild } from '../presenters/public-build';
import { renderPublicBuildPage } from '../pages/public-build-page';
import { loadPublicLogAndAnswers } from '../services/public/public-build-log';
import { presentBuildOverTime } from '../presenters/build-log';

export const buildPreviewRouter = Router();

const PreviewQuerySchema = z.object({ units: z.enum(['metric', 'uk', 'imperial'], { error: 'Units must be metric, uk or imperial.' }).default('metric') });

/** The owner's look at the public page, draft or not: the same public allow-list, never cached. */
buildPreviewRouter.get('/builds/:id/preview', requireUser, async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  const { units } = parseQuery(req, PreviewQuerySchema);
  const build = await loadFullBuildOrThrow(id);
  authorizeBuild(currentUser(req), 'edit', build);
  // The published posts and the answered questions, as visitors will see them (drafts and the inbox stay out).
  const overTime = presentBuildOverTime(await loadPublicLogAndAnswers(build.id));
  const html = renderPublicBuildPage(presentPublicBuild(build), units, [], build.published ? 'published' : 'draft', overTime);
  res.set('Cache-Control', 'no-store').type('html').send(html);
});
