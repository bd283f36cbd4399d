import { Build } from '@server/models/build';
import { randomBuildCode } from '@server/services/builds/build-codes';

/** A bare draft build owned by `ownerId`, made straight through the model (no API round trip). */
export async function createBuild(ownerId: number, overrides: Partial<{ title: string; published: boolean }> = {}) {
  return Build.create({
    ownerId,
    code: randomBuildCode(),
    title: overrides.title ?? 'Test build',
    modelYear: null,
    bodyOrigin: null,
    style: null,
    weight: null,
    vin: null,
    plate: null,
    ownerPhone: null,
    ownerAddress: null,
    ...(overrides.published !== undefined ? { published: overrides.published } : {}),
  });
}

/**
 * A build with every public part filled in (sections, credits, story, dyno runs and a weigh-in),
 * plus values in the private fields, made straight through the models. Sections come from the
 * invented build in card-fixtures.ts.
 */
export async function createFullBuild(
  ownerId: number,
  overrides: Partial<{ published: boolean; vin: string; plate: string; ownerPhone: string; ownerAddress: string; title: string; story: string }> = {},
) {
  const { BuildSection } = await import('@server/models/build-section');
  const { DynoRun } = await import('@server/models/dyno-run');
  const { WeighIn } = await import('@server/models/weigh-in');
  const { typicalPublicBuild } = await import('./card-fixtures');
  const sample = typicalPublicBuild();
  const build = await Build.create({
    ownerId,
    code: randomBuildCode(),
    title: overrides.title ?? sample.title,
    modelYear: sample.modelYear,
    bodyOrigin: sample.bodyOrigin,
    style: sample.style,
    story: overrides.story ?? sample.story,
    weight: sample.weight,
    credits: sample.credits,
    published: overrides.published ?? true,
    vin: overrides.vin ?? null,
    plate: overrides.plate ?? null,
    ownerPhone: overrides.ownerPhone ?? null,
    ownerAddress: overrides.ownerAddress ?? null,
  });
  for (const [kind, data] of Object.entries(sample.sections)) {
    await BuildSection.create({ buildId: build.id, kind: kind as never, data: data as Record<string, unknown> });
  }
  for (const run of sample.dynoRuns) await DynoRun.create({ buildId: build.id, date: run.date, data: run });
  await WeighIn.create({
    buildId: build.id,
    date: '2026-03-02',
    data: { date: '2026-03-02', unit: 'kg', leftFront: 402, rightFront: 396, leftRear: 371, rightRear: 380, withDriver: true, fuelLevel: 'half' },
  });
  return build;
}
