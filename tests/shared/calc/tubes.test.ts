import { describe, expect, it } from 'vitest';
import { CalcInputError } from '@shared/calc/errors';
import {
  STEEL_DENSITY,
  rectangularTubeMassPerLength,
  roundTubeMassPerLength,
} from '@shared/calc/tubes';

const LB_PER_IN3 = { value: 0.2836, unit: 'lb/in3' } as const;

describe('round tube', () => {
  it('1.75 in × 0.120 in wall → 2.09125 lb/ft with ρ = 0.2836 lb/in³', () => {
    // Area × density: π × 0.120 × (1.75 − 0.120) in² × 0.2836 lb/in³ × 12 in/ft.
    const m = roundTubeMassPerLength({
      outsideDiameter: 1.75,
      wall: 0.12,
      unit: 'in',
      density: LB_PER_IN3,
    });
    expect(m.lbPerFt).toBeCloseTo(2.09125, 5);
    expect(m.area).toBeCloseTo(0.614496, 6);
  });

  it('equals the outer circle minus the inner circle', () => {
    // Geometry: π/4 × (OD² − ID²) = π·t·(OD − t).
    const m = roundTubeMassPerLength({ outsideDiameter: 1.75, wall: 0.12, unit: 'in' });
    expect(m.area).toBeCloseTo((Math.PI / 4) * (1.75 ** 2 - 1.51 ** 2), 12);
  });

  it('uses 7850 kg/m³ by default', () => {
    // Area × density: 40 × 2 mm: π × 2 × 38 = 238.76 mm² × 7850 kg/m³ = 1.8743 kg/m.
    expect(STEEL_DENSITY).toEqual({ value: 7850, unit: 'kg/m3' });
    const m = roundTubeMassPerLength({ outsideDiameter: 40, wall: 2, unit: 'mm' });
    expect(m.kgPerM).toBeCloseTo(1.87427, 5);
    // 7850 kg/m³ is 0.28360 lb/in³, so the default gives nearly the same 2.0912 lb/ft.
    const inch = roundTubeMassPerLength({ outsideDiameter: 1.75, wall: 0.12, unit: 'in' });
    expect(inch.lbPerFt).toBeCloseTo(2.09125, 4);
  });

  it('rejects a wall thicker than half the diameter and zero sizes', () => {
    // Geometry: a wall of more than OD/2 leaves no tube.
    expect(() => roundTubeMassPerLength({ outsideDiameter: 1, wall: 0.6, unit: 'in' })).toThrow(
      /wall/,
    );
    expect(() => roundTubeMassPerLength({ outsideDiameter: 0, wall: 0.1, unit: 'in' })).toThrow(
      CalcInputError,
    );
    expect(() => roundTubeMassPerLength({ outsideDiameter: 1, wall: 0, unit: 'in' })).toThrow(
      CalcInputError,
    );
  });
});

describe('rectangular tube', () => {
  it('2 × 1 in × 0.120 in wall, sharp corners → 2.2543 lb/ft', () => {
    // Outer rectangle minus inner: 2 × 1 − 1.76 × 0.76 = 0.6624 in² (= 2t(B + H − 2t)),
    // × 0.2836 lb/in³ × 12 in/ft = 2.25428 lb/ft. Counting each wall twice would give 4.5 lb/ft.
    const m = rectangularTubeMassPerLength({
      width: 2,
      height: 1,
      wall: 0.12,
      unit: 'in',
      density: LB_PER_IN3,
    });
    expect(m.area).toBeCloseTo(2 * 1 - 1.76 * 0.76, 12);
    expect(m.lbPerFt).toBeCloseTo(2.25428, 5);
    expect(m.note).toMatch(/radiused corners/);
  });

  it('square 40 × 40 × 3 mm → 3.486 kg/m at 7850 kg/m³', () => {
    // Outer minus inner: 1600 − 34² = 444 mm² × 7850 kg/m³ = 3.4854 kg/m.
    const m = rectangularTubeMassPerLength({ width: 40, height: 40, wall: 3, unit: 'mm' });
    expect(m.kgPerM).toBeCloseTo(3.4854, 4);
  });

  it('rejects a wall thicker than half the smaller side', () => {
    // Geometry: the inner rectangle would have a negative side.
    expect(() =>
      rectangularTubeMassPerLength({ width: 2, height: 1, wall: 0.6, unit: 'in' }),
    ).toThrow(CalcInputError);
  });
});
