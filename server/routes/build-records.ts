import { Router, type Request } from 'express';
import { DynoRunCreateSchema, WeighInCreateSchema } from '@shared/schemas/build';
import type { z } from 'zod';
import { IdParamSchema, IdSchema } from '@shared/schemas/params';
import { parseBody, parseParams } from '../middlewares/validate';
import { currentUser, requireUser } from '../middlewares/authenticate';
import { authorizeBuild } from '../policies/build';
import { findBuild } from '../services/builds/builds';
import { addDynoRun, addWeighIn, applyDynoRun, applyWeighIn, deleteDynoRun, deleteWeighIn } from '../services/builds/build-records';
import { respondWithBuild } from './respond-with-build';

/** Dyno runs and weigh-ins: dated measurements that can feed the build's figures. */
export const buildRecordsRouter = Router();
buildRecordsRouter.use('/builds', requireUser);

const BuildParams = IdParamSchema;
const RecordParams = IdParamSchema.extend({ recordId: IdSchema });

async function editableBuild(req: Request, id: number) {
  const build = await findBuild(id);
  authorizeBuild(currentUser(req), 'edit', build);
  return build;
}

type EditableBuild = Awaited<ReturnType<typeof editableBuild>>;

/** The same three routes for each kind of record: add, delete, and apply to the build's figures. */
function recordRoutes<S extends z.ZodType>(kind: {
  path: string;
  schema: S;
  add: (build: EditableBuild, input: z.output<S>) => Promise<unknown>;
  remove: (build: EditableBuild, recordId: number) => Promise<void>;
  apply: (build: EditableBuild, recordId: number) => Promise<void>;
}) {
  buildRecordsRouter.post(`/builds/:id/${kind.path}`, async (req, res) => {
    const { id } = parseParams(req, BuildParams);
    const input = parseBody(req, kind.schema);
    const build = await editableBuild(req, id);
    await kind.add(build, input);
    await respondWithBuild(req, res, build.id, 201);
  });

  buildRecordsRouter.delete(`/builds/:id/${kind.path}/:recordId`, async (req, res) => {
    const { id, recordId } = parseParams(req, RecordParams);
    const build = await editableBuild(req, id);
    await kind.remove(build, recordId);
    await respondWithBuild(req, res, build.id);
  });

  buildRecordsRouter.post(`/builds/:id/${kind.path}/:recordId/apply`, async (req, res) => {
    const { id, recordId } = parseParams(req, RecordParams);
    const build = await editableBuild(req, id);
    await kind.apply(build, recordId);
    await respondWithBuild(req, res, build.id);
  });
}

recordRoutes({ path: 'dyno-runs', schema: DynoRunCreateSchema, add: addDynoRun, remove: deleteDynoRun, apply: applyDynoRun });
recordRoutes({ path: 'weigh-ins', schema: WeighInCreateSchema, add: addWeighIn, remove: deleteWeighIn, apply: applyWeighIn });
