import type { Migration } from '../migrator';
import { DEMO_ANSWERS, DEMO_LOG_BUILD, DEMO_LOG_POSTS, DEMO_WAITING_QUESTION } from '../demo/build-log';
import { Build } from '../../models/build';
import { User } from '../../models/user';
import { Photo } from '../../models/photo';
import { DynoRun } from '../../models/dyno-run';
import { WeighIn } from '../../models/weigh-in';
import { createLogPost } from '../../services/builds/build-log';
import { createAnsweredQuestion, receiveVisitorQuestion } from '../../services/builds/build-questions';

/** The complete demo build over two years: a dozen published posts and a draft, six answers, one question waiting. */
export const up: Migration = async () => {
  const owner = await User.findOne({ where: { email: DEMO_LOG_BUILD.ownerEmail } });
  const build = owner && (await Build.findOne({ where: { ownerId: owner.id, title: DEMO_LOG_BUILD.title } }));
  if (!build) return; // a database without the demo builds has nothing to add to
  const photos = await Photo.findAll({ where: { buildId: build.id }, order: [['position', 'ASC'], ['id', 'ASC']] });
  const runs = await DynoRun.findAll({ where: { buildId: build.id } });
  const weighIns = await WeighIn.findAll({ where: { buildId: build.id } });
  for (const p of DEMO_LOG_POSTS) {
    await createLogPost(build, {
      postedOn: p.postedOn,
      title: p.title,
      body: p.body,
      status: p.draft ? 'draft' : 'published',
      photoIds: (p.photos ?? []).flatMap((n) => (photos[n - 1] ? [photos[n - 1]!.id] : [])),
      dynoRunId: runs.find((r) => r.date === p.dynoOn)?.id ?? null,
      weighInId: weighIns.find((w) => w.date === p.weighInOn)?.id ?? null,
    });
  }
  for (const a of DEMO_ANSWERS) await createAnsweredQuestion(build, a);
  await receiveVisitorQuestion(build.id, DEMO_WAITING_QUESTION);
};
