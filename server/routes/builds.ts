import { Router } from 'express';
import type { z } from 'zod';
import { BuildCreateSchema, BuildPrivateSchema, BuildUpdateSchema, CreditsSchema, PublishSchema } from '@shared/schemas/build';
import { SECTION_SCHEMAS, SectionKindParamSchema } from '@shared/schemas/build-sections';
import { IdParamSchema } from '@shared/schemas/params';
import { replaceBody } from '@shared/schemas/body';
import { parseBody, parseParams } from '../middlewares/validate';
import { currentUser, requireUser } from '../middlewares/authenticate';
import { authorizeBuild } from '../policies/build';
import { createBuild, findBuild, listBuildsOf, saveCredits, savePrivate, saveSection, setPublished, updateOverview } from '../services/builds/builds';
import { deleteBuild } from '../services/commands/delete-build';
import { deletePhotoFiles } from '../services/media/photos';
import { presentBuildSummary } from '../presenters/build';
import { respondWithBuild } from './respond-with-build';

export const buildsRouter = Router();
buildsRouter.use('/builds', requireUser);

const SectionParamsSchema = IdParamSchema.extend(SectionKindParamSchema.shape);
// PUT replaces the whole object, so a body must name only fields it knows (see replaceBody).
const SECTION_REPLACE_SCHEMAS = Object.fromEntries(Object.entries(SECTION_SCHEMAS).map(([kind, schema]) => [kind, replaceBody(schema as z.ZodObject)])) as unknown as typeof SECTION_SCHEMAS;
const PrivateReplaceSchema = replaceBody(BuildPrivateSchema);
const CreditsReplaceSchema = replaceBody(CreditsSchema);

buildsRouter.get('/builds', async (req, res) => {
  const builds = await listBuildsOf(currentUser(req));
  res.json({ builds: builds.map(presentBuildSummary) });
});

buildsRouter.post('/builds', async (req, res) => {
  const input = parseBody(req, BuildCreateSchema);
  const user = currentUser(req);
  authorizeBuild(user, 'create');
  const build = await createBuild(user, input);
  await respondWithBuild(req, res, build.id, 201);
});

buildsRouter.get('/builds/:id', async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  const build = await findBuild(id);
  authorizeBuild(currentUser(req), 'view', build);
  await respondWithBuild(req, res, build.id);
});

buildsRouter.patch('/builds/:id', async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  const input = parseBody(req, BuildUpdateSchema);
  const build = await findBuild(id);
  authorizeBuild(currentUser(req), 'edit', build);
  await updateOverview(build, input);
  await respondWithBuild(req, res, build.id);
});

buildsRouter.put('/builds/:id/sections/:kind', async (req, res) => {
  const { id, kind } = parseParams(req, SectionParamsSchema);
  const section = parseBody(req, SECTION_REPLACE_SCHEMAS[kind]);
  const build = await findBuild(id);
  authorizeBuild(currentUser(req), 'edit', build);
  await saveSection(build, kind, section);
  await respondWithBuild(req, res, id);
});

buildsRouter.put('/builds/:id/private', async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  const input = parseBody(req, PrivateReplaceSchema);
  const build = await findBuild(id);
  authorizeBuild(currentUser(req), 'edit', build);
  await savePrivate(build, input);
  await respondWithBuild(req, res, build.id);
});

buildsRouter.put('/builds/:id/credits', async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  const input = parseBody(req, CreditsReplaceSchema);
  const build = await findBuild(id);
  authorizeBuild(currentUser(req), 'edit', build);
  await saveCredits(build, input.credits);
  await respondWithBuild(req, res, build.id);
});

buildsRouter.put('/builds/:id/published', async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  const input = parseBody(req, PublishSchema);
  const build = await findBuild(id);
  authorizeBuild(currentUser(req), 'publish', build);
  await setPublished(build, input.published);
  await respondWithBuild(req, res, build.id);
});

buildsRouter.delete('/builds/:id', async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  const build = await findBuild(id);
  authorizeBuild(currentUser(req), 'delete', build);
  const { photoKeys } = await deleteBuild(build);
  // Files go after the rows: a failed file delete leaves an orphan file, never a photo row with no file.
  await deletePhotoFiles(photoKeys).catch((err: unknown) => req.log.warn({ err }, 'photo files left behind'));
  res.status(204).end();
});
