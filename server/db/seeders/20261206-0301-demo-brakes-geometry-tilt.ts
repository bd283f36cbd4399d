import type { Migration } from '../migrator';
import { DEMO_BUILDS } from '../demo/builds';
import { Build } from '../../models/build';
import { BuildSection } from '../../models/build-section';
import { User } from '../../models/user';
import { WeighIn } from '../../models/weigh-in';
import { saveSection } from '../../services/builds/builds';
import { addWeighIn, applyWeighIn } from '../../services/builds/build-records';

/** The builds that gained brake hydraulics, front pivots and a tilted weigh-in in the demo. */
const TITLES = ['1967 Fastback', '1957 Wagon'];

/**
 * A database seeded before the demo had them gets the brake hydraulics, the front double wishbone and
 * the tilted weigh-in of the complete build and the wagon. A database seeded since already has them
 * (the demo builds' seeder writes them), so this finds nothing to do there.
 */
export const up: Migration = async () => {
  for (const demo of DEMO_BUILDS.filter((d) => TITLES.includes(d.title))) {
    const owner = await User.findOne({ where: { email: demo.ownerEmail } });
    const build = owner && (await Build.findOne({ where: { ownerId: owner.id, title: demo.title } }));
    if (!build) continue;
    const brakes = await BuildSection.findOne({ where: { buildId: build.id, kind: 'brakes' } });
    if ((brakes?.data as { hydraulics?: unknown } | undefined)?.hydraulics) continue;
    for (const kind of ['chassis', 'brakes'] as const) if (demo.sections[kind]) await saveSection(build, kind, demo.sections[kind]);
    for (const w of demo.weighIns ?? []) {
      const same = await WeighIn.findOne({ where: { buildId: build.id, date: w.date } });
      // The same day's level weigh-in gains its tilted reading; a build without one gets the whole weigh-in.
      if (same && !same.data.tilt) await same.update({ data: { ...same.data, tilt: w.tilt } });
      else if (!same) await applyWeighIn(build, (await addWeighIn(build, w)).id);
    }
  }
};
