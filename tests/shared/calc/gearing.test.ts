import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { CalcInputError } from '@shared/calc/errors';
import {
  MPH_GEARING_CONSTANT,
  roadSpeedKmh,
  roadSpeedMph,
  rpmAtKmh,
  rpmAtMph,
  speedsInEachGear,
  topSpeedAtRevLimit,
} from '@shared/calc/gearing';

describe('road speed', () => {
  it('3000 rpm, 1.00 gear, 3.73 axle, 26 in tyre → 62.2117 mph = 100.1199 km/h', () => {
    // mph = rpm × D / (gear × axle × 1056/π): 63 360 in per mile ÷ 60 min per hour = 1056.
    const mph = roadSpeedMph({ rpm: 3000, gearRatio: 1, finalDrive: 3.73, tyreDiameterIn: 26 });
    expect(mph).toBeCloseTo(62.2117, 4);
    // Metric form with 26 in = 660.4 mm exactly.
    const kmh = roadSpeedKmh({ rpm: 3000, gearRatio: 1, finalDrive: 3.73, tyreDiameterMm: 660.4 });
    expect(kmh).toBeCloseTo(100.1199, 4);
    // 1 mph = 1.609344 km/h (NIST Handbook 44 Appendix C).
    expect(kmh).toBeCloseTo(mph * 1.609344, 10);
  });

  it('uses 1056/π exactly, not the rounded 336', () => {
    // Definition of the constant; 336.135 is its usual rounding.
    expect(MPH_GEARING_CONSTANT).toBeCloseTo(336.135, 3);
    expect(MPH_GEARING_CONSTANT).toBe(1056 / Math.PI);
  });

  it('agrees with counting wheel revolutions', () => {
    // First principles: wheel rpm × circumference × 60 min = inches per hour; ÷ 63 360 = mph.
    // 0.70 overdrive, 3.55 axle, 27.5 in tyre at 2200 rpm.
    const wheelRpm = 2200 / (0.7 * 3.55);
    const expected = (wheelRpm * Math.PI * 27.5 * 60) / 63360;
    const mph = roadSpeedMph({ rpm: 2200, gearRatio: 0.7, finalDrive: 3.55, tyreDiameterIn: 27.5 });
    expect(mph).toBeCloseTo(expected, 10);
    // By hand: 885.31 wheel rpm × 86.394 in × 60 / 63 360 = 72.43 mph.
    expect(mph).toBeCloseTo(72.43, 2);
  });

  it('finds the rpm at a cruising speed', () => {
    // Inverse of the definition: 62.2117 mph in the car above is 3000 rpm.
    expect(
      rpmAtMph({ mph: 62.2117, gearRatio: 1, finalDrive: 3.73, tyreDiameterIn: 26 }),
    ).toBeCloseTo(3000, 1);
    expect(
      rpmAtKmh({ kmh: 100, gearRatio: 1, finalDrive: 3.73, tyreDiameterMm: 660.4 }),
    ).toBeCloseTo(2996.4, 1);
  });

  it('speed and rpm are inverses', () => {
    // Property: rpm → mph → rpm (and the metric pair) returns the starting rpm.
    const ratio = fc.double({ min: 0.4, max: 6, noNaN: true });
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 12000, noNaN: true }),
        ratio,
        ratio,
        fc.double({ min: 18, max: 40, noNaN: true }),
        (rpm, gearRatio, finalDrive, tyreDiameterIn) => {
          const mph = roadSpeedMph({ rpm, gearRatio, finalDrive, tyreDiameterIn });
          expect(rpmAtMph({ mph, gearRatio, finalDrive, tyreDiameterIn })).toBeCloseTo(rpm, 6);
          const tyreDiameterMm = tyreDiameterIn * 25.4;
          const kmh = roadSpeedKmh({ rpm, gearRatio, finalDrive, tyreDiameterMm });
          expect(rpmAtKmh({ kmh, gearRatio, finalDrive, tyreDiameterMm })).toBeCloseTo(rpm, 6);
          expect(kmh).toBeCloseTo(mph * 1.609344, 6);
        },
      ),
    );
  });

  it('rejects zero ratios, negative rpm, NaN and zero tyres', () => {
    // Our input rule: a zero ratio or tyre would divide by zero; rpm cannot be negative.
    const ok = { rpm: 3000, gearRatio: 1, finalDrive: 3.73, tyreDiameterIn: 26 };
    expect(() => roadSpeedMph({ ...ok, gearRatio: 0 })).toThrow(CalcInputError);
    expect(() => roadSpeedMph({ ...ok, finalDrive: 0 })).toThrow(/finalDrive/);
    expect(() => roadSpeedMph({ ...ok, rpm: -1 })).toThrow(CalcInputError);
    expect(() => roadSpeedMph({ ...ok, tyreDiameterIn: 0 })).toThrow(CalcInputError);
    expect(() => roadSpeedMph({ ...ok, rpm: Number.NaN })).toThrow(CalcInputError);
    expect(() => roadSpeedMph({ ...ok, gearRatio: 1e-200, finalDrive: 1e-200 })).toThrow(
      CalcInputError,
    );
  });
});

describe('gear tables', () => {
  // A four-speed box with a 3.73 axle on 26 in tyres (example figures, not a real product).
  const gears = [2.52, 1.52, 1.0, 0.7];

  it('lists the speed in each gear at one rpm', () => {
    // Definition, gear by gear: speed scales with 1 / gear ratio.
    const rows = speedsInEachGear({ gears, finalDrive: 3.73, tyreDiameterIn: 26, rpm: 3000 });
    expect(rows.map((r) => r.gear)).toEqual([1, 2, 3, 4]);
    expect(rows[2]?.mph).toBeCloseTo(62.2117, 4);
    expect(rows[0]?.mph).toBeCloseTo(62.2117 / 2.52, 4);
    expect(rows[3]?.kmh).toBeCloseTo((62.2117 / 0.7) * 1.609344, 3);
  });

  it('gives the top speed at the rev limit in each gear and the fastest', () => {
    // Definition at 6000 rpm: 3rd gear = 2 × 62.2117 = 124.42 mph, 4th = 124.42 / 0.7 = 177.75.
    const top = topSpeedAtRevLimit({
      gears,
      finalDrive: 3.73,
      tyreDiameterIn: 26,
      revLimitRpm: 6000,
    });
    expect(top.perGear[2]?.mph).toBeCloseTo(124.4233, 3);
    expect(top.fastest.gear).toBe(4);
    expect(top.fastest.mph).toBeCloseTo(177.7476, 3);
    expect(top.note).toMatch(/rev limit/);
  });

  it('rejects an empty or bad gear list and names the gear', () => {
    // Our input rule; the error names the gear by index.
    expect(() =>
      speedsInEachGear({ gears: [], finalDrive: 3.73, tyreDiameterIn: 26, rpm: 1 }),
    ).toThrow(CalcInputError);
    expect(() =>
      speedsInEachGear({ gears: [2.5, -1], finalDrive: 3.73, tyreDiameterIn: 26, rpm: 1 }),
    ).toThrow(/gears\[1\]/);
    expect(() =>
      topSpeedAtRevLimit({ gears, finalDrive: 3.73, tyreDiameterIn: 26, revLimitRpm: 0 }),
    ).toThrow(CalcInputError);
  });
});
