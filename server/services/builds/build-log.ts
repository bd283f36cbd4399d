import { Op, type Transaction } from 'sequelize';
import type { LogPostCreateInput, LogPostUpdateInput } from '@shared/schemas/build-log';
import { BuildLogPost } from '../../models/build-log-post';
import { Photo } from '../../models/photo';
import { DynoRun } from '../../models/dyno-run';
import { WeighIn } from '../../models/weigh-in';
import type { Build } from '../../models/build';
import { NotFoundError, ValidationError } from '../../errors';
import { withTransaction } from '../../db/transaction';
import { lockBuild } from './builds';

/** Newest first by the post's date, then by when it was written: the order of the page, the editor and the feed. */
const NEWEST_FIRST: [string, string][] = [
  ['postedOn', 'DESC'],
  ['id', 'DESC'],
];

export const listLogPosts = (buildId: number, transaction?: Transaction) => BuildLogPost.findAll({ where: { buildId }, order: NEWEST_FIRST, transaction });

/** The build's published posts, newest first; `limit` for the page's few. */
export const listPublishedLogPosts = (buildId: number, limit?: number) =>
  BuildLogPost.findAll({ where: { buildId, status: 'published' }, order: NEWEST_FIRST, ...(limit ? { limit } : {}) });

export const countPublishedLogPosts = (buildId: number) => BuildLogPost.count({ where: { buildId, status: 'published' } });

/** Photos, dyno run and weigh-in a post points at must all be this build's own, never another owner's. */
async function checkOwnRecords(buildId: number, input: Partial<Pick<LogPostCreateInput, 'photoIds' | 'dynoRunId' | 'weighInId'>>, transaction: Transaction) {
  const fields: Record<string, string> = {};
  if (input.photoIds?.length) {
    const found = await Photo.count({ where: { id: { [Op.in]: input.photoIds }, buildId }, transaction });
    if (found !== new Set(input.photoIds).size) fields.photoIds = 'Choose photos of this build.';
  }
  if (input.dynoRunId && !(await DynoRun.count({ where: { id: input.dynoRunId, buildId }, transaction }))) fields.dynoRunId = 'That dyno run is not one of this build’s.';
  if (input.weighInId && !(await WeighIn.count({ where: { id: input.weighInId, buildId }, transaction }))) fields.weighInId = 'That weigh-in is not one of this build’s.';
  if (Object.keys(fields).length) throw new ValidationError(fields);
}

export async function createLogPost(build: Build, input: LogPostCreateInput, outer?: Transaction): Promise<BuildLogPost> {
  return withTransaction(outer, async (transaction) => {
    await lockBuild(build.id, transaction);
    await checkOwnRecords(build.id, input, transaction);
    return BuildLogPost.create({ buildId: build.id, ...input, photoIds: [...new Set(input.photoIds)] }, { transaction });
  });
}

export async function findLogPost(build: Build, postId: number, transaction?: Transaction): Promise<BuildLogPost> {
  const post = await BuildLogPost.findOne({ where: { id: postId, buildId: build.id }, transaction });
  if (!post) throw new NotFoundError('No such post on this build.');
  return post;
}

export async function updateLogPost(build: Build, postId: number, input: LogPostUpdateInput, outer?: Transaction): Promise<BuildLogPost> {
  return withTransaction(outer, async (transaction) => {
    await lockBuild(build.id, transaction);
    const post = await findLogPost(build, postId, transaction);
    await checkOwnRecords(build.id, input, transaction);
    // One measurement at most: linking one clears the other unless the request names both.
    const measurement =
      input.dynoRunId ? { dynoRunId: input.dynoRunId, weighInId: input.weighInId ?? null } : input.weighInId ? { weighInId: input.weighInId, dynoRunId: input.dynoRunId ?? null } : {};
    if (input.dynoRunId && input.weighInId) throw new ValidationError({ weighInId: 'Link a dyno run or a weigh-in, not both.' });
    await post.update(
      {
        ...(input.postedOn !== undefined ? { postedOn: input.postedOn } : {}),
        ...(input.title !== undefined ? { title: input.title } : {}),
        ...(input.body !== undefined ? { body: input.body } : {}),
        ...(input.status !== undefined ? { status: input.status } : {}),
        ...(input.photoIds !== undefined ? { photoIds: [...new Set(input.photoIds)] } : {}),
        ...(input.dynoRunId === null ? { dynoRunId: null } : {}),
        ...(input.weighInId === null ? { weighInId: null } : {}),
        ...measurement,
      },
      { transaction },
    );
    return post;
  });
}

export async function deleteLogPost(build: Build, postId: number, outer?: Transaction): Promise<void> {
  await withTransaction(outer, async (transaction) => {
    await lockBuild(build.id, transaction);
    await (await findLogPost(build, postId, transaction)).destroy({ transaction });
  });
}
