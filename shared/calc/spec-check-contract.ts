// The spec check's input and output. Plain TypeScript on purpose: the build-sheet schema maps
// onto SpecCheckInput, and the warnings go to the editor and the server alike.
import type { Figure } from './figure';

export type SpecSection = 'engine' | 'drivetrain' | 'wheels' | 'chassis' | 'brakes' | 'performance';

export const SPEC_SECTIONS: readonly SpecSection[] = [
  'engine',
  'drivetrain',
  'wheels',
  'chassis',
  'brakes',
  'performance',
];

export type SpecWarningCode =
  | 'displacement_mismatch'
  | 'wheel_power_above_flywheel'
  | 'top_speed_beyond_gearing'
  | 'tyre_diameter_mismatch'
  | 'negative_frontspacing'
  | 'measured_without_date'
  | 'power_to_weight_implausible'
  | 'tyre_code_unreadable'
  | 'figure_unreadable'
  | 'brake_split_outside_window'
  | 'master_cylinder_too_small'
  | 'master_cylinder_too_large'
  | 'roll_centre_below_ground'
  | 'roll_centre_above_wheel_centre'
  | 'camber_gain_wrong_sign'
  | 'quarter_mile_beyond_power'
  | 'quarter_mile_trap_beyond_power';

export interface SpecWarning {
  code: SpecWarningCode;
  section: SpecSection;
  /** Dotted path into SpecCheckInput, e.g. "wheels.rear.tyre" or "drivetrain.gearRatios.2". */
  field: string;
  message: string;
  why: string;
}

export interface WheelEndInput {
  tyre?: string;
  rimWidth?: Figure;
  offset?: Figure;
  /** When present it overrides the backspacing worked out from the offset. */
  backspacing?: Figure;
}

export interface SpecCheckInput {
  engine?: {
    bore?: Figure;
    stroke?: Figure;
    cylinders?: number;
    displacement?: Figure;
    flywheelPower?: Figure;
    wheelPower?: Figure;
    torque?: Figure;
    revLimitRpm?: number;
  };
  drivetrain?: {
    gearRatios?: number[];
    finalDrive?: number;
    /** Which tyres the gearing turns; rear when not given. */
    drivenAxle?: 'front' | 'rear' | 'both';
  };
  wheels?: {
    front?: WheelEndInput;
    rear?: WheelEndInput;
    /** A deliberate rake: a smaller tyre in front is then intended, not a mismatch. */
    raked?: boolean;
  };
  chassis?: { weight?: Figure };
  performance?: { topSpeed?: Figure };
}

export interface SpecCheckOptions {
  /** Allowed gap between stated and computed displacement, as a fraction. */
  displacementTolerance?: number;
  /** Allowed front/rear tyre diameter difference (relative to the smaller) on an unraked car. */
  tyreDiameterTolerance?: number;
  /** Allowance above the gearing's top speed, for rounding of the claim. */
  topSpeedTolerance?: number;
  /** Plausible power-to-weight, in mechanical hp per tonne. */
  hpPerTonneRange?: { min: number; max: number };
}

// 1% on displacement is our rule for a typo rather than rounding. The rest is common practice:
// ~3% front/rear is beyond tread wear and size-series variation; 10–3000 hp per tonne spans an
// early economy car to a very serious drag car.
export const SPEC_CHECK_DEFAULTS: Required<SpecCheckOptions> = {
  displacementTolerance: 0.01,
  tyreDiameterTolerance: 0.03,
  topSpeedTolerance: 0.01,
  hpPerTonneRange: { min: 10, max: 3000 },
};
