import { describe, expect, it } from 'vitest';
import '@server/models/index';
import { sequelize } from '@server/db/sequelize';
import { FigureChange } from '@server/models/figure-change';
import { WeighIn } from '@server/models/weigh-in';
import { DynoRun } from '@server/models/dyno-run';
import { BuildSection } from '@server/models/build-section';
import { findBuild, saveSection, updateOverview } from '@server/services/builds/builds';
import { addDynoRun, addWeighIn, applyDynoRun, applyWeighIn, deleteWeighIn } from '@server/services/builds/build-records';
import type { WeighInCreateInput } from '@shared/schemas/build';
import { createUser } from '../../support/factories';
import { createBuild } from '../../support/build-factory';

const scales = (date: string, corner: number): WeighInCreateInput => ({ date, unit: 'kg', leftFront: corner, rightFront: corner, leftRear: corner, rightRear: corner, withDriver: false, fuelLevel: 'half' });

async function buildWeighing(kg: number) {
  const { user } = await createUser();
  const build = await createBuild(user.id);
  await updateOverview(build, { weight: { value: kg, unit: 'kg', provenance: 'estimated' } });
  return build;
}

describe('dyno runs and weigh-ins change the build in one transaction', () => {
  it('takes the caller’s transaction: adding and applying a weigh-in inside one that rolls back leaves nothing behind', async () => {
    const build = await buildWeighing(1500);
    await expect(
      sequelize.transaction(async (t) => {
        const w = await addWeighIn(build, scales('2026-05-01', 400), t);
        await applyWeighIn(build, w.id, t);
        throw new Error('the caller changes its mind');
      }),
    ).rejects.toThrow('the caller changes its mind');
    expect(await WeighIn.count({ where: { buildId: build.id } })).toBe(0);
    expect((await findBuild(build.id)).weight).toEqual({ value: 1500, unit: 'kg', provenance: 'estimated' });
    expect(await FigureChange.count({ where: { buildId: build.id } })).toBe(0);
  });

  it('applies two weigh-ins at once one after the other: each history line starts where the other ended', async () => {
    const build = await buildWeighing(1500);
    const a = await addWeighIn(build, scales('2026-05-01', 400));
    const b = await addWeighIn(build, scales('2026-05-02', 410));
    // Both with the same stale instance, as two requests would load it.
    await Promise.all([applyWeighIn(build, a.id), applyWeighIn(build, b.id)]);
    const history = await FigureChange.findAll({ where: { buildId: build.id, path: 'overview.weight' }, order: [['id', 'ASC']] });
    expect(history.map((h) => h.before.value)).toHaveLength(2);
    expect(history[0]!.before).toEqual({ value: 1500, unit: 'kg', provenance: 'estimated' });
    // Without the lock both would say "before: 1500 est." and one measurement would vanish from the history.
    expect(history[1]!.before).toEqual(history[0]!.after);
    const final = (await findBuild(build.id)).weight;
    expect(final).toEqual(history[1]!.after);
  });

  it('adds and applies a dyno run in the caller’s transaction too: a rollback keeps the engine as the owner left it', async () => {
    const { user } = await createUser();
    const build = await createBuild(user.id);
    await saveSection(build, 'engine', { cylinders: 8, fuel: 'E85', flywheelPower: { value: 400, unit: 'hp', provenance: 'estimated' } });
    await expect(
      sequelize.transaction(async (t) => {
        const run = await addDynoRun(build, { date: '2026-05-03', standard: 'SAE J1349', measuredAt: 'flywheel', powerUnit: 'hp', torqueUnit: 'lbft', peakPower: 412, peakPowerRpm: 6100, peakTorque: 390, peakTorqueRpm: 4300, curve: [] }, t);
        await applyDynoRun(build, run.id, t);
        // Inside the transaction the run is applied…
        expect((await BuildSection.findOne({ where: { buildId: build.id, kind: 'engine' }, transaction: t }))!.data.flywheelPower).toMatchObject({ value: 412, provenance: 'measured' });
        throw new Error('rolled back');
      }),
    ).rejects.toThrow('rolled back');
    // …and after the rollback, none of it is.
    expect((await BuildSection.findOne({ where: { buildId: build.id, kind: 'engine' } }))!.data).toEqual({ cylinders: 8, fuel: 'E85', flywheelPower: { value: 400, unit: 'hp', provenance: 'estimated' } });
    expect(await DynoRun.count({ where: { buildId: build.id } })).toBe(0);
    expect(await FigureChange.count({ where: { buildId: build.id } })).toBe(0);
  });

  it('deletes a weigh-in only with its transaction, and says so when it is already gone', async () => {
    const build = await buildWeighing(1500);
    const w = await addWeighIn(build, scales('2026-05-01', 400));
    await expect(
      sequelize.transaction(async (t) => {
        await deleteWeighIn(build, w.id, t);
        throw new Error('rolled back');
      }),
    ).rejects.toThrow('rolled back');
    expect(await WeighIn.count({ where: { buildId: build.id } })).toBe(1);
    await deleteWeighIn(build, w.id);
    expect(await WeighIn.count({ where: { buildId: build.id } })).toBe(0);
    await expect(deleteWeighIn(build, w.id)).rejects.toThrow('No such weigh-in on this build.');
  });
});
