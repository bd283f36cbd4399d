import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import * as calc from '@shared/calc';

describe('the calc entry point', () => {
  it('re-exports every topic', () => {
    // Our API: one entry point for the editor, the server and the tests.
    for (const name of [
      'convert',
      'formatQuantity',
      'figureValueIn',
      'displacement',
      'parseTyreCode',
      'roadSpeedMph',
      'powerToWeight',
      'wheelSpacing',
      'wheelRate',
      'fourLinkAntiSquat',
      'roundTubeMassPerLength',
      'cornerWeights',
      'specCheck',
      'CalcInputError',
    ]) {
      expect(calc, name).toHaveProperty(name);
    }
  });

  it('carries the engineering caution for suspension, brake and chassis figures', () => {
    // Our own wording, required beside suspension, brake and chassis figures.
    expect(calc.ENGINEERING_CAUTION).toMatch(/not engineering approval/);
    expect(calc.ENGINEERING_CAUTION).toMatch(/licensed professionals/);
  });
});

describe('figureValueIn', () => {
  it('reads a figure in any spelling of its unit', () => {
    // 430 lb·ft × 1.3558179483314004 = 583.0017 N·m (NIST SP 811 B.8).
    const torque = { value: 430, unit: 'ft-lb', provenance: 'measured' as const };
    expect(calc.figureValueIn('torque', torque, 'Nm')).toBeCloseTo(583.00172, 5);
    expect(() =>
      calc.figureValueIn('torque', { ...torque, unit: 'hp' }, 'Nm', 'engine.torque'),
    ).toThrow(/engine\.torque/);
  });
});

describe('bad input never becomes NaN or Infinity', () => {
  // Property across the numeric functions: any double in → a finite result or a CalcInputError.
  const anyDouble = fc.double();
  const outcome = (fn: () => number | number[]) => {
    let out: number | number[];
    try {
      out = fn();
    } catch (error) {
      expect(error).toBeInstanceOf(calc.CalcInputError);
      return;
    }
    for (const v of Array.isArray(out) ? out : [out]) expect(v).toSatisfy(Number.isFinite);
  };

  it('holds for gearing, power, wheels, suspension, tubes and engines', () => {
    // Our rule: never NaN or Infinity out; checked over arbitrary doubles, including NaN and ±Infinity.
    fc.assert(
      fc.property(anyDouble, anyDouble, anyDouble, anyDouble, (a, b, c, d) => {
        outcome(() =>
          calc.roadSpeedMph({ rpm: a, gearRatio: b, finalDrive: c, tyreDiameterIn: d }),
        );
        outcome(() => calc.rpmAtKmh({ kmh: a, gearRatio: b, finalDrive: c, tyreDiameterMm: d }));
        outcome(() =>
          Object.values(calc.powerToWeight({ value: a, unit: 'hp' }, { value: b, unit: 'lb' })),
        );
        outcome(() => calc.flywheelPowerFromWheel({ value: a, unit: 'kW' }, b).value);
        outcome(() => {
          const s = calc.wheelSpacing({ rimWidthIn: a, offsetMm: b });
          return [s.backspacingIn, s.frontspacingIn, s.backspacingMm, s.frontspacingMm];
        });
        outcome(() => calc.wheelRate({ springRate: a, motionRatio: b, springAngleDeg: c }));
        outcome(() =>
          calc.rideFrequencyHz({
            wheelRate: { value: a, unit: 'lb/in' },
            cornerSprungMass: { value: b, unit: 'kg' },
          }),
        );
        outcome(
          () => calc.roundTubeMassPerLength({ outsideDiameter: a, wall: b, unit: 'in' }).kgPerM,
        );
        outcome(() => {
          const r = calc.displacement({ bore: a, stroke: b, unit: 'mm', cylinders: 8 });
          return [r.cm3, r.in3, r.litres];
        });
        outcome(() =>
          Object.values(
            calc.cornerWeights({ leftFront: a, rightFront: b, leftRear: c, rightRear: d }),
          ),
        );
        outcome(() => calc.convert('power', a, 'PS', 'hp'));
      }),
      { numRuns: 500 },
    );
  });
});
