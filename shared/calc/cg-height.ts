// Centre-of-gravity height from a tilt weigh-in: weigh the car level, raise one axle by H and
// weigh the axle still on the scales again. The weight that moves onto it is the CG's height
// above the wheel centres working through the tilt: h = r + L·ΔW / (W·tan θ), θ = asin(H / L)
// (Milliken & Milliken, "Race Car Vehicle Dynamics", ch. 18, from memory; the same derivation is
// worked step by step in R. Gray's "Finding the height of the center of gravity by tilting").
// Lengths in one unit, weights in one unit; the result is in the length unit.
import { CalcInputError, finiteResult, requirePositive } from './errors';

export interface TiltWeighIn {
  totalWeight: number;
  wheelbase: number;
  /** Loaded wheel centre height (the tyre's loaded radius), with the car level. */
  wheelCentreHeight: number;
  /** How far the raised axle's wheel centres went up. */
  raisedHeight: number;
  /** The axle that stays on the scales, level and then with the other axle raised. */
  lowerAxleWeightLevel: number;
  lowerAxleWeightRaised: number;
}

export interface CgHeightResult {
  cgHeight: number;
  /** Above (+) or below (−) the wheel centres. */
  aboveWheelCentre: number;
  tiltDeg: number;
}

export function cgHeightFromTilt(input: TiltWeighIn): CgHeightResult {
  const w = requirePositive(input.totalWeight, 'totalWeight');
  const l = requirePositive(input.wheelbase, 'wheelbase');
  const r = requirePositive(input.wheelCentreHeight, 'wheelCentreHeight');
  const h = requirePositive(input.raisedHeight, 'raisedHeight');
  const level = requirePositive(input.lowerAxleWeightLevel, 'lowerAxleWeightLevel');
  const raised = requirePositive(input.lowerAxleWeightRaised, 'lowerAxleWeightRaised');
  if (h >= l) throw new CalcInputError('raisedHeight', 'must be smaller than the wheelbase');
  if (level > w) throw new CalcInputError('lowerAxleWeightLevel', 'cannot be more than the total weight');
  if (raised > w) throw new CalcInputError('lowerAxleWeightRaised', 'cannot be more than the total weight');
  const theta = Math.asin(h / l);
  const above = finiteResult((l * (raised - level)) / (w * Math.tan(theta)), 'cgHeight');
  return { cgHeight: finiteResult(r + above, 'cgHeight'), aboveWheelCentre: above, tiltDeg: (theta * 180) / Math.PI };
}
