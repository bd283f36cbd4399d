import { Router, type Request, type Response } from 'express';
import { DynoRunCreateSchema, WeighInCreateSchema, type DynoRunCreateInput, type WeighInCreateInput } from '@shared/schemas/build';
import { IdParamSchema, IdSchema } from '@shared/schemas/params';
import { validate } from '../middlewares/validate';
import { currentUser, requireUser } from '../middlewares/authenticate';
import { authorizeBuild } from '../policies/build';
import { findBuild } from '../services/builds';
import { addDynoRun, addWeighIn, applyDynoRun, applyWeighIn, deleteDynoRun, deleteWeighIn } from '../services/build-records';
import { respondWithBuild } from './respond-with-build';
import type { Build } from '../models/build';

/** Dyno runs and weigh-ins: dated measurements that can feed the build's figures. */
export const buildRecordsRouter = Router();
buildRecordsRouter.use('/builds', requireUser);

const BuildParams = IdParamSchema;
const RecordParams = IdParamSchema.extend({ recordId: IdSchema });
type Params = { id: number; recordId: number };

async function editableBuild(req: Request, res: Response) {
  const build = await findBuild((res.locals.params as Params).id);
  authorizeBuild(currentUser(req), 'edit', build);
  return build;
}


// The same four routes for each kind of record: add, delete, and apply to the build's figures.
const RECORD_KINDS = [
  { path: 'dyno-runs', schema: DynoRunCreateSchema, add: (b: Build, body: unknown) => addDynoRun(b, body as DynoRunCreateInput), remove: deleteDynoRun, apply: applyDynoRun },
  { path: 'weigh-ins', schema: WeighInCreateSchema, add: (b: Build, body: unknown) => addWeighIn(b, body as WeighInCreateInput), remove: deleteWeighIn, apply: applyWeighIn },
];

for (const kind of RECORD_KINDS) {
  buildRecordsRouter.post(`/builds/:id/${kind.path}`, validate('params', BuildParams), validate('body', kind.schema), async (req, res) => {
    const build = await editableBuild(req, res);
    await kind.add(build, res.locals.body);
    await respondWithBuild(req, res, build.id, 201);
  });

  buildRecordsRouter.delete(`/builds/:id/${kind.path}/:recordId`, validate('params', RecordParams), async (req, res) => {
    const build = await editableBuild(req, res);
    await kind.remove(build, (res.locals.params as Params).recordId);
    await respondWithBuild(req, res, build.id);
  });

  buildRecordsRouter.post(`/builds/:id/${kind.path}/:recordId/apply`, validate('params', RecordParams), async (req, res) => {
    const build = await editableBuild(req, res);
    await kind.apply(build, (res.locals.params as Params).recordId);
    await respondWithBuild(req, res, build.id);
  });
}
