// Backspacing and frontspacing from rim width and offset (ET).
// Rim width is measured between the bead seats; the flanges add about 1/2 in each side, so the
// overall width is taken as width + 1 in (common practice). Offset is from the rim centreline to
// the hub face, positive towards the outside (the usual ET sign).
import { finiteResult, requireFinite, requireNonNegative, requirePositive } from './errors';
import { UNITS } from './units';

/** Added to the nominal rim width for the two bead flanges (common practice). */
export const FLANGE_ALLOWANCE_IN = 1;

export const WHEEL_SPACING_NOTE =
  'Calculated with the usual +1 in for the bead flanges; a measured backspacing is more exact.';

export interface WheelSpacingInput {
  rimWidthIn: number;
  /** ET, in millimetres, positive towards the outside of the car. */
  offsetMm: number;
  /** When given, this measured figure overrides the calculated backspacing. */
  measuredBackspacingIn?: number;
}

export interface WheelSpacing {
  backspacingIn: number;
  frontspacingIn: number;
  backspacingMm: number;
  frontspacingMm: number;
  /** Rim width plus the flange allowance. */
  overallWidthIn: number;
  /** Offset as calculated, or as implied by the measured backspacing. */
  offsetMm: number;
  source: 'calculated' | 'measured';
  note: string;
}

export function wheelSpacing(input: WheelSpacingInput): WheelSpacing {
  const rimWidthIn = requirePositive(input.rimWidthIn, 'rimWidthIn');
  const overallWidthIn = rimWidthIn + FLANGE_ALLOWANCE_IN;
  const measured = input.measuredBackspacingIn;
  let backspacingIn: number;
  let offsetMm: number;
  let source: WheelSpacing['source'];
  if (measured !== undefined) {
    backspacingIn = requireNonNegative(measured, 'measuredBackspacingIn');
    offsetMm = offsetFromBackspacing({ rimWidthIn, backspacingIn });
    source = 'measured';
  } else {
    offsetMm = requireFinite(input.offsetMm, 'offsetMm');
    backspacingIn = overallWidthIn / 2 + offsetMm / UNITS.length.in;
    source = 'calculated';
  }
  // Negative frontspacing is physically impossible; it is returned so a spec check can flag it.
  const frontspacingIn = overallWidthIn - backspacingIn;
  const mmPerIn = UNITS.length.in;
  return {
    backspacingIn: finiteResult(backspacingIn, 'backspacingIn'),
    frontspacingIn: finiteResult(frontspacingIn, 'frontspacingIn'),
    backspacingMm: finiteResult(backspacingIn * mmPerIn, 'backspacingMm'),
    frontspacingMm: finiteResult(frontspacingIn * mmPerIn, 'frontspacingMm'),
    overallWidthIn: finiteResult(overallWidthIn, 'overallWidthIn'),
    offsetMm,
    source,
    note: source === 'measured' ? 'Backspacing as measured.' : WHEEL_SPACING_NOTE,
  };
}

/** ET from a measured backspacing: the inverse of BS = (width + 1 in)/2 + ET. */
export function offsetFromBackspacing(input: {
  rimWidthIn: number;
  backspacingIn: number;
}): number {
  const rimWidthIn = requirePositive(input.rimWidthIn, 'rimWidthIn');
  const backspacingIn = requireNonNegative(input.backspacingIn, 'backspacingIn');
  const overall = rimWidthIn + FLANGE_ALLOWANCE_IN;
  return finiteResult((backspacingIn - overall / 2) * UNITS.length.in, 'offsetMm');
}
