import type { Transaction } from 'sequelize';
import type { DynoRunCreateInput, WeighInCreateInput } from '@shared/schemas/build';
import type { EngineSection } from '@shared/schemas/build-sections';
import { engineWithDynoPeaks, weightOfWeighIn } from '@shared/build-sheet/records';
import { BuildSection } from '../../models/build-section';
import { DynoRun } from '../../models/dyno-run';
import { WeighIn } from '../../models/weigh-in';
import type { Build } from '../../models/build';
import { Photo } from '../../models/photo';
import { NotFoundError, ValidationError } from '../../errors';
import { withTransaction } from '../../db/transaction';
import { lockBuild, saveSection, touchBuild, updateOverview } from './builds';

// Each change below is one transaction that starts by locking the build row, so two changes to
// one build (an apply and a delete, two applies) run one after the other, never interleaved.

export async function addDynoRun(build: Build, input: DynoRunCreateInput, outer?: Transaction): Promise<DynoRun> {
  return withTransaction(outer, async (transaction) => {
    const locked = await lockBuild(build.id, transaction);
    // The photo of the printed sheet must be one of this build's own photos, never another owner's.
    if (input.sheetPhotoId !== undefined && !(await Photo.count({ where: { id: input.sheetPhotoId, buildId: build.id }, transaction }))) {
      throw new ValidationError({ sheetPhotoId: 'That photo is not one of this build’s photos.' });
    }
    const run = await DynoRun.create({ buildId: build.id, date: input.date, data: input }, { transaction });
    await touchBuild(locked, transaction);
    return run;
  });
}

export async function addWeighIn(build: Build, input: WeighInCreateInput, outer?: Transaction): Promise<WeighIn> {
  return withTransaction(outer, async (transaction) => {
    const locked = await lockBuild(build.id, transaction);
    const w = await WeighIn.create({ buildId: build.id, date: input.date, data: input }, { transaction });
    await touchBuild(locked, transaction);
    return w;
  });
}

async function findRecord<M extends typeof DynoRun | typeof WeighIn>(model: M, build: Build, id: number, transaction: Transaction) {
  const record = await (model as typeof DynoRun).findOne({ where: { id, buildId: build.id }, lock: transaction.LOCK.UPDATE, transaction });
  if (!record) throw new NotFoundError(model === DynoRun ? 'No such dyno run on this build.' : 'No such weigh-in on this build.');
  return record as unknown as InstanceType<M>;
}

export async function deleteDynoRun(build: Build, id: number, outer?: Transaction): Promise<void> {
  await withTransaction(outer, async (transaction) => {
    const locked = await lockBuild(build.id, transaction);
    await (await findRecord(DynoRun, build, id, transaction)).destroy({ transaction });
    await touchBuild(locked, transaction);
  });
}

export async function deleteWeighIn(build: Build, id: number, outer?: Transaction): Promise<void> {
  await withTransaction(outer, async (transaction) => {
    const locked = await lockBuild(build.id, transaction);
    await (await findRecord(WeighIn, build, id, transaction)).destroy({ transaction });
    await touchBuild(locked, transaction);
  });
}

/** The run's peaks become the engine's measured power and torque (at the wheels or the flywheel, as the dyno measured). */
export async function applyDynoRun(build: Build, id: number, outer?: Transaction): Promise<void> {
  await withTransaction(outer, async (transaction) => {
    const locked = await lockBuild(build.id, transaction);
    const run = (await findRecord(DynoRun, build, id, transaction)).data;
    // Read under the lock, so a section saved meanwhile is merged into, not overwritten.
    const section = await BuildSection.findOne({ where: { buildId: build.id, kind: 'engine' }, lock: transaction.LOCK.UPDATE, transaction });
    const engine = engineWithDynoPeaks({ ...((section?.data ?? {}) as EngineSection) }, run);
    await saveSection(locked, 'engine', engine, transaction);
  });
}

/** The weigh-in's total becomes the build's measured weight. */
export async function applyWeighIn(build: Build, id: number, outer?: Transaction): Promise<void> {
  await withTransaction(outer, async (transaction) => {
    // The locked row carries the weight as it is now, so the figure history records the right "before".
    const locked = await lockBuild(build.id, transaction);
    const w = (await findRecord(WeighIn, build, id, transaction)).data;
    await updateOverview(locked, { weight: weightOfWeighIn(w) }, transaction);
  });
}
