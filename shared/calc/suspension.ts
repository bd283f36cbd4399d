// Spring rate → wheel rate through the linkage, and the corner's ride frequency.
//
// Convention: motion ratio MR = spring travel ÷ wheel travel (≤ 1 for most street suspensions).
// Some texts use the inverse, an "installation ratio" of wheel ÷ spring travel: invert it.
// Wheel rate = spring rate × MR² × cos²θ: MR once for the force lever, once for the travel.
import { CalcInputError, finiteResult, requireFinite, requirePositive } from './errors';
import { convert, type Quantity } from './units';

export function motionRatioFromTravel(input: {
  springTravel: number;
  wheelTravel: number;
}): number {
  const spring = requirePositive(input.springTravel, 'springTravel');
  const wheel = requirePositive(input.wheelTravel, 'wheelTravel');
  return finiteResult(spring / wheel, 'motionRatio');
}

/**
 * Pushrod and bell-crank: MR = MR_pushrod × r_spring / r_pushrod, where MR_pushrod is pushrod
 * travel ÷ wheel travel and the radii are from the bell-crank pivot to each pickup point.
 */
export function bellCrankMotionRatio(input: {
  pushrodMotionRatio: number;
  springArmLength: number;
  pushrodArmLength: number;
}): number {
  const pushrod = requirePositive(input.pushrodMotionRatio, 'pushrodMotionRatio');
  const springArm = requirePositive(input.springArmLength, 'springArmLength');
  const pushrodArm = requirePositive(input.pushrodArmLength, 'pushrodArmLength');
  return finiteResult((pushrod * springArm) / pushrodArm, 'motionRatio');
}

export interface WheelRateInput {
  /** Any rate unit; the wheel rate comes back in the same unit. */
  springRate: number;
  motionRatio: number;
  /** The spring's angle from the line of wheel travel, in degrees; 0 when straight along it. */
  springAngleDeg?: number;
}

export function wheelRate({ springRate, motionRatio, springAngleDeg = 0 }: WheelRateInput): number {
  requirePositive(springRate, 'springRate');
  requirePositive(motionRatio, 'motionRatio');
  const cos = angleCosine(springAngleDeg);
  return finiteResult(springRate * motionRatio ** 2 * cos ** 2, 'wheelRate');
}

/** The inverse: the spring rate that gives a wanted wheel rate. */
export function springRateForWheelRate(input: {
  wheelRate: number;
  motionRatio: number;
  springAngleDeg?: number;
}): number {
  requirePositive(input.wheelRate, 'wheelRate');
  requirePositive(input.motionRatio, 'motionRatio');
  const cos = angleCosine(input.springAngleDeg ?? 0);
  return finiteResult(input.wheelRate / (input.motionRatio ** 2 * cos ** 2), 'springRate');
}

/** f = (1/2π)·√(k/m): k the wheel rate, m the corner's sprung mass (worked in SI). */
export function rideFrequencyHz(input: {
  wheelRate: Quantity<'springRate'>;
  cornerSprungMass: Quantity<'mass'>;
}): number {
  requirePositive(input.wheelRate.value, 'wheelRate');
  requirePositive(input.cornerSprungMass.value, 'cornerSprungMass');
  const kNPerM = convert('springRate', input.wheelRate.value, input.wheelRate.unit, 'N/m');
  const massKg = convert('mass', input.cornerSprungMass.value, input.cornerSprungMass.unit, 'kg');
  return finiteResult(Math.sqrt(kNPerM / massKg) / (2 * Math.PI), 'rideFrequencyHz');
}

export interface RideFrequencyBand {
  id: 'soft' | 'street' | 'sporty' | 'race' | 'very-stiff';
  label: string;
  /** Inclusive lower bound. */
  minHz: number;
  /** Exclusive upper bound. */
  maxHz: number;
}

// Common practice, no formal source: about 1 Hz for a street car, 2–2.5 Hz for a race car that
// has no downforce to carry; cars with real aero run higher still.
export const RIDE_FREQUENCY_BANDS: readonly RideFrequencyBand[] = [
  { id: 'soft', label: 'soft, comfort first', minHz: 0, maxHz: 1 },
  { id: 'street', label: 'street car', minHz: 1, maxHz: 1.5 },
  { id: 'sporty', label: 'firm street or track-day car', minHz: 1.5, maxHz: 2 },
  { id: 'race', label: 'race car without aero', minHz: 2, maxHz: 2.5 },
  {
    id: 'very-stiff',
    label: 'stiffer than usual without downforce',
    minHz: 2.5,
    maxHz: Number.MAX_VALUE,
  },
];

export function rideFrequencyBand(hz: number): RideFrequencyBand {
  requirePositive(hz, 'rideFrequencyHz');
  const band = RIDE_FREQUENCY_BANDS.find((b) => hz >= b.minHz && hz < b.maxHz);
  // The bands cover (0, MAX_VALUE), so a finite positive figure always lands in one.
  return band ?? (RIDE_FREQUENCY_BANDS[RIDE_FREQUENCY_BANDS.length - 1] as RideFrequencyBand);
}

function angleCosine(angleDeg: number): number {
  requireFinite(angleDeg, 'springAngleDeg');
  if (Math.abs(angleDeg) >= 90) {
    throw new CalcInputError('springAngleDeg', 'must be under 90° from the line of wheel travel');
  }
  return Math.cos((angleDeg * Math.PI) / 180);
}
