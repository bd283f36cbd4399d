// The demo scenario's builds, made through the same services as the seeder (photos drawn, dyno runs
// and weigh-ins applied) for one test owner, and handed back as the cards see them: the public
// build and its cover photo.
import '@server/models/index';
import sharp from 'sharp';
import { DEMO_BUILDS } from '@server/db/demo/builds';
import { carDrawingSvg } from '@server/db/demo/art';
import { createBuild, loadFullBuildOrThrow, saveCredits, savePrivate, saveSection, updateOverview } from '@server/services/builds';
import { addDynoRun, addWeighIn, applyDynoRun, applyWeighIn } from '@server/services/build-records';
import { storePhotosForBuild } from '@server/services/photos';
import { loadCoverImage, type CoverImage } from '@server/services/cards';
import { presentPublicBuild } from '@server/presenters/public-build';
import { DEFAULT_CARD_SETTINGS } from '@shared/schemas/card';
import type { PublicBuild } from '@shared/schemas/build';
import type { SectionKind } from '@shared/schemas/build-sections';
import { createUser } from './factories';

export type DemoCardBuild = { id: number; name: string; build: PublicBuild; cover: CoverImage | null };

/** `owner`: whose builds they become (a new test owner when left out). */
export async function createDemoCardBuilds(owner?: Awaited<ReturnType<typeof createUser>>['user']): Promise<DemoCardBuild[]> {
  const user = owner ?? (await createUser({ name: 'Demo Owner' })).user;
  const out: DemoCardBuild[] = [];
  for (const demo of DEMO_BUILDS) {
    const build = await createBuild(user, { title: demo.title, modelYear: demo.modelYear, bodyOrigin: demo.bodyOrigin, style: demo.style });
    await updateOverview(build, { story: demo.story, ...(demo.weight ? { weight: demo.weight } : {}) });
    for (const [kind, data] of Object.entries(demo.sections)) await saveSection(build, kind as SectionKind, data);
    if (demo.private) await savePrivate(build, demo.private);
    if (demo.credits.length) await saveCredits(build, demo.credits);
    const images = await Promise.all(demo.drawings.slice(0, 1).map(async (d, i) => ({ buffer: await sharp(Buffer.from(carDrawingSvg(d.drawing))).jpeg({ quality: 80 }).toBuffer(), originalName: `drawing-${i + 1}.jpg` })));
    if (images.length) await storePhotosForBuild(build.id, images, demo.drawings.slice(0, 1).map((d) => d.caption));
    const runs = [];
    for (const run of demo.dynoRuns ?? []) runs.push(await addDynoRun(build, run));
    const newest = [...runs].sort((a, b) => b.date.localeCompare(a.date))[0];
    if (newest) await applyDynoRun(build, newest.id);
    for (const w of demo.weighIns ?? []) await applyWeighIn(build, (await addWeighIn(build, w)).id);
    const publicBuild = presentPublicBuild(await loadFullBuildOrThrow(build.id));
    out.push({ id: build.id, name: demo.title, build: publicBuild, cover: await loadCoverImage(publicBuild, DEFAULT_CARD_SETTINGS) });
  }
  return out;
}
