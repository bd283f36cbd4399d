import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { cornerWeights } from '@shared/calc/corner-weights';
import { CalcInputError } from '@shared/calc/errors';

describe('corner weights', () => {
  it('splits 800/760/700/740 lb into front, left and cross', () => {
    // Definitions: total 3000; front (800 + 760)/3000 = 52%; left (800 + 700)/3000 = 50%;
    // cross (RF + LR)/total = (760 + 700)/3000 = 48.667%.
    const w = cornerWeights({ leftFront: 800, rightFront: 760, leftRear: 700, rightRear: 740 });
    expect(w.total).toBe(3000);
    expect(w.front).toBe(1560);
    expect(w.frontPercent).toBeCloseTo(52, 10);
    expect(w.rearPercent).toBeCloseTo(48, 10);
    expect(w.leftPercent).toBeCloseTo(50, 10);
    expect(w.rightPercent).toBeCloseTo(50, 10);
    expect(w.crossPercent).toBeCloseTo(48.6667, 4);
  });

  it('gives 50% cross weight for a square car', () => {
    // Definition: equal corners.
    const w = cornerWeights({ leftFront: 350, rightFront: 350, leftRear: 350, rightRear: 350 });
    expect(w.crossPercent).toBe(50);
  });

  it('front + rear and left + right are each 100%', () => {
    // Property of the definitions.
    const corner = fc.double({ min: 0, max: 5000, noNaN: true });
    fc.assert(
      fc.property(corner, corner, corner, corner, (lf, rf, lr, rr) => {
        fc.pre(lf + rf + lr + rr > 0);
        const w = cornerWeights({ leftFront: lf, rightFront: rf, leftRear: lr, rightRear: rr });
        expect(w.frontPercent + w.rearPercent).toBeCloseTo(100, 9);
        expect(w.leftPercent + w.rightPercent).toBeCloseTo(100, 9);
      }),
    );
  });

  it('rejects negative and all-zero readings', () => {
    // Our input rule: a scale cannot read below zero, and an empty scale set has no split.
    expect(() =>
      cornerWeights({ leftFront: -1, rightFront: 1, leftRear: 1, rightRear: 1 }),
    ).toThrow(/leftFront/);
    expect(() => cornerWeights({ leftFront: 0, rightFront: 0, leftRear: 0, rightRear: 0 })).toThrow(
      CalcInputError,
    );
  });
});
