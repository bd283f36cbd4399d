import { describe, expect, it } from 'vitest';
import { CalcInputError } from '@shared/calc/errors';
import {
  RIDE_FREQUENCY_BANDS,
  bellCrankMotionRatio,
  motionRatioFromTravel,
  rideFrequencyBand,
  rideFrequencyHz,
  springRateForWheelRate,
  wheelRate,
} from '@shared/calc/suspension';

// Standard gravity, 9.80665 m/s² exactly (NIST SP 811), in inches per second squared.
const G_IN_PER_S2 = 9.80665 / 0.0254;

describe('wheel rate', () => {
  it('400 lb/in spring, motion ratio 0.80 → 256.0 lb/in', () => {
    // Wheel rate = spring rate × MR² (MR = spring travel ÷ wheel travel): 400 × 0.64.
    expect(wheelRate({ springRate: 400, motionRatio: 0.8 })).toBeCloseTo(256, 10);
  });

  it('loses cos²θ to a leaning spring', () => {
    // cos² 30° = 0.75 exactly: 400 × 0.64 × 0.75 = 192 lb/in.
    expect(wheelRate({ springRate: 400, motionRatio: 0.8, springAngleDeg: 30 })).toBeCloseTo(
      192,
      10,
    );
    // cos² 60° = 0.25.
    expect(wheelRate({ springRate: 100, motionRatio: 1, springAngleDeg: 60 })).toBeCloseTo(25, 10);
  });

  it('finds the spring for a wanted wheel rate', () => {
    // Inverse of the above: 256 / 0.64 = 400.
    expect(springRateForWheelRate({ wheelRate: 256, motionRatio: 0.8 })).toBeCloseTo(400, 10);
    expect(
      springRateForWheelRate({ wheelRate: 192, motionRatio: 0.8, springAngleDeg: 30 }),
    ).toBeCloseTo(400, 10);
  });

  it('works out motion ratios from travel and from a bell-crank', () => {
    // Definition: 2.4 in of spring per 3 in of wheel = 0.8.
    expect(motionRatioFromTravel({ springTravel: 2.4, wheelTravel: 3 })).toBeCloseTo(0.8, 12);
    // MR = MR_pushrod × r_spring / r_pushrod = 0.9 × 3 / 4 = 0.675.
    expect(
      bellCrankMotionRatio({ pushrodMotionRatio: 0.9, springArmLength: 3, pushrodArmLength: 4 }),
    ).toBeCloseTo(0.675, 12);
  });

  it('rejects zero ratios, zero springs and a spring lying across its travel', () => {
    // Our input rule: at 90° cos²θ is zero and the spring does nothing.
    expect(() => wheelRate({ springRate: 400, motionRatio: 0 })).toThrow(CalcInputError);
    expect(() => wheelRate({ springRate: 0, motionRatio: 0.8 })).toThrow(CalcInputError);
    expect(() => wheelRate({ springRate: 400, motionRatio: 0.8, springAngleDeg: 90 })).toThrow(
      /springAngleDeg/,
    );
    expect(() => motionRatioFromTravel({ springTravel: 1, wheelTravel: 0 })).toThrow(
      CalcInputError,
    );
    expect(() =>
      bellCrankMotionRatio({ pushrodMotionRatio: 0.9, springArmLength: 3, pushrodArmLength: 0 }),
    ).toThrow(CalcInputError);
  });
});

describe('ride frequency', () => {
  it('matches the static-deflection form f = (1/2π)·√(g/δ)', () => {
    // Undamped single-degree-of-freedom oscillator (any vibration textbook): δ = W / k.
    // 256 lb/in wheel rate under 800 lb of sprung corner weight: δ = 3.125 in.
    const expected = Math.sqrt(G_IN_PER_S2 / (800 / 256)) / (2 * Math.PI);
    const f = rideFrequencyHz({
      wheelRate: { value: 256, unit: 'lb/in' },
      cornerSprungMass: { value: 800, unit: 'lb' },
    });
    expect(f).toBeCloseTo(expected, 10);
    // By hand: g = 386.0886 in/s²; √(386.0886 / 3.125) / 2π = 11.1152 / 6.2832 = 1.7690 Hz.
    expect(f).toBeCloseTo(1.769, 3);
  });

  it('gives the same in SI units', () => {
    // f = (1/2π)·√(k/m): 30 N/mm = 30 000 N/m on 300 kg → √100 / 2π = 1.5915 Hz.
    const f = rideFrequencyHz({
      wheelRate: { value: 30, unit: 'N/mm' },
      cornerSprungMass: { value: 300, unit: 'kg' },
    });
    expect(f).toBeCloseTo(10 / (2 * Math.PI), 12);
  });

  it('places a frequency in the usual bands', () => {
    // Common practice: about 1 Hz street, 2–2.5 Hz race cars without aero.
    expect(rideFrequencyBand(1.2).id).toBe('street');
    expect(rideFrequencyBand(0.8).id).toBe('soft');
    expect(rideFrequencyBand(2.2).id).toBe('race');
    expect(rideFrequencyBand(3.5).id).toBe('very-stiff');
    expect(RIDE_FREQUENCY_BANDS.length).toBe(5);
    expect(() => rideFrequencyBand(0)).toThrow(CalcInputError);
  });

  it('rejects a zero sprung mass', () => {
    // Our input rule: √(k/m) with m = 0 has no value.
    expect(() =>
      rideFrequencyHz({
        wheelRate: { value: 256, unit: 'lb/in' },
        cornerSprungMass: { value: 0, unit: 'lb' },
      }),
    ).toThrow(/cornerSprungMass/);
  });
});
