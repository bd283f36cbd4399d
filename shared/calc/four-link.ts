// Rear four-link, side view: the instant centre (IC) is where the upper and lower link lines
// meet; anti-squat % = (IC height ÷ IC distance ahead of axle) ÷ (CG height ÷ wheelbase) × 100
// (Herb Adams, "Chassis Engineering"). That is the height at the front axle of the line from the
// rear contact patch through the IC, as a share of the CG height.
//
// Coordinates: x forward from the rear axle centre, y up from the ground, all lengths in one unit.
import { CalcInputError, finiteResult, requireFinite, requirePositive } from './errors';

export interface Point {
  x: number;
  y: number;
}

/** One link in side view, by its two pivot points. */
export interface LinkLine {
  chassisEnd: Point;
  axleEnd: Point;
}

export interface FourLinkInput {
  upperLink: LinkLine;
  lowerLink: LinkLine;
  wheelbase: number;
  cgHeight: number;
}

export type FourLinkResult =
  | {
      kind: 'instant-centre';
      instantCentre: Point;
      antiSquatPercent: number;
      /** Height of the anti-squat line where it crosses the front axle. */
      antiSquatLineHeightAtFrontAxle: number;
    }
  | {
      // Parallel links meet at infinity, so there is no instant centre. The anti-squat line then
      // runs parallel to the links, which is the limit of the formula as the IC moves away.
      kind: 'parallel';
      instantCentre: null;
      antiSquatPercent: number | null;
      antiSquatLineHeightAtFrontAxle: number | null;
      reason: string;
    }
  | {
      kind: 'instant-centre-over-axle';
      instantCentre: Point;
      antiSquatPercent: null;
      antiSquatLineHeightAtFrontAxle: null;
      reason: string;
    };

// Lines closer to parallel than this (as the sine of the angle between them) count as parallel:
// beyond it the IC would be so far away that its coordinates mean nothing.
const PARALLEL_SINE = 1e-9;

export function fourLinkAntiSquat(input: FourLinkInput): FourLinkResult {
  const wheelbase = requirePositive(input.wheelbase, 'wheelbase');
  const cgHeight = requirePositive(input.cgHeight, 'cgHeight');
  const upper = direction(input.upperLink, 'upperLink');
  const lower = direction(input.lowerLink, 'lowerLink');

  const cross = upper.dx * lower.dy - upper.dy * lower.dx;
  if (Math.abs(cross) <= PARALLEL_SINE * upper.length * lower.length) {
    const reason = 'The links are parallel in side view, so they have no instant centre.';
    if (Math.abs(lower.dx) <= PARALLEL_SINE * lower.length) {
      return noIc(reason + ' They are also vertical, so anti-squat is undefined.');
    }
    const slope = lower.dy / lower.dx;
    return {
      kind: 'parallel',
      instantCentre: null,
      antiSquatPercent: finiteResult(((slope * wheelbase) / cgHeight) * 100, 'antiSquatPercent'),
      antiSquatLineHeightAtFrontAxle: finiteResult(slope * wheelbase, 'antiSquatLine'),
      reason,
    };
  }

  // Solve upper.start + t·upper.d = lower.start + s·lower.d for t.
  const ox = lower.start.x - upper.start.x;
  const oy = lower.start.y - upper.start.y;
  const t = (ox * lower.dy - oy * lower.dx) / cross;
  const instantCentre = {
    x: finiteResult(upper.start.x + t * upper.dx, 'instantCentre.x'),
    y: finiteResult(upper.start.y + t * upper.dy, 'instantCentre.y'),
  };
  if (Math.abs(instantCentre.x) <= PARALLEL_SINE * wheelbase) {
    return {
      kind: 'instant-centre-over-axle',
      instantCentre,
      antiSquatPercent: null,
      antiSquatLineHeightAtFrontAxle: null,
      reason: 'The instant centre is straight above the axle, so the anti-squat line is vertical.',
    };
  }
  const lineHeight = (instantCentre.y / instantCentre.x) * wheelbase;
  return {
    kind: 'instant-centre',
    instantCentre,
    antiSquatPercent: finiteResult((lineHeight / cgHeight) * 100, 'antiSquatPercent'),
    antiSquatLineHeightAtFrontAxle: finiteResult(lineHeight, 'antiSquatLine'),
  };
}

function noIc(reason: string): FourLinkResult {
  return {
    kind: 'parallel',
    instantCentre: null,
    antiSquatPercent: null,
    antiSquatLineHeightAtFrontAxle: null,
    reason,
  };
}

function direction(link: LinkLine, field: string) {
  const start = {
    x: requireFinite(link.axleEnd.x, `${field}.axleEnd.x`),
    y: requireFinite(link.axleEnd.y, `${field}.axleEnd.y`),
  };
  const dx = requireFinite(link.chassisEnd.x, `${field}.chassisEnd.x`) - start.x;
  const dy = requireFinite(link.chassisEnd.y, `${field}.chassisEnd.y`) - start.y;
  const length = finiteResult(Math.hypot(dx, dy), field);
  if (length === 0) throw new CalcInputError(field, 'its two ends are the same point');
  return { start, dx, dy, length };
}
