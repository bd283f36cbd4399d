// The second round of the numbers, read off the build sheet once for every screen: the brake
// chain and split, the front double wishbone in front view, the CG height from a tilt weigh-in and
// the quarter-mile estimate, each as a result, as what is still missing, or as why it cannot be
// worked out. The editor's numbers panel, its diagrams and the public page all read this.
import {
  brakeSystem,
  camberCurve,
  CalcInputError,
  cgHeightFromTilt,
  figureValueIn,
  frontViewCentres,
  quarterMileEstimate,
  type BrakeSystemInput,
  type BrakeSystemResult,
  type CamberCurve,
  type CgHeightResult,
  type FrontGeometryInput,
  type FrontViewCentres,
  type QuarterMileEstimate,
  type QuantityKind,
  type UnitOf,
} from '../calc';
import type { BrakesSection, ChassisSection, Sections } from '../schemas/build-sections';
import type { FigureInput } from '../schemas/figure';
import type { WeighInCreateInput } from '../schemas/build';

/** `refused`: the computation's own field name, and the same in the owner's words (`label`) for the message. */
export type Worked<T> = { status: 'ok'; value: T } | { status: 'missing'; hint: string } | { status: 'refused'; field: string; label: string; reason: string };

// The computations' input names as the owner knows the boxes. Each name is looked up without its
// front./rear. prefix and list index; the end is put back in front ("front pad radial height").
const FIELD_WORDS: Record<string, string> = {
  padHeightMm: 'pad radial height',
  rotorDiameterMm: 'rotor diameter',
  pistonDiametersPerSideMm: 'piston diameter',
  pistonDiametersMm: 'piston diameter',
  padMu: 'pad friction coefficient',
  masterBoreMm: 'master cylinder bore',
  frontMasterBoreMm: 'master cylinder bore',
  rearMasterBoreMm: 'rear master cylinder bore',
  balanceFrontShare: 'balance bar front share',
  valveSlope: 'proportioning valve slope',
  valveKneeBar: 'proportioning valve knee',
  pedalRatio: 'pedal ratio',
  boosterAssist: 'booster assist ratio',
  raisedHeight: 'height the axle was raised',
  wheelbase: 'wheelbase',
  wheelCentreHeight: 'wheel centre height',
  totalWeight: 'total weight',
  lowerAxleWeightLevel: 'axle on the scales, level',
  lowerAxleWeightRaised: 'axle on the scales, tilted',
  upper: 'upper arm',
  lower: 'lower arm',
  'upper.outer': 'upper ball joint',
  'contactPatch.x': 'tyre contact patch',
};

export function fieldWords(field: string): string {
  const m = /^(front|rear)\.(.+)$/.exec(field);
  const end = m ? `${m[1]} ` : '';
  const name = (m ? m[2]! : field).replace(/\[\d+\]$/, '');
  return `${end}${FIELD_WORDS[name] ?? name}`;
}

const refused = (err: unknown): Worked<never> => {
  if (err instanceof CalcInputError) return { status: 'refused', field: err.field, label: fieldWords(err.field), reason: err.reason };
  throw err;
};

function valueIn<K extends QuantityKind>(kind: K, figure: FigureInput | undefined, unit: UnitOf<K>): number | undefined {
  if (!figure || !Number.isFinite(figure.value)) return undefined;
  try {
    return figureValueIn(kind, figure, unit);
  } catch (err) {
    if (err instanceof CalcInputError) return undefined;
    throw err;
  }
}

/** Pedal force used when the owner gives none: about 100 lbf, a firm stop (common practice). */
export const DEFAULT_PEDAL_FORCE_N = 445;

export type BrakeFigures = BrakeSystemResult & { input: BrakeSystemInput; pedalForceAssumed: boolean };

/**
 * Each piston pushing one pad: the per-piston sizes when given (one side of an opposed caliper, or
 * all of a floating one), else the one size kept before them, repeated for the pistons counted
 * (an opposed caliper's count is both sides: half push each pad).
 */
export function pistonDiameters(e: BrakesSection['front']): number[] | undefined {
  if (!e) return undefined;
  // A box the owner is still typing in (empty, or not a number yet) is not a piston.
  const sizes = (e.pistonDiametersMm ?? []).filter((d) => typeof d === 'number' && Number.isFinite(d));
  if (sizes.length) return sizes;
  if (!e.pistonDiameterMm || !e.caliperKind) return undefined;
  const count = e.caliperPistons ?? (e.caliperKind === 'opposed' ? 2 : 1);
  const perSide = e.caliperKind === 'opposed' ? Math.max(1, Math.floor(count / 2)) : count;
  return Array.from({ length: perSide }, () => e.pistonDiameterMm as number);
}

export function brakeFigures(brakes: BrakesSection | undefined): Worked<BrakeFigures> {
  const h = brakes?.hydraulics;
  const end = (e: BrakesSection['front']) => {
    const rotor = valueIn('length', e?.rotorDiameter, 'mm');
    const diameters = pistonDiameters(e);
    if (!e?.caliperKind || !diameters || !e.padHeightMm || !e.padMu || rotor === undefined) return undefined;
    return {
      caliper: e.caliperKind === 'opposed' ? { kind: 'opposed' as const, pistonDiametersPerSideMm: diameters } : { kind: 'floating' as const, pistonDiametersMm: diameters },
      padMu: e.padMu,
      rotorDiameterMm: rotor,
      padHeightMm: e.padHeightMm,
    };
  };
  const front = end(brakes?.front);
  const rear = end(brakes?.rear);
  if (!h?.pedalRatio || !h.masterBoreMm || !front || !rear) {
    return { status: 'missing', hint: 'Enter the pedal ratio, the master cylinder bore and, for each axle, the caliper kind, piston diameters, pad height, pad friction and rotor diameter for the brake split.' };
  }
  const pedalForce = valueIn('force', h.pedalForce, 'N');
  const knee = valueIn('pressure', h.valveKnee, 'bar');
  const input: BrakeSystemInput = {
    pedalForceN: pedalForce ?? DEFAULT_PEDAL_FORCE_N,
    pedalRatio: h.pedalRatio,
    boosterAssist: h.boosterAssist,
    master: h.rearMasterBoreMm ? { kind: 'dual', frontBoreMm: h.masterBoreMm, rearBoreMm: h.rearMasterBoreMm, frontShare: (h.balanceFrontPercent ?? 50) / 100 } : { kind: 'single', boreMm: h.masterBoreMm },
    ...(knee !== undefined && h.valveSlope ? { valve: { kneeBar: knee, slope: h.valveSlope } } : {}),
    front,
    rear,
    radiusModel: h.radiusModel,
  };
  try {
    return { status: 'ok', value: { ...brakeSystem(input), input, pedalForceAssumed: pedalForce === undefined } };
  } catch (err) {
    return refused(err);
  }
}

export type FrontGeometryFigures = { input: FrontGeometryInput; centres: FrontViewCentres; curve: CamberCurve; wheelCentreHeightMm?: number };

export function frontGeometryFigures(chassis: ChassisSection | undefined): Worked<FrontGeometryFigures> {
  const g = chassis?.front?.geometry;
  const point = (p?: { x?: number; y?: number }) => (p?.x !== undefined && p.y !== undefined ? { x: p.x, y: p.y } : undefined);
  const [upperInner, upperOuter, lowerInner, lowerOuter] = [g?.upperInner, g?.upperOuter, g?.lowerInner, g?.lowerOuter].map(point);
  if (!upperInner || !upperOuter || !lowerInner || !lowerOuter || g?.contactPatchXMm === undefined) {
    return { status: 'missing', hint: 'Enter the four front pivot points and the contact patch for the roll centre and camber curve.' };
  }
  const input: FrontGeometryInput = { upper: { inner: upperInner, outer: upperOuter }, lower: { inner: lowerInner, outer: lowerOuter }, contactPatch: { x: g.contactPatchXMm, y: 0 } };
  try {
    return { status: 'ok', value: { input, centres: frontViewCentres(input), curve: camberCurve(input), wheelCentreHeightMm: g.wheelCentreHeightMm } };
  } catch (err) {
    return refused(err);
  }
}

export type CgFigures = CgHeightResult & { unit: 'mm'; from: { kind: 'weigh-in'; date: string } | { kind: 'chassis' } };

type TiltedWeighIn = Pick<WeighInCreateInput, 'date' | 'leftFront' | 'rightFront' | 'leftRear' | 'rightRear' | 'tilt'>;

/**
 * The CG height from the newest weigh-in with a tilted reading (the weigh-ins panel), or else from
 * the tilt figures an earlier version kept in the chassis section. The wheelbase is the chassis's.
 */
export function cgHeightFigures(chassis: ChassisSection | undefined, weighIns: readonly TiltedWeighIn[] = []): Worked<CgFigures> {
  const wheelbase = valueIn('length', chassis?.wheelbase, 'mm');
  const tilted = [...weighIns].filter((w) => w.tilt).sort((a, b) => (a.date < b.date ? 1 : a.date > b.date ? -1 : 0))[0];
  const t = chassis?.cgTilt;
  const missing = { status: 'missing' as const, hint: 'Enter the wheelbase (Chassis) and a weigh-in with a tilted reading (Weigh-ins: one axle raised, the other axle’s scales read again) for the CG height.' };
  if (wheelbase === undefined) return missing;
  try {
    if (tilted?.tilt) {
      const w = tilted;
      const tilt = tilted.tilt;
      const total = w.leftFront + w.rightFront + w.leftRear + w.rightRear;
      const level = tilt.raisedAxle === 'front' ? w.leftRear + w.rightRear : w.leftFront + w.rightFront;
      const r = cgHeightFromTilt({ totalWeight: total, wheelbase, wheelCentreHeight: tilt.wheelCentreHeightMm, raisedHeight: tilt.raisedHeightMm, lowerAxleWeightLevel: level, lowerAxleWeightRaised: tilt.leftRaised + tilt.rightRaised });
      return { status: 'ok', value: { ...r, unit: 'mm', from: { kind: 'weigh-in', date: w.date } } };
    }
    if (!t?.raisedHeightMm || !t.wheelCentreHeightMm || !t.totalWeight || !t.lowerAxleLevel || !t.lowerAxleRaised) return missing;
    const r = cgHeightFromTilt({ totalWeight: t.totalWeight, wheelbase, wheelCentreHeight: t.wheelCentreHeightMm, raisedHeight: t.raisedHeightMm, lowerAxleWeightLevel: t.lowerAxleLevel, lowerAxleWeightRaised: t.lowerAxleRaised });
    return { status: 'ok', value: { ...r, unit: 'mm', from: { kind: 'chassis' } } };
  } catch (err) {
    return refused(err);
  }
}

export function quarterMileFigures(sections: Sections, weight: FigureInput | null | undefined): Worked<QuarterMileEstimate & { at: 'flywheel' | 'wheel' }> {
  const engine = sections.engine;
  const flywheel = valueIn('power', engine?.flywheelPower, 'kW');
  const wheel = valueIn('power', engine?.wheelPower, 'kW');
  const kg = valueIn('mass', weight ?? undefined, 'kg');
  const kw = flywheel ?? wheel;
  if (kw === undefined || kg === undefined) return { status: 'missing', hint: 'Enter the power and the car’s weight for a quarter-mile estimate.' };
  try {
    return { status: 'ok', value: { ...quarterMileEstimate({ power: { value: kw, unit: 'kW' }, weight: { value: kg, unit: 'kg' } }), at: flywheel !== undefined ? 'flywheel' : 'wheel' } };
  } catch (err) {
    return refused(err);
  }
}
