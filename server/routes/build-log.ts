import { Router, type Request } from 'express';
import { LogPostCreateSchema, LogPostUpdateSchema } from '@shared/schemas/build-log';
import { IdParamSchema, IdSchema } from '@shared/schemas/params';
import { parseBody, parseParams } from '../middlewares/validate';
import { currentUser, requireUser } from '../middlewares/authenticate';
import { authorizeBuild } from '../policies/build';
import { findBuild } from '../services/builds/builds';
import { createLogPost, deleteLogPost, listLogPosts, updateLogPost } from '../services/builds/build-log';
import { presentOwnLogPost } from '../presenters/build-log';

/** The owner's build log: dated posts, draft or published. */
export const buildLogRouter = Router();
buildLogRouter.use('/builds', requireUser);

const PostParams = IdParamSchema.extend({ postId: IdSchema });

async function buildFor(req: Request, id: number, action: 'view' | 'edit') {
  const build = await findBuild(id);
  authorizeBuild(currentUser(req), action, build);
  return build;
}

buildLogRouter.get('/builds/:id/log', async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  const build = await buildFor(req, id, 'view');
  res.json({ posts: (await listLogPosts(build.id)).map(presentOwnLogPost) });
});

buildLogRouter.post('/builds/:id/log', async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  const input = parseBody(req, LogPostCreateSchema);
  const build = await buildFor(req, id, 'edit');
  const post = await createLogPost(build, input);
  res.status(201).json({ post: presentOwnLogPost(post) });
});

buildLogRouter.patch('/builds/:id/log/:postId', async (req, res) => {
  const { id, postId } = parseParams(req, PostParams);
  const input = parseBody(req, LogPostUpdateSchema);
  const build = await buildFor(req, id, 'edit');
  const post = await updateLogPost(build, postId, input);
  res.json({ post: presentOwnLogPost(post) });
});

buildLogRouter.delete('/builds/:id/log/:postId', async (req, res) => {
  const { id, postId } = parseParams(req, PostParams);
  const build = await buildFor(req, id, 'edit');
  await deleteLogPost(build, postId);
  res.status(204).end();
});
