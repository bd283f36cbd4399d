import type { DynoRunCreateInput, WeighInCreateInput } from '../schemas/build';
import type { EngineSection } from '../schemas/build-sections';
import { weighedTotal } from './key-figures';

/** A dyno run's peaks become the engine's measured power and torque, at the wheels or the flywheel as the run was measured. */
export function engineWithDynoPeaks(engine: EngineSection, run: DynoRunCreateInput): EngineSection {
  const measured = { provenance: 'measured' as const, measuredOn: run.date };
  const power = { value: run.peakPower, unit: run.powerUnit, ...measured };
  const torque = { value: run.peakTorque, unit: run.torqueUnit, ...measured };
  return run.measuredAt === 'wheel'
    ? { ...engine, wheelPower: power, wheelPowerRpm: run.peakPowerRpm, wheelTorque: torque, wheelTorqueRpm: run.peakTorqueRpm }
    : { ...engine, flywheelPower: power, flywheelPowerRpm: run.peakPowerRpm, flywheelTorque: torque, flywheelTorqueRpm: run.peakTorqueRpm };
}

/** A weigh-in's total becomes the build's measured weight. */
export function weightOfWeighIn(w: WeighInCreateInput) {
  return { value: weighedTotal(w), unit: w.unit, provenance: 'measured' as const, measuredOn: w.date };
}

/** Dyno runs and weigh-ins are listed newest first: by date, then the later record of one day first. */
export const newestRecordFirst = (a: { date: string; id: number }, b: { date: string; id: number }) => b.date.localeCompare(a.date) || b.id - a.id;
