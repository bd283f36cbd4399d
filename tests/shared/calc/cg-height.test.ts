import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { cgHeightFromTilt } from '@shared/calc/cg-height';

/**
 * An independent forward model: rotate the car about the lower axle's wheel centre and take
 * moments about it, to get what the scales under the lower axle read after the tilt.
 */
function lowerAxleWeightWhenTilted(car: { total: number; wheelbase: number; cgAhead: number; cgHeight: number; wheelCentre: number; raised: number }) {
  const theta = Math.asin(car.raised / car.wheelbase);
  const cgX = car.cgAhead * Math.cos(theta) - (car.cgHeight - car.wheelCentre) * Math.sin(theta);
  const raisedAxleX = car.wheelbase * Math.cos(theta);
  return car.total - (car.total * cgX) / raisedAxleX;
}

describe('centre-of-gravity height from a tilt weigh-in', () => {
  it('works the textbook example', () => {
    // h = r + L·ΔW/(W·tan θ), θ = asin(H/L) (Milliken & Milliken, "Race Car Vehicle Dynamics" ch. 18,
    // from memory; R. Gray, "Finding the height of the center of gravity by tilting", step 8:
    // c = b·cot X·(W' − W)/M). By hand: L 2700 mm, H 300 mm, W 1500 kg, the front goes 810 → 830.4 kg,
    // r 310 mm: θ = 6.379°, tan θ = 0.111803, c = 2700 × 20.4 / (1500 × 0.111803) = 328.43 mm, h = 638.43 mm.
    const r = cgHeightFromTilt({ totalWeight: 1500, wheelbase: 2700, wheelCentreHeight: 310, raisedHeight: 300, lowerAxleWeightLevel: 810, lowerAxleWeightRaised: 830.4 });
    expect(r.tiltDeg).toBeCloseTo(6.3794, 3);
    expect(r.aboveWheelCentre).toBeCloseTo(328.434, 2);
    expect(r.cgHeight).toBeCloseTo(638.434, 2);
  });

  it('recovers the CG height of any car from the forward model (cross-check, property)', () => {
    // Independent computation: rigid-body rotation and a moment balance.
    fc.assert(
      fc.property(
        fc.double({ min: 2000, max: 3500, noNaN: true }),
        fc.double({ min: 0.3, max: 0.7, noNaN: true }),
        fc.double({ min: 300, max: 900, noNaN: true }),
        fc.double({ min: 100, max: 500, noNaN: true }),
        (wheelbase, share, cgHeight, raised) => {
          const car = { total: 1400, wheelbase, cgAhead: share * wheelbase, cgHeight, wheelCentre: 300, raised };
          const level = lowerAxleWeightWhenTilted({ ...car, raised: 0 });
          const tilted = lowerAxleWeightWhenTilted(car);
          const r = cgHeightFromTilt({ totalWeight: 1400, wheelbase, wheelCentreHeight: 300, raisedHeight: raised, lowerAxleWeightLevel: level, lowerAxleWeightRaised: tilted });
          return Math.abs(r.cgHeight - cgHeight) < 1e-6;
        },
      ),
    );
  });

  it('raising nothing moves no weight (property of the forward model)', () => {
    fc.assert(
      fc.property(fc.double({ min: 2000, max: 3500, noNaN: true }), fc.double({ min: 0.3, max: 0.7, noNaN: true }), (wheelbase, share) => {
        const car = { total: 1400, wheelbase, cgAhead: share * wheelbase, cgHeight: 550, wheelCentre: 300, raised: 0 };
        return Math.abs(lowerAxleWeightWhenTilted(car) - 1400 * (1 - share)) < 1e-6;
      }),
    );
  });

  it('refuses a raised height not smaller than the wheelbase, and no raise at all', () => {
    // The bad input; asin(H/L) is undefined past 1, and H = 0 tilts nothing.
    const base = { totalWeight: 1500, wheelbase: 2700, wheelCentreHeight: 310, lowerAxleWeightLevel: 810, lowerAxleWeightRaised: 830 };
    expect(() => cgHeightFromTilt({ ...base, raisedHeight: 2700 })).toThrow(/raisedHeight: must be smaller than the wheelbase/);
    expect(() => cgHeightFromTilt({ ...base, raisedHeight: 0 })).toThrow(/raisedHeight/);
  });
});
