import { Router, type Response } from 'express';
import { BuildCreateSchema, BuildPrivateSchema, BuildUpdateSchema, CreditsSchema, PublishSchema, type BuildCreateInput, type BuildPrivate, type BuildUpdateInput } from '@shared/schemas/build';
import { SECTION_SCHEMAS, SectionKindParamSchema, type SectionKind } from '@shared/schemas/build-sections';
import { IdParamSchema } from '@shared/schemas/user';
import { fieldsFromIssues } from '@shared/errors';
import { validate } from '../middlewares/validate';
import { currentUser, requireUser } from '../middlewares/authenticate';
import { authorizeBuild } from '../policies/build';
import { createBuild, deleteBuild, findBuild, listBuildsOf, saveCredits, savePrivate, saveSection, setPublished, updateOverview } from '../services/builds';
import { deletePhotoFiles } from '../services/photos';
import { presentBuildSummary } from '../presenters/build';
import { respondWithBuild } from './respond-with-build';
import { ValidationError } from '../errors';

export const buildsRouter = Router();
buildsRouter.use('/builds', requireUser);

const idOf = (res: Response) => (res.locals.params as { id: number }).id;


buildsRouter.get('/builds', async (req, res) => {
  const builds = await listBuildsOf(currentUser(req));
  res.json({ builds: builds.map(presentBuildSummary) });
});

buildsRouter.post('/builds', validate('body', BuildCreateSchema), async (req, res) => {
  const user = currentUser(req);
  authorizeBuild(user, 'create');
  const build = await createBuild(user, res.locals.body as BuildCreateInput);
  await respondWithBuild(req, res, build.id, 201);
});

buildsRouter.get('/builds/:id', validate('params', IdParamSchema), async (req, res) => {
  const build = await findBuild(idOf(res));
  authorizeBuild(currentUser(req), 'view', build);
  await respondWithBuild(req, res, build.id);
});

buildsRouter.patch('/builds/:id', validate('params', IdParamSchema), validate('body', BuildUpdateSchema), async (req, res) => {
  const build = await findBuild(idOf(res));
  authorizeBuild(currentUser(req), 'edit', build);
  await updateOverview(build, res.locals.body as BuildUpdateInput);
  await respondWithBuild(req, res, build.id);
});

buildsRouter.put('/builds/:id/sections/:kind', validate('params', IdParamSchema.extend(SectionKindParamSchema.shape)), async (req, res) => {
  const { id, kind } = res.locals.params as { id: number; kind: SectionKind };
  const parsed = SECTION_SCHEMAS[kind].safeParse(req.body ?? {});
  if (!parsed.success) throw new ValidationError(fieldsFromIssues(parsed.error.issues));
  const build = await findBuild(id);
  authorizeBuild(currentUser(req), 'edit', build);
  await saveSection(build, kind, parsed.data);
  await respondWithBuild(req, res, id);
});

buildsRouter.put('/builds/:id/private', validate('params', IdParamSchema), validate('body', BuildPrivateSchema), async (req, res) => {
  const build = await findBuild(idOf(res));
  authorizeBuild(currentUser(req), 'edit', build);
  await savePrivate(build, res.locals.body as BuildPrivate);
  await respondWithBuild(req, res, build.id);
});

buildsRouter.put('/builds/:id/credits', validate('params', IdParamSchema), validate('body', CreditsSchema), async (req, res) => {
  const build = await findBuild(idOf(res));
  authorizeBuild(currentUser(req), 'edit', build);
  await saveCredits(build, (res.locals.body as { credits: [] }).credits);
  await respondWithBuild(req, res, build.id);
});

buildsRouter.put('/builds/:id/published', validate('params', IdParamSchema), validate('body', PublishSchema), async (req, res) => {
  const build = await findBuild(idOf(res));
  authorizeBuild(currentUser(req), 'publish', build);
  await setPublished(build, (res.locals.body as { published: boolean }).published);
  await respondWithBuild(req, res, build.id);
});

buildsRouter.delete('/builds/:id', validate('params', IdParamSchema), async (req, res) => {
  const build = await findBuild(idOf(res));
  authorizeBuild(currentUser(req), 'delete', build);
  const { photoKeys } = await deleteBuild(build);
  // Files go after the rows: a failed file delete leaves an orphan file, never a photo row with no file.
  await deletePhotoFiles(photoKeys).catch((err: unknown) => req.log.warn({ err }, 'photo files left behind'));
  res.status(204).end();
});
