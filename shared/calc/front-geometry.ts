// Double wishbone, front view, one side (the right-hand wheel): x outward from the car's
// centreline, y up from the ground, every length in mm. The upright is a rigid body carried by
// the two arms' outer pivots; the contact patch is taken as fixed to it (Milliken & Milliken,
// "Race Car Vehicle Dynamics", ch. 17: front-view geometry; from memory).
//
// Signs: bump is the wheel rising towards the body (+), droop falling (−). Camber is negative when
// the top of the tyre leans in towards the car. Track change is for both wheels moving together.
import { CalcInputError, finiteResult, requireFinite } from './errors';
import type { Point } from './four-link';

export interface Arm {
  inner: Point;
  outer: Point;
}

export interface FrontGeometryInput {
  upper: Arm;
  lower: Arm;
  contactPatch: Point;
}

export type FrontViewCentres =
  | {
      kind: 'instant-centre';
      instantCentre: Point;
      /** Horizontal distance from the contact patch in to the instant centre (negative when it lies outboard). */
      swingArmLengthMm: number;
      /** Where the line from the contact patch through the instant centre crosses the centreline; null when it cannot. */
      rollCentreHeightMm: number | null;
      reason?: string;
    }
  | {
      // Parallel arms meet at infinity: the wheel moves as if on an endless swing arm.
      kind: 'parallel';
      instantCentre: null;
      swingArmLengthMm: 'infinite';
      rollCentreHeightMm: number | null;
      reason: string;
    };

const PARALLEL_SINE = 1e-9;

function checkedPoint(p: Point, field: string): Point {
  return { x: requireFinite(p.x, `${field}.x`), y: requireFinite(p.y, `${field}.y`) };
}

function checkedArm(arm: Arm, field: 'upper' | 'lower') {
  const inner = checkedPoint(arm.inner, `${field}.inner`);
  const outer = checkedPoint(arm.outer, `${field}.outer`);
  const length = Math.hypot(outer.x - inner.x, outer.y - inner.y);
  if (length === 0) throw new CalcInputError(field, 'its inner and outer pivots are the same point');
  return { inner, outer, length };
}

/** Instant centre, swing-arm length and roll-centre height at ride height. */
export function frontViewCentres(input: FrontGeometryInput): FrontViewCentres {
  const upper = checkedArm(input.upper, 'upper');
  const lower = checkedArm(input.lower, 'lower');
  const cp = checkedPoint(input.contactPatch, 'contactPatch');
  if (cp.x <= 0) throw new CalcInputError('contactPatch.x', 'must be outboard of the centreline (greater than zero)');
  const u = { x: upper.outer.x - upper.inner.x, y: upper.outer.y - upper.inner.y };
  const l = { x: lower.outer.x - lower.inner.x, y: lower.outer.y - lower.inner.y };
  const cross = u.x * l.y - u.y * l.x;
  if (Math.abs(cross) <= PARALLEL_SINE * upper.length * lower.length) {
    // The roll-centre line then runs from the contact patch parallel to the arms.
    const rc = Math.abs(l.x) <= PARALLEL_SINE * lower.length ? null : finiteResult(cp.y - (l.y / l.x) * cp.x, 'rollCentreHeightMm');
    return { kind: 'parallel', instantCentre: null, swingArmLengthMm: 'infinite', rollCentreHeightMm: rc, reason: 'The arms are parallel in front view, so they have no instant centre: the swing arm is infinitely long.' };
  }
  const ox = lower.inner.x - upper.inner.x;
  const oy = lower.inner.y - upper.inner.y;
  const t = (ox * l.y - oy * l.x) / cross;
  const ic = { x: finiteResult(upper.inner.x + t * u.x, 'instantCentre.x'), y: finiteResult(upper.inner.y + t * u.y, 'instantCentre.y') };
  const swing = cp.x - ic.x;
  if (Math.abs(swing) <= PARALLEL_SINE * cp.x) {
    return { kind: 'instant-centre', instantCentre: ic, swingArmLengthMm: 0, rollCentreHeightMm: null, reason: 'The instant centre is straight above the contact patch, so there is no roll-centre line.' };
  }
  const rc = finiteResult(cp.y + ((ic.y - cp.y) * (0 - cp.x)) / (ic.x - cp.x), 'rollCentreHeightMm');
  return { kind: 'instant-centre', instantCentre: ic, swingArmLengthMm: swing, rollCentreHeightMm: rc };
}

export interface TravelStep {
  travelMm: number;
  /** Change from ride height; negative = top of the tyre in. */
  camberChangeDeg: number;
  /** Both wheels together: 2 × the contact patch's sideways move; positive = wider. */
  trackChangeMm: number;
}

export interface CamberCurve {
  steps: TravelStep[];
  /** Camber change over the first 25 mm of bump, read from the curve; null when the linkage does not reach it. */
  camberGainPer25MmBumpDeg: number | null;
  /** Set when the linkage cannot reach part of the travel: the curve stops there. */
  stoppedAt?: { travelMm: number; reason: string };
}

export interface TravelRange {
  droopMm?: number;
  bumpMm?: number;
  stepMm?: number;
}

type Pose = { lowerOuter: Point; upperOuter: Point; contactPatch: Point; uprightAngle: number };

/**
 * Solves the four-bar (chassis, lower arm, upright, upper arm) at each step of wheel travel, from
 * full droop to full bump. The lower arm's angle is the unknown; for each angle the upper ball
 * joint is where the upper arm's circle meets the upright's circle (the branch nearest the last
 * pose), and the step's travel is the contact patch's rise. Exact, with no small-angle rule.
 */
export function camberCurve(input: FrontGeometryInput, range: TravelRange = {}): CamberCurve {
  const upper = checkedArm(input.upper, 'upper');
  const lower = checkedArm(input.lower, 'lower');
  const cp0 = checkedPoint(input.contactPatch, 'contactPatch');
  const droop = requireFinite(range.droopMm ?? 50, 'droopMm');
  const bump = requireFinite(range.bumpMm ?? 50, 'bumpMm');
  const step = requireFinite(range.stepMm ?? 5, 'stepMm');
  if (droop < 0 || bump < 0) throw new CalcInputError(droop < 0 ? 'droopMm' : 'bumpMm', 'must not be negative');
  if (step <= 0 || (droop + bump) / step > 400) throw new CalcInputError('stepMm', 'must be greater than zero and give at most 400 steps');
  const upright = Math.hypot(upper.outer.x - lower.outer.x, upper.outer.y - lower.outer.y);
  if (upright === 0) throw new CalcInputError('upper.outer', 'the two ball joints are the same point');
  const angle0 = Math.atan2(upper.outer.y - lower.outer.y, upper.outer.x - lower.outer.x);
  const phi0 = Math.atan2(lower.outer.y - lower.inner.y, lower.outer.x - lower.inner.x);
  const rel = { x: cp0.x - lower.outer.x, y: cp0.y - lower.outer.y };

  const poseAt = (phi: number, near: Point): Pose | null => {
    const lo = { x: lower.inner.x + lower.length * Math.cos(phi), y: lower.inner.y + lower.length * Math.sin(phi) };
    const uo = circleMeet(upper.inner, upper.length, lo, upright, near);
    if (!uo) return null;
    const a = Math.atan2(uo.y - lo.y, uo.x - lo.x) - angle0;
    const c = Math.cos(a);
    const s = Math.sin(a);
    return { lowerOuter: lo, upperOuter: uo, uprightAngle: a, contactPatch: { x: lo.x + c * rel.x - s * rel.y, y: lo.y + s * rel.x + c * rel.y } };
  };
  const start = poseAt(phi0, upper.outer);
  if (!start) throw new CalcInputError('upper', 'the arms do not join at ride height: check the pivot points');

  const solveTravel = (target: number, from: { phi: number; pose: Pose }) => {
    // Newton's method on the lower arm angle, from the neighbouring step's solution.
    let phi = from.phi;
    let pose: Pose | null = from.pose;
    for (let i = 0; i < 50 && pose; i++) {
      const err = pose.contactPatch.y - cp0.y - target;
      if (Math.abs(err) < 1e-9) return { phi, pose };
      const h = 1e-7;
      const ahead = poseAt(phi + h, pose.upperOuter);
      if (!ahead) return null;
      const slope = (ahead.contactPatch.y - pose.contactPatch.y) / h;
      if (Math.abs(slope) < 1e-9) return null;
      let next = phi - err / slope;
      // Keep each move small, so the solver stays on the same branch of the linkage.
      const maxMove = 0.05;
      if (Math.abs(next - phi) > maxMove) next = phi + Math.sign(next - phi) * maxMove;
      const nextPose = poseAt(next, pose.upperOuter);
      if (!nextPose) return null;
      phi = next;
      pose = nextPose;
    }
    return pose && Math.abs(pose.contactPatch.y - cp0.y - target) < 1e-6 ? { phi, pose } : null;
  };

  const toStep = (travel: number, pose: Pose): TravelStep => ({
    travelMm: travel,
    // A counter-clockwise turn of the right-hand upright tips its top inward: negative camber.
    camberChangeDeg: finiteResult((-pose.uprightAngle * 180) / Math.PI, 'camberChangeDeg'),
    trackChangeMm: finiteResult(2 * (pose.contactPatch.x - cp0.x), 'trackChangeMm'),
  });

  const march = (direction: 1 | -1, limit: number) => {
    const out: TravelStep[] = [];
    let at = { phi: phi0, pose: start };
    const count = Math.floor(limit / step + 1e-9);
    for (let i = 1; i <= count; i++) {
      const travel = direction * i * step;
      const solved = solveTravel(travel, at);
      if (!solved) return { steps: out, stoppedAt: { travelMm: travel, reason: `The linkage cannot reach ${Math.abs(travel)} mm of ${direction > 0 ? 'bump' : 'droop'}: the curve stops there.` } };
      at = solved;
      out.push(toStep(travel, solved.pose));
    }
    return { steps: out, stoppedAt: undefined };
  };
  const up = march(1, bump);
  const down = march(-1, droop);
  const steps = [...down.steps.reverse(), toStep(0, start), ...up.steps];
  const stoppedAt = down.stoppedAt ?? up.stoppedAt;
  const gain = (() => {
    const at25 = solveTravel(25, { phi: phi0, pose: start });
    if (!at25 || (up.stoppedAt && up.stoppedAt.travelMm <= 25)) return null;
    return finiteResult((-at25.pose.uprightAngle * 180) / Math.PI, 'camberGain');
  })();
  return { steps, camberGainPer25MmBumpDeg: gain, ...(stoppedAt ? { stoppedAt } : {}) };
}

/** Where a circle round `a` (radius ra) meets one round `b` (radius rb): the meeting point nearest `near`, or null. */
function circleMeet(a: Point, ra: number, b: Point, rb: number, near: Point): Point | null {
  const dx = b.x - a.x;
  const dy = b.y - a.y;
  const d = Math.hypot(dx, dy);
  if (d === 0 || d > ra + rb || d < Math.abs(ra - rb)) return null;
  const along = (ra * ra - rb * rb + d * d) / (2 * d);
  const h = Math.sqrt(Math.max(0, ra * ra - along * along));
  const mx = a.x + (along * dx) / d;
  const my = a.y + (along * dy) / d;
  const p1 = { x: mx + (h * dy) / d, y: my - (h * dx) / d };
  const p2 = { x: mx - (h * dy) / d, y: my + (h * dx) / d };
  return Math.hypot(p1.x - near.x, p1.y - near.y) <= Math.hypot(p2.x - near.x, p2.y - near.y) ? p1 : p2;
}
