import { Router, type Request, type Response } from 'express';
import { z } from 'zod';
import { DynoRunCreateSchema, WeighInCreateSchema, type DynoRunCreateInput, type WeighInCreateInput } from '@shared/schemas/build';
import { validate } from '../middlewares/validate';
import { currentUser, requireUser } from '../middlewares/authenticate';
import { authorizeBuild } from '../policies/build';
import { findBuild, loadFullBuildOrThrow } from '../services/builds';
import { addDynoRun, addWeighIn, applyDynoRun, applyWeighIn, deleteDynoRun, deleteWeighIn } from '../services/build-records';
import { presentOwnerBuild } from '../presenters/build';

/** Dyno runs and weigh-ins: dated measurements that can feed the build's figures. */
export const buildRecordsRouter = Router();
buildRecordsRouter.use('/builds', requireUser);

const positiveId = (label: string) => z.coerce.number({ error: `${label} must be a number.` }).int().positive({ error: `${label} must be a positive whole number.` });
const BuildParams = z.object({ id: positiveId('Id') });
const RecordParams = BuildParams.extend({ recordId: positiveId('Record id') });
type Params = { id: number; recordId: number };

async function editableBuild(req: Request, res: Response) {
  const build = await findBuild((res.locals.params as Params).id);
  authorizeBuild(currentUser(req), 'edit', build);
  return build;
}

async function respondWithBuild(req: Request, res: Response, id: number, status = 200) {
  res.status(status).json({ build: presentOwnerBuild(await loadFullBuildOrThrow(id), currentUser(req)) });
}

buildRecordsRouter.post('/builds/:id/dyno-runs', validate('params', BuildParams), validate('body', DynoRunCreateSchema), async (req, res) => {
  const build = await editableBuild(req, res);
  await addDynoRun(build, res.locals.body as DynoRunCreateInput);
  await respondWithBuild(req, res, build.id, 201);
});

buildRecordsRouter.delete('/builds/:id/dyno-runs/:recordId', validate('params', RecordParams), async (req, res) => {
  const build = await editableBuild(req, res);
  await deleteDynoRun(build, (res.locals.params as Params).recordId);
  await respondWithBuild(req, res, build.id);
});

buildRecordsRouter.post('/builds/:id/dyno-runs/:recordId/apply', validate('params', RecordParams), async (req, res) => {
  const build = await editableBuild(req, res);
  await applyDynoRun(build, (res.locals.params as Params).recordId);
  await respondWithBuild(req, res, build.id);
});

buildRecordsRouter.post('/builds/:id/weigh-ins', validate('params', BuildParams), validate('body', WeighInCreateSchema), async (req, res) => {
  const build = await editableBuild(req, res);
  await addWeighIn(build, res.locals.body as WeighInCreateInput);
  await respondWithBuild(req, res, build.id, 201);
});

buildRecordsRouter.delete('/builds/:id/weigh-ins/:recordId', validate('params', RecordParams), async (req, res) => {
  const build = await editableBuild(req, res);
  await deleteWeighIn(build, (res.locals.params as Params).recordId);
  await respondWithBuild(req, res, build.id);
});

buildRecordsRouter.post('/builds/:id/weigh-ins/:recordId/apply', validate('params', RecordParams), async (req, res) => {
  const build = await editableBuild(req, res);
  await applyWeighIn(build, (res.locals.params as Params).recordId);
  await respondWithBuild(req, res, build.id);
});
