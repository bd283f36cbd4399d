import { z } from 'zod';
import { tryParseTyreCode } from '../calc/tyres';
import { UNITS, convert, type UnitOf } from '../calc/units';
import { formatNumber } from '../calc/format';
import { boundedNumber, figureSchema, plainMm, shortText, type MmRange } from './figure';
import { text } from './text';

/** Who made a part or a section: the owner, a shop or person, a donor vehicle, or bought new. */
export const MADE_BY_KINDS = ['owner', 'shop', 'donor', 'new'] as const;
export const MadeBySchema = z
  .object({ kind: z.enum(MADE_BY_KINDS, { error: 'Choose who made it.' }), name: shortText('Made by', 120).optional() })
  .superRefine((m, ctx) => {
    if ((m.kind === 'shop' || m.kind === 'donor') && !m.name) ctx.addIssue({ code: 'custom', path: ['name'], message: m.kind === 'shop' ? 'Name the shop or person.' : 'Describe the donor vehicle.' });
  });

const common = { madeBy: MadeBySchema.optional(), note: shortText('Why this choice', 2000).optional() };

// Engine
export const ENGINE_LAYOUTS = ['inline', 'V', 'flat', 'rotary', 'electric'] as const;
export const ASPIRATIONS = ['natural', 'supercharged', 'turbocharged'] as const;
const lengthMm = (label: string, min: number, max: number) => figureSchema('length', { label, min, max, unit: 'mm' });
const rpm = (label: string) => boundedNumber(label, 300, 25_000, { int: true });
const power = (label: string) => figureSchema('power', { label, min: 1, max: 3000, unit: 'kW' });
const torque = (label: string) => figureSchema('torque', { label, min: 1, max: 6000, unit: 'Nm' });

export const EngineSectionSchema = z.object({
  ...common,
  layout: z.enum(ENGINE_LAYOUTS, { error: 'Choose a layout.' }).optional(),
  cylinders: boundedNumber('Cylinders', 1, 16, { int: true }).optional(),
  bore: lengthMm('Bore', 20, 200).optional(),
  stroke: lengthMm('Stroke', 20, 200).optional(),
  displacement: figureSchema('volume', { label: 'Displacement', min: 50, max: 20_000, unit: 'cm3' }).optional(),
  blockMaterial: shortText('Block material', 80).optional(),
  headMaterial: shortText('Head material', 80).optional(),
  aspiration: z.enum(ASPIRATIONS, { error: 'Choose natural, supercharged or turbocharged.' }).optional(),
  superchargerType: shortText('Supercharger type', 120).optional(),
  pulley: shortText('Pulley', 80).optional(),
  turboCount: boundedNumber('Turbo count', 1, 4, { int: true }).optional(),
  boost: figureSchema('pressure', { label: 'Boost', min: 0, max: 6, unit: 'bar' }).optional(),
  fuel: shortText('Fuel', 80).optional(),
  induction: shortText('Induction', 200).optional(),
  ignition: shortText('Ignition', 200).optional(),
  cooling: shortText('Cooling', 200).optional(),
  exhaust: shortText('Exhaust', 200).optional(),
  flywheelPower: power('Flywheel power').optional(),
  flywheelPowerRpm: rpm('Flywheel power rpm').optional(),
  wheelPower: power('Wheel power').optional(),
  wheelPowerRpm: rpm('Wheel power rpm').optional(),
  flywheelTorque: torque('Flywheel torque').optional(),
  flywheelTorqueRpm: rpm('Flywheel torque rpm').optional(),
  wheelTorque: torque('Wheel torque').optional(),
  wheelTorqueRpm: rpm('Wheel torque rpm').optional(),
  revLimit: boundedNumber('Rev limit', 1000, 25_000, { int: true }).optional(),
});

// Drivetrain
export const TRANSMISSION_TYPES = ['manual', 'sequential', 'dog-engagement', 'automatic', 'cvt', 'direct-drive'] as const;
export const LIMITED_SLIP_TYPES = ['open', 'clutch-type', 'gear-type', 'locker', 'spool', 'electronic'] as const;
export const MAX_GEARS = 10;
export const DrivetrainSectionSchema = z.object({
  ...common,
  transmissionType: z.enum(TRANSMISSION_TYPES, { error: 'Choose a transmission type.' }).optional(),
  transmission: shortText('Transmission', 200).optional(),
  gears: z.array(boundedNumber('Gear ratio', 0.3, 8), { error: 'Gear ratios must be a list of numbers.' }).max(MAX_GEARS, { error: `At most ${MAX_GEARS} forward gears.` }).optional(),
  clutch: shortText('Clutch', 200).optional(),
  driveshaft: shortText('Driveshaft', 200).optional(),
  axle: shortText('Rear axle', 200).optional(),
  finalDrive: boundedNumber('Final drive ratio', 1.5, 8).optional(),
  axleSplines: boundedNumber('Axle splines', 10, 50, { int: true }).optional(),
  limitedSlip: z.enum(LIMITED_SLIP_TYPES, { error: 'Choose a differential type.' }).optional(),
  /** The top speed the owner claims; the spec check compares it with what the gearing reaches at the rev limit. */
  topSpeed: figureSchema('speed', { label: 'Top speed', min: 20, max: 600, unit: 'km/h' }).optional(),
  /** A time slip: the spec check compares the elapsed time with what power and weight allow. */
  quarterMileEt: boundedNumber('Quarter-mile elapsed time (seconds)', 4, 30).optional(),
  quarterMileTrap: figureSchema('speed', { label: 'Quarter-mile trap speed', min: 30, max: 500, unit: 'km/h' }).optional(),
});

// Chassis and suspension
export const FRAME_KINDS = ['factory', 'modified', 'custom'] as const;
export const SUSPENSION_TYPES = ['double-wishbone', 'strut', 'beam-axle', 'solid-axle', 'four-link', 'triangulated-four-link', 'ladder-bar', 'leaf', 'independent-rear', 'other'] as const;
export const SPRING_TYPES = ['coil-over', 'coil', 'leaf', 'air', 'torsion', 'transverse-leaf'] as const;
export const TubeSchema = z
  .object({
    use: shortText('Tube use', 80),
    shape: z.enum(['round', 'rectangular'], { error: 'Choose round or rectangular.' }),
    material: shortText('Tube material', 80).optional(),
    outside: lengthMm('Outside diameter or width', 5, 300),
    height: lengthMm('Height', 5, 300).optional(),
    wall: lengthMm('Wall', 0.3, 20),
  })
  .superRefine((t, ctx) => {
    if (t.shape === 'rectangular' && !t.height) ctx.addIssue({ code: 'custom', path: ['height'], message: 'A rectangular tube needs a height.' });
  });

/** The rear four-link's pivots as the owner reads them off the car, side view. */
export const FOUR_LINK_POINTS = {
  upperFront: 'Upper link, front pivot',
  upperRear: 'Upper link, axle pivot',
  lowerFront: 'Lower link, front pivot',
  lowerRear: 'Lower link, axle pivot',
} as const;
export type FourLinkPoint = keyof typeof FOUR_LINK_POINTS;

/** Limits of the plain-millimetre lengths, for the schema and for the editor's messages in inches. */
export const MM_RANGES = {
  linkX: (point: FourLinkPoint): MmRange => ({ label: `${FOUR_LINK_POINTS[point]}: x`, min: -3000, max: 3000 }),
  linkY: (point: FourLinkPoint): MmRange => ({ label: `${FOUR_LINK_POINTS[point]}: y`, min: 0, max: 1500 }),
  cgHeight: { label: 'Centre of gravity height', min: 100, max: 1500 } satisfies MmRange,
  bellCrankSpringArm: { label: 'Bell-crank spring arm', min: 10, max: 500 } satisfies MmRange,
  bellCrankPushrodArm: { label: 'Bell-crank pushrod arm', min: 10, max: 500 } satisfies MmRange,
  pivotX: (point: FrontPivot): MmRange => ({ label: `${FRONT_PIVOTS[point]}: x`, min: 0, max: 1500 }),
  pivotY: (point: FrontPivot): MmRange => ({ label: `${FRONT_PIVOTS[point]}: y`, min: 0, max: 1200 }),
  contactPatchX: { label: 'Tyre contact patch: x (half the track)', min: 300, max: 1300 } satisfies MmRange,
  wheelCentreHeight: { label: 'Loaded wheel centre height', min: 150, max: 700 } satisfies MmRange,
  tiltRaise: { label: 'Height the axle was raised', min: 20, max: 1500 } satisfies MmRange,
  masterBore: { label: 'Master cylinder bore', min: 10, max: 50 } satisfies MmRange,
  rearMasterBore: { label: 'Rear master cylinder bore', min: 10, max: 50 } satisfies MmRange,
  pistonDiameter: (end: 'Front' | 'Rear'): MmRange => ({ label: `${end} caliper piston diameter`, min: 10, max: 90 }),
  /** One box per piston in the editor: piston 1, 2, 3 of one side (opposed) or of the caliper (floating). */
  pistonNumber: (end: 'Front' | 'Rear', n: number): MmRange => ({ label: `${end} piston ${n} diameter`, min: 10, max: 90 }),
  padHeight: (end: 'Front' | 'Rear'): MmRange => ({ label: `${end} pad radial height`, min: 10, max: 120 }),
};

/** The front double wishbone's pivots, front view: x outward from the centreline, y up from the ground. */
export const FRONT_PIVOTS = {
  upperInner: 'Upper arm, inner pivot',
  upperOuter: 'Upper arm, ball joint',
  lowerInner: 'Lower arm, inner pivot',
  lowerOuter: 'Lower arm, ball joint',
} as const;
export type FrontPivot = keyof typeof FRONT_PIVOTS;
const pivotPoint = (point: FrontPivot) => z.object({ x: plainMm(MM_RANGES.pivotX(point)).optional(), y: plainMm(MM_RANGES.pivotY(point)).optional() });
/** Every value optional, as with the four-link: the numbers wait until all of it is there. */
export const FrontGeometrySchema = z.object({
  upperInner: pivotPoint('upperInner').optional(),
  upperOuter: pivotPoint('upperOuter').optional(),
  lowerInner: pivotPoint('lowerInner').optional(),
  lowerOuter: pivotPoint('lowerOuter').optional(),
  contactPatchXMm: plainMm(MM_RANGES.contactPatchX).optional(),
  wheelCentreHeightMm: plainMm(MM_RANGES.wheelCentreHeight).optional(),
});

/** A tilt weigh-in for the centre-of-gravity height: level, then one axle raised. */
export const CgTiltSchema = z.object({
  raisedAxle: z.enum(['front', 'rear'], { error: 'Choose which axle was raised.' }).optional(),
  raisedHeightMm: plainMm(MM_RANGES.tiltRaise).optional(),
  wheelCentreHeightMm: plainMm(MM_RANGES.wheelCentreHeight).optional(),
  unit: z.enum(['kg', 'lb'], { error: 'Unit must be kg or lb.' }).optional(),
  totalWeight: boundedNumber('Total weight', 100, 10_000).optional(),
  lowerAxleLevel: boundedNumber('Axle on the scales, level', 20, 10_000).optional(),
  lowerAxleRaised: boundedNumber('Axle on the scales, other raised', 20, 10_000).optional(),
});

const linkPoint = (point: FourLinkPoint) => z.object({ x: plainMm(MM_RANGES.linkX(point)).optional(), y: plainMm(MM_RANGES.linkY(point)).optional() });
/**
 * Rear four-link side view, in mm: x forward from the axle centre, y up from the ground. Every value
 * is optional, so a four-link filled in over several evenings is stored as it stands and never holds
 * back the rest of the chassis panel; anti-squat is worked out once all of it is there.
 */
export const FourLinkSchema = z.object({
  upperFront: linkPoint('upperFront').optional(),
  upperRear: linkPoint('upperRear').optional(),
  lowerFront: linkPoint('lowerFront').optional(),
  lowerRear: linkPoint('lowerRear').optional(),
  cgHeightMm: plainMm(MM_RANGES.cgHeight).optional(),
});

/** One end's suspension; its messages say which end, since both ends' fields share a panel. */
const suspensionEnd = (end: 'Front' | 'Rear') =>
  z.object({
    type: z.enum(SUSPENSION_TYPES, { error: 'Choose a suspension type.' }).optional(),
    springType: z.enum(SPRING_TYPES, { error: 'Choose a spring type.' }).optional(),
    springRate: figureSchema('springRate', { label: `${end} spring rate`, min: 1, max: 1000, unit: 'N/mm' }).optional(),
    /** Spring travel / wheel travel (see shared/calc/suspension.ts). */
    motionRatio: boundedNumber(`${end} motion ratio`, 0.1, 2).optional(),
    springAngleDeg: boundedNumber(`${end} spring angle`, 0, 60).optional(),
    bellCrankSpringArmMm: plainMm(MM_RANGES.bellCrankSpringArm).optional(),
    bellCrankPushrodArmMm: plainMm(MM_RANGES.bellCrankPushrodArm).optional(),
    cornerSprungMass: figureSchema('mass', { label: `${end} corner sprung mass`, min: 20, max: 2000, unit: 'kg' }).optional(),
    dampers: shortText(`${end} dampers`, 200).optional(),
    antiRollBar: shortText(`${end} anti-roll bar`, 200).optional(),
    description: shortText(`${end} suspension description`, 300).optional(),
    fourLink: FourLinkSchema.optional(),
    geometry: FrontGeometrySchema.optional(),
  });

export const ChassisSectionSchema = z.object({
  ...common,
  frame: z.enum(FRAME_KINDS, { error: 'Choose factory, modified or custom.' }).optional(),
  frameDescription: shortText('Frame', 300).optional(),
  tubes: z.array(TubeSchema).max(12, { error: 'At most 12 tube lines.' }).optional(),
  wheelbase: lengthMm('Wheelbase', 1500, 5000).optional(),
  trackFront: lengthMm('Front track', 900, 2500).optional(),
  trackRear: lengthMm('Rear track', 900, 2500).optional(),
  front: suspensionEnd('Front').optional(),
  rear: suspensionEnd('Rear').optional(),
  cgTilt: CgTiltSchema.optional(),
  /** The owner's choice to show roll centre, camber gain and CG height on the public page. */
  showFigures: z.boolean().optional(),
});

// Brakes
export const BRAKE_TYPES = ['disc', 'drum', 'none'] as const;
export const CALIPER_KINDS = ['opposed', 'floating'] as const;
export const RADIUS_MODELS = ['mean', 'uniform-pressure'] as const;
/** Pistons of one side of an opposed caliper, or of a floating caliper: staggered sizes are common. */
export const MAX_PISTONS_PER_SIDE = 3;
const brakeEnd = (end: 'Front' | 'Rear') => ({
  caliperKind: z.enum(CALIPER_KINDS, { error: 'Choose opposed (fixed) or floating.' }).optional(),
  /** Each piston's diameter: one side of an opposed caliper (the other side mirrors it), or every piston of a floating one. */
  pistonDiametersMm: z
    .array(plainMm(MM_RANGES.pistonDiameter(end)), { error: `${end} piston diameters must be a list of numbers.` })
    .min(1, { error: `Give at least one ${end.toLowerCase()} piston diameter.` })
    .max(MAX_PISTONS_PER_SIDE, { error: `At most ${MAX_PISTONS_PER_SIDE} ${end.toLowerCase()} pistons per side.` })
    .optional(),
  /** Kept from before the per-piston sizes: every piston the same size (read when `pistonDiametersMm` is absent). */
  pistonDiameterMm: plainMm(MM_RANGES.pistonDiameter(end)).optional(),
  padHeightMm: plainMm(MM_RANGES.padHeight(end)).optional(),
  padMu: boundedNumber(`${end} pad friction coefficient`, 0.1, 1).optional(),
});
/** Pedal to master cylinder: what turns the driver's foot into line pressure. */
export const BrakeHydraulicsSchema = z.object({
  pedalRatio: boundedNumber('Pedal ratio', 1.5, 12).optional(),
  pedalForce: figureSchema('force', { label: 'Pedal force', min: 50, max: 2000, unit: 'N' }).optional(),
  boosterAssist: boundedNumber('Booster assist ratio', 1, 10).optional(),
  /** The one master cylinder, or the front one behind a balance bar when a rear bore is given. */
  masterBoreMm: plainMm(MM_RANGES.masterBore).optional(),
  rearMasterBoreMm: plainMm(MM_RANGES.rearMasterBore).optional(),
  balanceFrontPercent: boundedNumber('Balance bar, front share', 20, 80).optional(),
  valveKnee: figureSchema('pressure', { label: 'Proportioning valve knee', min: 1, max: 150, unit: 'bar' }).optional(),
  valveSlope: boundedNumber('Proportioning valve slope', 0.1, 1).optional(),
  radiusModel: z.enum(RADIUS_MODELS, { error: 'Choose mean radius or uniform pressure.' }).optional(),
});
const brakeEndSchema = (end: 'Front' | 'Rear') =>
  z
    .object({
      type: z.enum(BRAKE_TYPES, { error: 'Choose disc, drum or none.' }).optional(),
      rotorDiameter: lengthMm('Rotor or drum diameter', 150, 500).optional(),
      rotorThickness: lengthMm('Rotor thickness', 5, 60).optional(),
      caliperPistons: boundedNumber('Caliper pistons', 1, 12, { int: true }).optional(),
      caliper: shortText('Caliper', 200).optional(),
      pad: shortText('Pads', 120).optional(),
      ...brakeEnd(end),
    })
    .superRefine((b, ctx) => {
      // A pad taller than the rotor's radius would reach past its centre: no effective radius.
      if (b.padHeightMm === undefined || !b.rotorDiameter || !Number.isFinite(b.rotorDiameter.value) || !(b.rotorDiameter.unit in UNITS.length)) return;
      const radius = convert('length', b.rotorDiameter.value, b.rotorDiameter.unit as UnitOf<'length'>, 'mm') / 2;
      if (radius > 0 && b.padHeightMm >= radius) {
        ctx.addIssue({ code: 'custom', path: ['padHeightMm'], message: `${end} pad radial height must be less than the rotor’s radius (${formatNumber(radius, { decimals: 1 })} mm, half its diameter).` });
      }
    });
export const BrakeEndSchema = brakeEndSchema('Front');
export const BrakesSectionSchema = z.object({
  ...common,
  front: brakeEndSchema('Front').optional(),
  rear: brakeEndSchema('Rear').optional(),
  hydraulics: BrakeHydraulicsSchema.optional(),
  /** The owner's choice to show the brake split on the public page. */
  showFigures: z.boolean().optional(),
  masterCylinder: shortText('Master cylinder', 200).optional(),
  booster: shortText('Booster', 200).optional(),
  parkingBrake: shortText('Parking brake', 200).optional(),
});

// Wheels and tyres (staggered front and rear is normal). Rim sizes are quoted in inches by the trade.
export const TyreCodeSchema = text('Tyre size')
  .trim()
  .max(40)
  .superRefine((code, ctx) => {
    const parsed = tryParseTyreCode(code);
    if (!parsed.ok) ctx.addIssue({ code: 'custom', message: `Tyre size "${code}" does not read as a size code: ${parsed.error.reason}.` });
  });
export const WheelEndSchema = z.object({
  rimDiameterIn: boundedNumber('Rim diameter', 10, 30).optional(),
  rimWidthIn: boundedNumber('Rim width', 3, 20).optional(),
  offset: lengthMm('Offset', -150, 150).optional(),
  backspacing: lengthMm('Backspacing', 0, 400).optional(),
  construction: shortText('Wheel construction', 120).optional(),
  tyreSize: TyreCodeSchema.optional(),
  tyre: shortText('Tyre', 120).optional(),
  pressure: figureSchema('pressure', { label: 'Tyre pressure', min: 0.3, max: 8, unit: 'bar' }).optional(),
});
export const WheelsSectionSchema = z.object({
  ...common,
  front: WheelEndSchema.optional(),
  rear: WheelEndSchema.optional(),
  /** A car built with the rear higher or bigger on purpose: the stagger check does not apply. */
  raked: z.boolean().optional(),
});

// Body and interior
export const BodySectionSchema = z.object({
  ...common,
  paint: shortText('Paint', 300).optional(),
  bodyMods: shortText('Body modifications', 600).optional(),
  glass: shortText('Glass', 200).optional(),
  seats: shortText('Seats', 200).optional(),
  gauges: shortText('Gauges', 200).optional(),
  safety: shortText('Safety equipment', 400).optional(),
});

// Free lines for what the form lacks.
export const ExtraSectionSchema = z.object({
  ...common,
  lines: z
    .array(z.object({ label: shortText('Label', 60).min(1, { error: 'A line needs a label.' }), value: shortText('Value', 300).min(1, { error: 'A line needs a value.' }) }))
    .max(30, { error: 'At most 30 extra lines.' })
    .optional(),
});

export const SECTION_KINDS = ['engine', 'drivetrain', 'chassis', 'brakes', 'wheels', 'body', 'extra'] as const;
export type SectionKind = (typeof SECTION_KINDS)[number];
export const SECTION_LABELS: Record<SectionKind, string> = {
  engine: 'Engine',
  drivetrain: 'Drivetrain',
  chassis: 'Chassis and suspension',
  brakes: 'Brakes',
  wheels: 'Wheels and tyres',
  body: 'Body and interior',
  extra: 'Extra lines',
};

export const SECTION_SCHEMAS = {
  engine: EngineSectionSchema,
  drivetrain: DrivetrainSectionSchema,
  chassis: ChassisSectionSchema,
  brakes: BrakesSectionSchema,
  wheels: WheelsSectionSchema,
  body: BodySectionSchema,
  extra: ExtraSectionSchema,
} as const satisfies Record<SectionKind, z.ZodType>;

export type EngineSection = z.infer<typeof EngineSectionSchema>;
export type DrivetrainSection = z.infer<typeof DrivetrainSectionSchema>;
export type ChassisSection = z.infer<typeof ChassisSectionSchema>;
export type BrakesSection = z.infer<typeof BrakesSectionSchema>;
export type WheelsSection = z.infer<typeof WheelsSectionSchema>;
export type BodySection = z.infer<typeof BodySectionSchema>;
export type ExtraSection = z.infer<typeof ExtraSectionSchema>;
export type Sections = {
  engine?: EngineSection;
  drivetrain?: DrivetrainSection;
  chassis?: ChassisSection;
  brakes?: BrakesSection;
  wheels?: WheelsSection;
  body?: BodySection;
  extra?: ExtraSection;
};
export const SectionKindParamSchema = z.object({ kind: z.enum(SECTION_KINDS, { error: `Section must be one of ${SECTION_KINDS.join(', ')}.` }) });
