// The hydraulic brake chain, pedal to wheel: line pressure, clamp force, effective radius, torque
// per wheel and the front/rear torque split. Units are in the names: N, mm, bar, N·m.
//
// Pressure = pushrod force ÷ master cylinder bore area (Pascal); clamp force = pressure × the
// piston area pushing one pad; torque = 2·μ·F·r_eff, two pad faces on the rotor (Limpert, "Brake
// Design and Safety", ch. 3; Puhn, "Brake Handbook": both from memory).
import { CalcInputError, finiteResult, requireFinite, requirePositive } from './errors';

/** Pushrod force = pedal force × pedal ratio × booster assist (1 with no booster). */
export function pushrodForceN(input: { pedalForceN: number; pedalRatio: number; boosterAssist?: number }): number {
  const force = requirePositive(input.pedalForceN, 'pedalForceN');
  const ratio = requirePositive(input.pedalRatio, 'pedalRatio');
  const assist = requirePositive(input.boosterAssist ?? 1, 'boosterAssist');
  if (assist < 1) throw new CalcInputError('boosterAssist', 'must be 1 (no booster) or more');
  return finiteResult(force * ratio * assist, 'pushrodForceN');
}

export const circleAreaMm2 = (diameterMm: number, field: string) => {
  const d = requirePositive(diameterMm, field);
  return finiteResult((Math.PI * d * d) / 4, field);
};

/** One master cylinder for both axles, or one each behind a balance bar. */
export type MasterCylinders =
  | { kind: 'single'; boreMm: number }
  /** `frontShare`: the share of the pushrod force the balance bar sends to the front cylinder (0.5 centred). */
  | { kind: 'dual'; frontBoreMm: number; rearBoreMm: number; frontShare: number };

/** Line pressure in bar (1 N/mm² = 10 bar) for each axle, before any proportioning valve. */
export function linePressureBar(pushrodN: number, master: MasterCylinders): { front: number; rear: number } {
  requirePositive(pushrodN, 'pushrodForceN');
  if (master.kind === 'single') {
    const p = (pushrodN / circleAreaMm2(master.boreMm, 'masterBoreMm')) * 10;
    return { front: finiteResult(p, 'linePressure'), rear: finiteResult(p, 'linePressure') };
  }
  const share = requireFinite(master.frontShare, 'balanceFrontShare');
  if (share <= 0 || share >= 1) throw new CalcInputError('balanceFrontShare', 'must be between 0 and 1 (0.5 is centred)');
  // The balance bar splits the force, not the pressure: each cylinder turns its share into pressure.
  return {
    front: finiteResult(((pushrodN * share) / circleAreaMm2(master.frontBoreMm, 'frontMasterBoreMm')) * 10, 'linePressure'),
    rear: finiteResult(((pushrodN * (1 - share)) / circleAreaMm2(master.rearBoreMm, 'rearMasterBoreMm')) * 10, 'linePressure'),
  };
}

/** A proportioning valve passes pressure up to its knee, then only `slope` of each further bar. */
export interface ProportioningValve {
  kneeBar: number;
  /** 0 < slope ≤ 1; often quoted as a ratio such as 0.43 or 0.57. */
  slope: number;
}

export function proportionedPressureBar(inletBar: number, valve: ProportioningValve): number {
  const p = requireFinite(inletBar, 'linePressure');
  const knee = requirePositive(valve.kneeBar, 'valveKneeBar');
  const slope = requirePositive(valve.slope, 'valveSlope');
  if (slope > 1) throw new CalcInputError('valveSlope', 'must be at most 1: a valve only reduces pressure');
  return p <= knee ? p : knee + slope * (p - knee);
}

/**
 * Fixed (opposed) calipers push each pad with their own pistons: the clamp force is the pressure
 * on one side's pistons. A floating caliper pushes one pad with its pistons and pulls the other
 * with the reaction through its frame: the same force on both pads.
 */
export type Caliper = { kind: 'opposed'; pistonDiametersPerSideMm: number[] } | { kind: 'floating'; pistonDiametersMm: number[] };

export function caliperPistonAreaMm2(caliper: Caliper): { clampArea: number; displacedArea: number } {
  const diameters = caliper.kind === 'opposed' ? caliper.pistonDiametersPerSideMm : caliper.pistonDiametersMm;
  const field = caliper.kind === 'opposed' ? 'pistonDiametersPerSideMm' : 'pistonDiametersMm';
  if (!diameters.length) throw new CalcInputError(field, 'needs at least one piston');
  const oneSide = diameters.reduce((sum, d, i) => sum + circleAreaMm2(d, `${field}[${i}]`), 0);
  // Fluid moves into every piston: both sides of an opposed caliper, one side of a floating one.
  return { clampArea: oneSide, displacedArea: caliper.kind === 'opposed' ? 2 * oneSide : oneSide };
}

export function clampForceN(linePressureBarValue: number, caliper: Caliper): number {
  const p = requireFinite(linePressureBarValue, 'linePressure');
  if (p < 0) throw new CalcInputError('linePressure', 'must not be negative');
  return finiteResult((p / 10) * caliperPistonAreaMm2(caliper).clampArea, 'clampForceN');
}

/**
 * Where the pad's friction acts. `mean`: (ro + ri) / 2, the uniform-wear result and the default
 * (a pad bedded in wears evenly, and it is the lower, cautious figure; Shigley, "Mechanical
 * Engineering Design", disc brakes, from memory). `uniform-pressure`: 2/3·(ro³ − ri³)/(ro² − ri²),
 * for a new pad pressed evenly.
 */
export type EffectiveRadiusModel = 'mean' | 'uniform-pressure';
export const DEFAULT_EFFECTIVE_RADIUS_MODEL: EffectiveRadiusModel = 'mean';

export function effectiveRadiusMm(input: { rotorDiameterMm: number; padHeightMm: number; model?: EffectiveRadiusModel }): number {
  const ro = requirePositive(input.rotorDiameterMm, 'rotorDiameterMm') / 2;
  const pad = requirePositive(input.padHeightMm, 'padHeightMm');
  if (pad >= ro) throw new CalcInputError('padHeightMm', 'must be less than the rotor’s radius (half its diameter)');
  const ri = ro - pad;
  if ((input.model ?? DEFAULT_EFFECTIVE_RADIUS_MODEL) === 'mean') return (ro + ri) / 2;
  return finiteResult(((2 / 3) * (ro ** 3 - ri ** 3)) / (ro ** 2 - ri ** 2), 'effectiveRadiusMm');
}

/** Torque at one wheel: two pad faces, each μ·F at r_eff. */
export function brakeTorqueNm(input: { padMu: number; clampForceN: number; effectiveRadiusMm: number }): number {
  const mu = requirePositive(input.padMu, 'padMu');
  if (mu > 2) throw new CalcInputError('padMu', 'must be at most 2 (street pads are about 0.3 to 0.5)');
  const f = requireFinite(input.clampForceN, 'clampForceN');
  if (f < 0) throw new CalcInputError('clampForceN', 'must not be negative');
  const r = requirePositive(input.effectiveRadiusMm, 'effectiveRadiusMm');
  return finiteResult((2 * mu * f * r) / 1000, 'brakeTorqueNm');
}

export interface AxleBrake {
  caliper: Caliper;
  padMu: number;
  rotorDiameterMm: number;
  padHeightMm: number;
}

export interface BrakeSystemInput {
  pedalForceN: number;
  pedalRatio: number;
  boosterAssist?: number;
  master: MasterCylinders;
  valve?: ProportioningValve;
  front: AxleBrake;
  rear: AxleBrake;
  radiusModel?: EffectiveRadiusModel;
}

export interface AxleBrakeResult {
  linePressureBar: number;
  clampForceN: number;
  effectiveRadiusMm: number;
  torquePerWheelNm: number;
}

export interface BrakeSystemResult {
  pushrodForceN: number;
  radiusModel: EffectiveRadiusModel;
  front: AxleBrakeResult;
  rear: AxleBrakeResult;
  /** Share of the total brake torque at the front axle; front + rear = 100. */
  frontPercent: number;
  rearPercent: number;
}

export function brakeSystem(input: BrakeSystemInput): BrakeSystemResult {
  const pushrod = pushrodForceN(input);
  const pressure = linePressureBar(pushrod, input.master);
  const rearPressure = input.valve ? proportionedPressureBar(pressure.rear, input.valve) : pressure.rear;
  const model = input.radiusModel ?? DEFAULT_EFFECTIVE_RADIUS_MODEL;
  const axle = (a: AxleBrake, p: number, end: 'front' | 'rear'): AxleBrakeResult => {
    const prefix = (e: unknown) => {
      if (e instanceof CalcInputError) throw new CalcInputError(`${end}.${e.field}`, e.reason);
      throw e;
    };
    try {
      const clamp = clampForceN(p, a.caliper);
      const r = effectiveRadiusMm({ rotorDiameterMm: a.rotorDiameterMm, padHeightMm: a.padHeightMm, model });
      return { linePressureBar: p, clampForceN: clamp, effectiveRadiusMm: r, torquePerWheelNm: brakeTorqueNm({ padMu: a.padMu, clampForceN: clamp, effectiveRadiusMm: r }) };
    } catch (e) {
      return prefix(e);
    }
  };
  const front = axle(input.front, pressure.front, 'front');
  const rear = axle(input.rear, rearPressure, 'rear');
  const total = front.torquePerWheelNm + rear.torquePerWheelNm;
  const frontPercent = finiteResult((front.torquePerWheelNm / total) * 100, 'frontPercent');
  return { pushrodForceN: pushrod, radiusModel: model, front, rear, frontPercent, rearPercent: 100 - frontPercent };
}

/**
 * Master cylinder travel that moves every caliper piston on its circuits by 1 mm (both wheels of
 * each axle): wheel piston area ÷ master bore area. Pedal travel is this × the pedal ratio.
 */
export function masterTravelPerMmOfPistonTravel(input: { master: MasterCylinders; front: Caliper; rear: Caliper }): number {
  const displaced = (c: Caliper) => 2 * caliperPistonAreaMm2(c).displacedArea;
  const m = input.master;
  if (m.kind === 'single') {
    return finiteResult((displaced(input.front) + displaced(input.rear)) / circleAreaMm2(m.boreMm, 'masterBoreMm'), 'masterTravel');
  }
  // Two cylinders side by side on a balance bar move about together: the longer stroke sets the pedal.
  return finiteResult(
    Math.max(displaced(input.front) / circleAreaMm2(m.frontBoreMm, 'frontMasterBoreMm'), displaced(input.rear) / circleAreaMm2(m.rearBoreMm, 'rearMasterBoreMm')),
    'masterTravel',
  );
}
