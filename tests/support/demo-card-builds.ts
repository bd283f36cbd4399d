// The demo scenario's builds, handed back as the cards see them: the public build and its cover photo.
// `createDemoCardBuilds` makes them through the same services as the seeder (photos drawn, dyno runs
// and weigh-ins applied) for one test owner; `demoCardBuildsInMemory` makes the same builds with no
// database, through the same rules and the same public presenter, for the card-layout corpus.
import '@server/models/index';
import sharp from 'sharp';
import { Build } from '@server/models/build';
import { BuildSection } from '@server/models/build-section';
import { DynoRun } from '@server/models/dyno-run';
import { Photo } from '@server/models/photo';
import { User } from '@server/models/user';
import { WeighIn } from '@server/models/weigh-in';
import { BUILD_CODE_ALPHABET, BUILD_CODE_LENGTH } from '@shared/schemas/build';
import { photoVariantKey } from '@server/storage/keys';
import { processImage } from '@server/services/media/image-processing';
import { coverSourceKey } from '@server/services/builds/cards';
import { engineWithDynoPeaks, newestRecordFirst, weightOfWeighIn } from '@shared/build-sheet/records';
import { SECTION_SCHEMAS, type EngineSection } from '@shared/schemas/build-sections';
import type { DemoBuild } from '@server/db/demo/builds';
import { DEMO_BUILDS } from '@server/db/demo/builds';
import { carDrawingSvg } from '@server/db/demo/art';
import { createBuild, loadFullBuildOrThrow, saveCredits, savePrivate, saveSection, updateOverview } from '@server/services/builds/builds';
import { addDynoRun, addWeighIn, applyDynoRun, applyWeighIn } from '@server/services/builds/build-records';
import { storePhotosForBuild } from '@server/services/media/photos';
import { loadCoverImage, type CoverImage } from '@server/services/builds/cards';
import { presentPublicBuild } from '@server/presenters/public-build';
import { DEFAULT_CARD_SETTINGS } from '@shared/schemas/card';
import type { PublicBuild } from '@shared/schemas/build';
import type { SectionKind } from '@shared/schemas/build-sections';
import { createUser } from './factories';

/**
 * A fixed public code per corpus build, so every run scans the same QR codes: with a random code each
 * run, a code that happens to read badly at the coarse scan failed one run in many.
 */
const fixedBuildCode = (n: number) => Array.from({ length: BUILD_CODE_LENGTH }, (_, i) => BUILD_CODE_ALPHABET[(n * 7 + i * 11) % BUILD_CODE_ALPHABET.length]).join('');

/** The record with the latest date: the dyno run the seeder applies. */
const latestByDate = <T extends { date: string }>(records: T[]): T | undefined => [...records].sort((a, b) => b.date.localeCompare(a.date))[0];

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
    const newest = latestByDate(runs);
    if (newest) await applyDynoRun(build, newest.id);
    for (const w of demo.weighIns ?? []) await applyWeighIn(build, (await addWeighIn(build, w)).id);
    const publicBuild = presentPublicBuild(await loadFullBuildOrThrow(build.id));
    out.push({ id: build.id, name: demo.title, build: publicBuild, cover: await loadCoverImage(publicBuild, DEFAULT_CARD_SETTINGS) });
  }
  return out;
}

let inMemory: Promise<readonly DemoCardBuild[]> | undefined;

/**
 * The demo builds as `createDemoCardBuilds` makes them, without the database (unsaved models through the
 * public presenter). Made once per test worker (their photos take a couple of seconds through sharp), so the
 * layout corpora of one worker share them: read them, never change them.
 */
export function demoCardBuildsInMemory(): Promise<readonly DemoCardBuild[]> {
  inMemory ??= Promise.all(DEMO_BUILDS.map((demo, i) => demoCardBuildInMemory(demo, i + 1)));
  return inMemory;
}

async function demoCardBuildInMemory(demo: DemoBuild, id: number): Promise<DemoCardBuild> {
  // As the services leave them: each section parsed by its schema, the newest dyno run's peaks and the
  // last weigh-in applied, the records listed newest first as loadFullBuild lists them.
  const sections = Object.fromEntries(Object.entries(demo.sections).map(([kind, data]) => [kind, SECTION_SCHEMAS[kind as SectionKind].parse(data) as Record<string, unknown>]));
  const runs = demo.dynoRuns ?? [];
  const newestRun = latestByDate(runs);
  if (newestRun) sections.engine = SECTION_SCHEMAS.engine.parse(engineWithDynoPeaks((sections.engine ?? {}) as EngineSection, newestRun)) as Record<string, unknown>;
  const weighIns = demo.weighIns ?? [];
  const weight = weighIns.length ? weightOfWeighIn(weighIns[weighIns.length - 1]!) : (demo.weight ?? null);

  const drawing = demo.drawings[0];
  const image = drawing ? await processImage(await sharp(Buffer.from(carDrawingSvg(drawing.drawing))).jpeg({ quality: 80 }).toBuffer()) : null;
  const build = Build.build({ id, code: fixedBuildCode(id), title: demo.title, modelYear: demo.modelYear ?? null, bodyOrigin: demo.bodyOrigin || null, style: demo.style ?? null, story: demo.story, weight, credits: demo.credits, vin: null, plate: null, ownerPhone: null, ownerAddress: null, updatedAt: new Date() });
  build.owner = User.build({ email: 'demo-owner@example.test', name: 'Demo Owner', passwordHash: '' });
  build.sections = Object.entries(sections).map(([kind, data]) => BuildSection.build({ buildId: id, kind: kind as SectionKind, data }));
  build.photos = image ? [Photo.build({ id, buildId: id, storageKey: `memory/${id}`, caption: drawing!.caption, position: 0, isCover: true, width: image.width, height: image.height, variants: image.variants.map((v) => ({ width: v.width, height: v.height })) })] : [];
  build.dynoRuns = runs.map((data, n) => DynoRun.build({ id: n + 1, buildId: id, date: data.date, data })).sort(newestRecordFirst);
  build.weighIns = weighIns.map((data, n) => WeighIn.build({ id: n + 1, buildId: id, date: data.date, data })).sort(newestRecordFirst);
  const publicBuild = presentPublicBuild(build);

  // The same width of the cover the card service reads from storage for the default settings.
  const key = coverSourceKey(publicBuild, DEFAULT_CARD_SETTINGS);
  const variant = image && key ? image.variants.find((v) => key === photoVariantKey(`memory/${id}`, v.width, 'jpg')) : undefined;
  const cover = image && variant ? { data: variant.jpeg, format: 'jpg' as const, width: image.width, height: image.height } : null;
  return { id, name: demo.title, build: publicBuild, cover };
}
