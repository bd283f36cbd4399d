import { Op, type Transaction } from 'sequelize';
import { newestRecordFirst } from '@shared/build-sheet/records';
import type { BuildCreateInput, BuildPrivate, BuildUpdateInput, Credit } from '@shared/schemas/build';
import { SECTION_SCHEMAS, type SectionKind } from '@shared/schemas/build-sections';
import { withTransaction } from '../../db/transaction';
import { Build } from '../../models/build';
import { BuildSection } from '../../models/build-section';
import { Photo } from '../../models/photo';
import { DynoRun } from '../../models/dyno-run';
import { WeighIn } from '../../models/weigh-in';
import { FigureChange } from '../../models/figure-change';
import { RetiredBuildCode } from '../../models/retired-build-code';
import { User } from '../../models/user';
import { NotFoundError, ValidationError } from '../../errors';
import { newBuildCode } from './build-codes';
import { figuresByPath, recordFigureChanges } from './figure-history';

/** Everything the owner's editor and the public presenters read, in display order; of the owner only the display name (and whether a site admin disabled the account). */
export const FULL_BUILD_INCLUDE = [
  { model: User, as: 'owner', attributes: ['id', 'name', 'disabledAt'] },
  { model: BuildSection, as: 'sections' },
  { model: Photo, as: 'photos' },
  { model: DynoRun, as: 'dynoRuns' },
  { model: WeighIn, as: 'weighIns' },
  { model: FigureChange, as: 'figureChanges' },
];

/** Marks the build as changed (the public page's cache and ETag follow updatedAt). */
export async function touchBuild(build: Build, transaction?: Transaction): Promise<void> {
  build.changed('updatedAt', true);
  await build.save({ transaction });
}

export async function findBuild(id: number, transaction?: Transaction): Promise<Build> {
  const build = await Build.findByPk(id, { transaction });
  if (!build) throw new NotFoundError('No such build.');
  return build;
}

/** The build row locked for this transaction: its changes (records, sections, photos) run one at a time. */
export async function lockBuild(id: number, transaction: Transaction): Promise<Build> {
  const build = await Build.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE });
  if (!build) throw new NotFoundError('No such build.');
  return build;
}

/** The build with its owner's name, sections, photos, dyno runs, weigh-ins and figure history. */
export async function loadFullBuild(where: { id: number } | { code: string }, transaction?: Transaction): Promise<Build | null> {
  const build = await Build.findOne({ where, include: FULL_BUILD_INCLUDE, transaction });
  if (!build) return null;
  build.photos?.sort((a, b) => a.position - b.position || a.id - b.id);
  build.dynoRuns?.sort(newestRecordFirst);
  build.weighIns?.sort(newestRecordFirst);
  build.figureChanges?.sort((a, b) => b.createdAt.getTime() - a.createdAt.getTime() || b.id - a.id);
  return build;
}

export async function loadFullBuildOrThrow(id: number, transaction?: Transaction): Promise<Build> {
  const build = await loadFullBuild({ id }, transaction);
  if (!build) throw new NotFoundError('No such build.');
  return build;
}

export const listBuildsOf = (owner: User) =>
  Build.findAll({
    where: { ownerId: owner.id },
    // Dyno runs and weigh-ins too: a measured figure beats the owner's estimate on every screen.
    include: [{ model: BuildSection, as: 'sections' }, { model: Photo, as: 'photos' }, { model: DynoRun, as: 'dynoRuns' }, { model: WeighIn, as: 'weighIns' }],
    order: [['updatedAt', 'DESC'], ['id', 'DESC'], [{ model: DynoRun, as: 'dynoRuns' }, 'id', 'DESC'], [{ model: WeighIn, as: 'weighIns' }, 'id', 'DESC']],
  });

export async function createBuild(owner: User, input: BuildCreateInput, outer?: Transaction): Promise<Build> {
  return withTransaction(outer, async (transaction) => {
    const code = await newBuildCode(transaction);
    return Build.create(
      {
        ownerId: owner.id,
        code,
        title: input.title,
        modelYear: input.modelYear ?? null,
        bodyOrigin: input.bodyOrigin || null,
        style: input.style ?? null,
        weight: null,
        vin: null,
        plate: null,
        ownerPhone: null,
        ownerAddress: null,
      },
      { transaction },
    );
  });
}

export async function updateOverview(build: Build, input: BuildUpdateInput, outer?: Transaction): Promise<void> {
  await withTransaction(outer, async (transaction) => {
    if (input.weight) await checkEvidencePhotos(build.id, '', { weight: input.weight }, transaction);
    if (input.weight !== undefined) await recordFigureChanges(build.id, 'overview', { weight: build.weight }, { weight: input.weight }, transaction);
    await build.update(
      {
        ...(input.title !== undefined ? { title: input.title } : {}),
        ...(input.modelYear !== undefined ? { modelYear: input.modelYear } : {}),
        ...(input.bodyOrigin !== undefined ? { bodyOrigin: input.bodyOrigin || null } : {}),
        ...(input.style !== undefined ? { style: input.style } : {}),
        ...(input.story !== undefined ? { story: input.story } : {}),
        ...(input.weight !== undefined ? { weight: input.weight } : {}),
      },
      { transaction },
    );
  });
}

/** A measured figure's evidence photo, wherever it sits (lists included), must be one of this build's own photos. */
async function checkEvidencePhotos(buildId: number, prefix: string, data: unknown, transaction?: Transaction): Promise<void> {
  const wanted = [...figuresByPath(data, '', { lists: true })].filter(([, f]) => f.evidencePhotoId !== undefined);
  if (!wanted.length) return;
  const ids = [...new Set(wanted.map(([, f]) => f.evidencePhotoId!))];
  const found = new Set((await Photo.findAll({ where: { id: { [Op.in]: ids }, buildId }, attributes: ['id'], transaction })).map((p) => p.id));
  const fields = Object.fromEntries(
    wanted.filter(([, f]) => !found.has(f.evidencePhotoId!)).map(([path]) => [`${prefix ? `${prefix}.` : ''}${path}.evidencePhotoId`, 'That photo is not one of this build’s photos.']),
  );
  if (Object.keys(fields).length) throw new ValidationError(fields);
}

/** Saves one section whole (replacing its previous content), keeping the history of its figures. */
export async function saveSection(build: Build, kind: SectionKind, data: unknown, outer?: Transaction): Promise<void> {
  const parsed = SECTION_SCHEMAS[kind].parse(data) as Record<string, unknown>;
  await withTransaction(outer, async (transaction) => {
    await checkEvidencePhotos(build.id, '', parsed, transaction);
    const existing = await BuildSection.findOne({ where: { buildId: build.id, kind }, lock: transaction.LOCK.UPDATE, transaction });
    await recordFigureChanges(build.id, kind, existing?.data ?? {}, parsed, transaction);
    if (existing) await existing.update({ data: parsed }, { transaction });
    else await BuildSection.create({ buildId: build.id, kind, data: parsed }, { transaction });
    await touchBuild(build, transaction);
  });
}

export async function savePrivate(build: Build, input: BuildPrivate, transaction?: Transaction): Promise<void> {
  await build.update({ vin: input.vin || null, plate: input.plate || null, ownerPhone: input.ownerPhone || null, ownerAddress: input.ownerAddress || null }, { transaction });
}

export async function saveCredits(build: Build, credits: Credit[], transaction?: Transaction): Promise<void> {
  await build.update({ credits }, { transaction });
}

export async function setPublished(build: Build, published: boolean, transaction?: Transaction): Promise<void> {
  await build.update({ published }, { transaction });
}

/**
 * Deletes the build and everything under it; its code is retired so an old card never opens another car.
 * The photo files are the caller's to delete, once the transaction has committed. Whether entries
 * forbid it is the command's question (`commands/delete-build.ts`), asked in the same transaction.
 */
export async function deleteBuildIn(build: Build, transaction: Transaction): Promise<{ photoKeys: string[] }> {
  const photos = await Photo.findAll({ where: { buildId: build.id }, transaction });
  await RetiredBuildCode.create({ code: build.code }, { transaction });
  await build.destroy({ transaction });
  return { photoKeys: photos.map((p) => p.storageKey) };
}
