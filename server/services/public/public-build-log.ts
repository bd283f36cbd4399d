import { Op } from 'sequelize';
import { LOG_POSTS_IN_FEED, LOG_POSTS_ON_PAGE } from '@shared/schemas/build-log';
import { Photo } from '../../models/photo';
import { DynoRun } from '../../models/dyno-run';
import { WeighIn } from '../../models/weigh-in';
import type { BuildLogPost } from '../../models/build-log-post';
import type { BuildQuestion } from '../../models/build-question';
import { countPublishedLogPosts, listPublishedLogPosts } from '../builds/build-log';
import { listAnsweredQuestions } from '../builds/build-questions';

/** Published posts with what they point at: their photos (of the same build, by id) and the date of a linked measurement. */
export type LogPostWithRecords = { post: BuildLogPost; photos: Photo[]; measurement: { kind: 'dyno' | 'weigh-in'; date: string } | null };

async function withRecords(posts: BuildLogPost[]): Promise<LogPostWithRecords[]> {
  const photoIds = [...new Set(posts.flatMap((p) => p.photoIds))];
  const dynoIds = posts.flatMap((p) => (p.dynoRunId ? [p.dynoRunId] : []));
  const weighInIds = posts.flatMap((p) => (p.weighInId ? [p.weighInId] : []));
  // One after another: a public page holds one pooled connection at a time (publicDbWork counts on it).
  const photos = photoIds.length ? await Photo.findAll({ where: { id: { [Op.in]: photoIds } } }) : [];
  const runs = dynoIds.length ? await DynoRun.findAll({ where: { id: { [Op.in]: dynoIds } }, attributes: ['id', 'date', 'buildId'] }) : [];
  const weighIns = weighInIds.length ? await WeighIn.findAll({ where: { id: { [Op.in]: weighInIds } }, attributes: ['id', 'date', 'buildId'] }) : [];
  const photoById = new Map(photos.map((p) => [p.id, p]));
  return posts.map((post) => {
    // A photo deleted since, or one of another build, is simply not shown.
    const own = post.photoIds.flatMap((id) => {
      const photo = photoById.get(id);
      return photo && photo.buildId === post.buildId ? [photo] : [];
    });
    const run = post.dynoRunId ? runs.find((r) => r.id === post.dynoRunId) : undefined;
    const weighIn = post.weighInId ? weighIns.find((w) => w.id === post.weighInId) : undefined;
    const measurement = run ? { kind: 'dyno' as const, date: run.date } : weighIn ? { kind: 'weigh-in' as const, date: weighIn.date } : null;
    return { post, photos: own, measurement };
  });
}

/** What the public page adds about the build over time: the newest posts, how many there are, and the answered questions. */
export async function loadPublicLogAndAnswers(buildId: number): Promise<{ posts: LogPostWithRecords[]; postCount: number; answers: BuildQuestion[] }> {
  // One after another: a public page holds one pooled connection at a time (publicDbWork counts on it).
  const posts = await listPublishedLogPosts(buildId, LOG_POSTS_ON_PAGE);
  const postCount = await countPublishedLogPosts(buildId);
  const answers = await listAnsweredQuestions(buildId);
  return { posts: await withRecords(posts), postCount, answers };
}

/** Every published post, for the build's "all posts" page. */
export const loadAllPublicPosts = async (buildId: number) => withRecords(await listPublishedLogPosts(buildId));

/** The newest published posts, for the feed. */
export const loadFeedPosts = async (buildId: number) => withRecords(await listPublishedLogPosts(buildId, LOG_POSTS_IN_FEED));
