import { randomBytes } from 'node:crypto';
import sharp from 'sharp';
import type { Migration } from '../migrator';
import { DEMO_BUILDS, DEMO_OWNERS } from '../demo/builds';
import { carDrawingSvg, dynoSheetSvg } from '../demo/art';
import { User } from '../../models/user';
import { hashPassword } from '../../auth/passwords';
import { createBuild, saveCredits, savePrivate, saveSection, setPublished, updateOverview } from '../../services/builds/builds';
import { addDynoRun, addWeighIn, applyDynoRun, applyWeighIn } from '../../services/builds/build-records';
import { storePhotosForBuild } from '../../services/media/photos';
import type { SectionKind } from '@shared/schemas/build-sections';

/** A dozen invented builds of different eras and styles, with photos drawn here, a dyno day and a weigh-in. */
export const up: Migration = async () => {
  for (const o of DEMO_OWNERS) {
    if (await User.findOne({ where: { email: o.email } })) continue;
    // Demo-only owners: nobody signs in as them, so their password is random and never printed.
    await User.create({ email: o.email, name: o.name, passwordHash: await hashPassword(randomBytes(18).toString('base64url')) });
  }
  for (const demo of DEMO_BUILDS) {
    const owner = await User.findOne({ where: { email: demo.ownerEmail } });
    if (!owner) throw new Error(`Demo owner ${demo.ownerEmail} is missing`);
    const build = await createBuild(owner, { title: demo.title, modelYear: demo.modelYear, bodyOrigin: demo.bodyOrigin, style: demo.style });
    await updateOverview(build, { story: demo.story, ...(demo.weight ? { weight: demo.weight } : {}) });
    for (const [kind, data] of Object.entries(demo.sections)) await saveSection(build, kind as SectionKind, data);
    if (demo.private) await savePrivate(build, demo.private);
    if (demo.credits.length) await saveCredits(build, demo.credits);
    const images = await Promise.all(
      demo.drawings.map(async (d, i) => ({ buffer: await sharp(Buffer.from(carDrawingSvg(d.drawing))).jpeg({ quality: 85 }).toBuffer(), originalName: `drawing-${i + 1}.jpg` })),
    );
    if (images.length) await storePhotosForBuild(build.id, images, demo.drawings.map((d) => d.caption));
    const runs = [];
    const newestFirst = [...(demo.dynoRuns ?? [])].sort((a, b) => b.date.localeCompare(a.date));
    let sheetPhotoId: number | undefined;
    if (demo.dynoSheet && newestFirst[0]) {
      const sheet = await sharp(Buffer.from(dynoSheetSvg(newestFirst[0].curve))).jpeg({ quality: 85 }).toBuffer();
      const photos = await storePhotosForBuild(build.id, [{ buffer: sheet, originalName: 'dyno-sheet.jpg' }], [demo.dynoSheet.caption]);
      sheetPhotoId = photos[photos.length - 1]?.id;
    }
    for (const run of demo.dynoRuns ?? []) runs.push(await addDynoRun(build, run === newestFirst[0] && sheetPhotoId ? { ...run, sheetPhotoId } : run));
    const newestRun = [...runs].sort((a, b) => b.date.localeCompare(a.date))[0];
    if (newestRun) await applyDynoRun(build, newestRun.id);
    for (const w of demo.weighIns ?? []) await applyWeighIn(build, (await addWeighIn(build, w)).id);
    if (demo.published) await setPublished(build, true);
  }
};
