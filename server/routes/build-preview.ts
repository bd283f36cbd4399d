import { Router } from 'express';
import { z } from 'zod';
import { IdParamSchema } from '@shared/schemas/params';
import { validate } from '../middlewares/validate';
import { currentUser, requireUser } from '../middlewares/authenticate';
import { authorizeBuild } from '../policies/build';
import { loadFullBuildOrThrow } from '../services/builds';
import { presentPublicBuild } from '../presenters/public-build';
import { renderPublicBuildPage } from '../pages/public-build-page';
import { User } from '../models/user';

export const buildPreviewRouter = Router();

const PreviewQuerySchema = z.object({ units: z.enum(['metric', 'imperial'], { error: 'Units must be metric or imperial.' }).default('metric') });

/** The owner's look at the public page, draft or not: the same public allow-list, never cached. */
buildPreviewRouter.get('/builds/:id/preview', requireUser, validate('params', IdParamSchema), validate('query', PreviewQuerySchema), async (req, res) => {
  const build = await loadFullBuildOrThrow((res.locals.params as { id: number }).id);
  authorizeBuild(currentUser(req), 'edit', build);
  const owner = await User.findByPk(build.ownerId, { attributes: ['id', 'name'] });
  const { units } = res.locals.query as z.infer<typeof PreviewQuerySchema>;
  const html = renderPublicBuildPage(presentPublicBuild(build, { name: owner?.name ?? '' }), units, null, build.published ? 'published' : 'draft');
  res.set('Cache-Control', 'no-store').type('html').send(html);
});
