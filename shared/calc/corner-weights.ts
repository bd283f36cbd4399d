// Corner weights from four scale readings, all in one mass unit (results in that unit).
// Cross weight is the share on the right-front/left-rear diagonal: (RF + LR) ÷ total.
import { CalcInputError, finiteResult, requireNonNegative } from './errors';

export interface CornerScales {
  leftFront: number;
  rightFront: number;
  leftRear: number;
  rightRear: number;
}

export interface CornerWeights {
  total: number;
  front: number;
  rear: number;
  left: number;
  right: number;
  frontPercent: number;
  rearPercent: number;
  leftPercent: number;
  rightPercent: number;
  /** (RF + LR) ÷ total × 100; 50% is a car that is square on its diagonals. */
  crossPercent: number;
}

export function cornerWeights(scales: CornerScales): CornerWeights {
  const lf = requireNonNegative(scales.leftFront, 'leftFront');
  const rf = requireNonNegative(scales.rightFront, 'rightFront');
  const lr = requireNonNegative(scales.leftRear, 'leftRear');
  const rr = requireNonNegative(scales.rightRear, 'rightRear');
  const total = finiteResult(lf + rf + lr + rr, 'total');
  if (total === 0) throw new CalcInputError('total', 'all four corners read zero');
  const percent = (part: number): number => (part / total) * 100;
  const front = lf + rf;
  const rear = lr + rr;
  const left = lf + lr;
  const right = rf + rr;
  return {
    total,
    front,
    rear,
    left,
    right,
    frontPercent: percent(front),
    rearPercent: percent(rear),
    leftPercent: percent(left),
    rightPercent: percent(right),
    crossPercent: percent(rf + lr),
  };
}
