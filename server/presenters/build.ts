import type { BuildSummary, DynoRun as DynoRunBody, FigureChange as FigureChangeBody, OwnerBuild, WeighIn as WeighInBody } from '@shared/schemas/build';
import { coverPhotoOf } from '@shared/build-sheet/cover';
import type { SectionKind, Sections } from '@shared/schemas/build-sections';
import { shownFigures } from '@shared/build-sheet/key-figures';
import type { Build } from '../models/build';
import type { DynoRun } from '../models/dyno-run';
import type { WeighIn } from '../models/weigh-in';
import type { FigureChange } from '../models/figure-change';
import type { Actor } from '../policies/actor';
import { buildAbilities, can } from '../policies/build';
import { config } from '../config';
import { presentPhoto } from './photo';

export const publicBuildUrl = (code: string) => `${config.publicBaseUrl}/c/${code}`;

export function sectionsOf(build: Build): Sections {
  return Object.fromEntries((build.sections ?? []).map((s) => [s.kind, s.data])) as Sections;
}

export const presentDynoRun = (run: DynoRun): DynoRunBody => ({ ...run.data, id: run.id, createdAt: run.createdAt.toISOString() });
export const presentWeighIn = (w: WeighIn): WeighInBody => ({ ...w.data, id: w.id, createdAt: w.createdAt.toISOString() });
export const presentFigureChange = (c: FigureChange): FigureChangeBody => ({ id: c.id, path: c.path, before: c.before, after: c.after, changedAt: c.createdAt.toISOString() });

/**
 * The whole build for the editor. The private fields (VIN, plate, phone, address) go only to
 * someone the policy lets see them: the owner now, a show's organisers later.
 */
export function presentOwnerBuild(build: Build, actor: Actor): OwnerBuild {
  const privateFields = can(actor, 'viewPrivate', build)
    ? { private: { vin: build.vin ?? '', plate: build.plate ?? '', ownerPhone: build.ownerPhone ?? '', ownerAddress: build.ownerAddress ?? '' } }
    : {};
  return {
    id: build.id,
    code: build.code,
    published: build.published,
    overview: {
      title: build.title,
      modelYear: build.modelYear,
      bodyOrigin: build.bodyOrigin ?? '',
      style: build.style as OwnerBuild['overview']['style'],
      story: build.story,
      weight: build.weight as OwnerBuild['overview']['weight'],
    },
    ...privateFields,
    sections: sectionsOf(build),
    sectionsUpdatedAt: Object.fromEntries((build.sections ?? []).map((s) => [s.kind, s.updatedAt.toISOString()])) as Partial<Record<SectionKind, string>>,
    credits: build.credits,
    photos: (build.photos ?? []).map(presentPhoto),
    dynoRuns: (build.dynoRuns ?? []).map(presentDynoRun),
    weighIns: (build.weighIns ?? []).map(presentWeighIn),
    history: (build.figureChanges ?? []).map(presentFigureChange),
    publicUrl: publicBuildUrl(build.code),
    updatedAt: build.updatedAt.toISOString(),
    abilities: buildAbilities(actor, build),
  };
}

/** The headline figures of a row in My builds, chosen by the one rule the public page and cards use. */
export function keyFigures(build: Build): BuildSummary['keyFigures'] {
  const { power, weight, displacement } = shownFigures({
    sections: sectionsOf(build),
    weight: build.weight,
    dynoRuns: (build.dynoRuns ?? []).map((r) => r.data),
    weighIns: (build.weighIns ?? []).map((w) => w.data),
  });
  return {
    ...(power ? { power: { ...power.figure, at: power.at ?? 'flywheel' } } : {}),
    ...(weight ? { weight: weight.figure } : {}),
    ...(displacement ? { displacement: displacement.figure } : {}),
  };
}

export function presentBuildSummary(build: Build): BuildSummary {
  const cover = coverPhotoOf(build.photos);
  return {
    id: build.id,
    code: build.code,
    title: build.title,
    modelYear: build.modelYear,
    style: build.style,
    published: build.published,
    cover: cover ? presentPhoto(cover) : null,
    keyFigures: keyFigures(build),
    updatedAt: build.updatedAt.toISOString(),
  };
}
