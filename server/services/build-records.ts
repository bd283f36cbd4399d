import type { DynoRunCreateInput, WeighInCreateInput } from '@shared/schemas/build';
import type { EngineSection } from '@shared/schemas/build-sections';
import { BuildSection } from '../models/build-section';
import { DynoRun } from '../models/dyno-run';
import { WeighIn } from '../models/weigh-in';
import type { Build } from '../models/build';
import { Photo } from '../models/photo';
import { NotFoundError, ValidationError } from '../errors';
import { saveSection, touchBuild, updateOverview } from './builds';

export async function addDynoRun(build: Build, input: DynoRunCreateInput): Promise<DynoRun> {
  // The photo of the printed sheet must be one of this build's own photos, never another owner's.
  if (input.sheetPhotoId !== undefined && !(await Photo.count({ where: { id: input.sheetPhotoId, buildId: build.id } }))) {
    throw new ValidationError({ sheetPhotoId: 'That photo is not one of this build’s photos.' });
  }
  const run = await DynoRun.create({ buildId: build.id, date: input.date, data: input });
  await touchBuild(build);
  return run;
}

export async function addWeighIn(build: Build, input: WeighInCreateInput): Promise<WeighIn> {
  const w = await WeighIn.create({ buildId: build.id, date: input.date, data: input });
  await touchBuild(build);
  return w;
}

async function findRecord<M extends typeof DynoRun | typeof WeighIn>(model: M, build: Build, id: number) {
  const record = await (model as typeof DynoRun).findOne({ where: { id, buildId: build.id } });
  if (!record) throw new NotFoundError(model === DynoRun ? 'No such dyno run on this build.' : 'No such weigh-in on this build.');
  return record as unknown as InstanceType<M>;
}

export async function deleteDynoRun(build: Build, id: number): Promise<void> {
  await (await findRecord(DynoRun, build, id)).destroy();
  await touchBuild(build);
}

export async function deleteWeighIn(build: Build, id: number): Promise<void> {
  await (await findRecord(WeighIn, build, id)).destroy();
  await touchBuild(build);
}

/** The run's peaks become the engine's measured power and torque (at the wheels or the flywheel, as the dyno measured). */
export async function applyDynoRun(build: Build, id: number): Promise<void> {
  const run = (await findRecord(DynoRun, build, id)).data;
  const section = await BuildSection.findOne({ where: { buildId: build.id, kind: 'engine' } });
  const engine = { ...((section?.data ?? {}) as EngineSection) };
  const measured = { provenance: 'measured' as const, measuredOn: run.date };
  if (run.measuredAt === 'wheel') {
    engine.wheelPower = { value: run.peakPower, unit: run.powerUnit, ...measured };
    engine.wheelPowerRpm = run.peakPowerRpm;
    engine.wheelTorque = { value: run.peakTorque, unit: run.torqueUnit, ...measured };
    engine.wheelTorqueRpm = run.peakTorqueRpm;
  } else {
    engine.flywheelPower = { value: run.peakPower, unit: run.powerUnit, ...measured };
    engine.flywheelPowerRpm = run.peakPowerRpm;
    engine.flywheelTorque = { value: run.peakTorque, unit: run.torqueUnit, ...measured };
    engine.flywheelTorqueRpm = run.peakTorqueRpm;
  }
  await saveSection(build, 'engine', engine);
}

/** The weigh-in's total becomes the build's measured weight. */
export async function applyWeighIn(build: Build, id: number): Promise<void> {
  const w = (await findRecord(WeighIn, build, id)).data;
  const total = Math.round((w.leftFront + w.rightFront + w.leftRear + w.rightRear) * 10) / 10;
  await updateOverview(build, { weight: { value: total, unit: w.unit, provenance: 'measured', measuredOn: w.date } });
}
