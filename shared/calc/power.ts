// Power-to-weight, weight-to-power, and the flywheel ↔ wheel power estimate.
import { finiteResult, requireFinite, requireFraction, requirePositive } from './errors';
import { convert, type PowerUnit, type Quantity } from './units';

export interface PowerToWeight {
  /** Mechanical hp per metric tonne (1000 kg). */
  hpPerTonne: number;
  /** Metric hp (PS) per metric tonne. */
  psPerTonne: number;
  /** Watts per kilogram, numerically the same as kW per tonne. */
  wPerKg: number;
  /** Pounds per mechanical hp. */
  lbPerHp: number;
  /** Kilograms per kW. */
  kgPerKw: number;
  /** Kilograms per metric hp (PS). */
  kgPerPs: number;
}

export function powerToWeight(power: Quantity<'power'>, mass: Quantity<'mass'>): PowerToWeight {
  requirePositive(power.value, 'power');
  requirePositive(mass.value, 'mass');
  const watts = convert('power', power.value, power.unit, 'W');
  const kg = convert('mass', mass.value, mass.unit, 'kg');
  const hp = convert('power', watts, 'W', 'hp');
  const ps = convert('power', watts, 'W', 'PS');
  const lb = convert('mass', kg, 'kg', 'lb');
  const ratio = (value: number, field: string): number => finiteResult(value, field);
  return {
    hpPerTonne: ratio(hp / (kg / 1000), 'hpPerTonne'),
    psPerTonne: ratio(ps / (kg / 1000), 'psPerTonne'),
    wPerKg: ratio(watts / kg, 'wPerKg'),
    lbPerHp: ratio(lb / hp, 'lbPerHp'),
    kgPerKw: ratio(kg / (watts / 1000), 'kgPerKw'),
    kgPerPs: ratio(kg / ps, 'kgPerPs'),
  };
}

/**
 * Drivetrain loss between flywheel and wheels, as a fraction of flywheel power.
 * Common practice, no formal source: about 15% for a manual rear-drive car, usually 10–20%
 * (more for automatics and four-wheel drive). A dyno figure always beats this estimate.
 */
export const DRIVETRAIN_LOSS = {
  manualRearDrive: 0.15,
  typicalMin: 0.1,
  typicalMax: 0.2,
  basis: 'common practice',
} as const;

export const DRIVETRAIN_LOSS_NOTE =
  'Estimate: drivetrain loss is usually 10–20% and varies with gearbox, axle and dyno; ' +
  'a measured figure is better.';

export interface PowerEstimate<U extends PowerUnit = PowerUnit> {
  value: number;
  unit: U;
  lossFraction: number;
  isEstimate: true;
  note: string;
}

/** whp = fhp × (1 − L). The result is in the unit of the input. */
export function wheelPowerFromFlywheel<U extends PowerUnit>(
  flywheel: { value: number; unit: U },
  lossFraction: number = DRIVETRAIN_LOSS.manualRearDrive,
): PowerEstimate<U> {
  requirePositive(flywheel.value, 'flywheelPower');
  requireFraction(lossFraction, 'lossFraction');
  return estimate(flywheel.value * (1 - lossFraction), flywheel.unit, lossFraction);
}

/** fhp = whp / (1 − L): the loss is a share of flywheel power, so this is not whp × (1 + L). */
export function flywheelPowerFromWheel<U extends PowerUnit>(
  wheel: { value: number; unit: U },
  lossFraction: number = DRIVETRAIN_LOSS.manualRearDrive,
): PowerEstimate<U> {
  requirePositive(wheel.value, 'wheelPower');
  requireFraction(lossFraction, 'lossFraction');
  return estimate(wheel.value / (1 - lossFraction), wheel.unit, lossFraction);
}

/** The loss implied by a flywheel and a wheel figure (e.g. a maker's rating and a dyno pull). */
export function impliedDrivetrainLoss(
  flywheel: Quantity<'power'>,
  wheel: Quantity<'power'>,
): number {
  requirePositive(flywheel.value, 'flywheelPower');
  requireFinite(wheel.value, 'wheelPower');
  const fw = convert('power', flywheel.value, flywheel.unit, 'W');
  const wh = convert('power', wheel.value, wheel.unit, 'W');
  return finiteResult(1 - wh / fw, 'lossFraction');
}

function estimate<U extends PowerUnit>(
  value: number,
  unit: U,
  lossFraction: number,
): PowerEstimate<U> {
  return {
    value: finiteResult(value, 'power'),
    unit,
    lossFraction,
    isEstimate: true,
    note: DRIVETRAIN_LOSS_NOTE,
  };
}
