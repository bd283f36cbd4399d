import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { camberCurve, frontViewCentres, type FrontGeometryInput } from '@shared/calc/front-geometry';

// Front view, right-hand wheel, mm: x outward from the centreline, y up from the ground.
// Lower arm y = 195 − 0.05x; upper arm y = 387.5 + 0.125x (a short upper arm, inner pivot low).
const sla: FrontGeometryInput = {
  lower: { inner: { x: 300, y: 180 }, outer: { x: 700, y: 160 } },
  upper: { inner: { x: 420, y: 440 }, outer: { x: 660, y: 470 } },
  contactPatch: { x: 760, y: 0 },
};

// Equal, parallel arms: a parallelogram, so the upright only translates.
const parallelogram: FrontGeometryInput = {
  lower: { inner: { x: 300, y: 150 }, outer: { x: 700, y: 150 } },
  upper: { inner: { x: 320, y: 450 }, outer: { x: 720, y: 450 } },
  contactPatch: { x: 760, y: 0 },
};

describe('front-view instant centre, swing arm and roll centre', () => {
  it('finds them where the lines cross', () => {
    // Construction: Milliken & Milliken, "Race Car Vehicle Dynamics", ch. 17 (IC where the arm lines
    // meet; roll centre where the contact-patch-to-IC line crosses the centreline; from memory).
    // By hand: 195 − 0.05x = 387.5 + 0.125x → x = −1100, y = 250; fvsa = 760 + 1100 = 1860 mm;
    // RC = 250 × 760 / 1860 = 102.15 mm.
    const r = frontViewCentres(sla);
    expect(r.kind).toBe('instant-centre');
    expect(r.instantCentre?.x).toBeCloseTo(-1100, 8);
    expect(r.instantCentre?.y).toBeCloseTo(250, 8);
    expect(r.swingArmLengthMm).toBeCloseTo(1860, 8);
    expect(r.rollCentreHeightMm).toBeCloseTo(102.1505, 3);
  });

  it('parallel arms: no instant centre, an infinite swing arm, never NaN', () => {
    // The bad input. With level parallel arms the RC line runs along the ground (Gillespie,
    // "Fundamentals of Vehicle Dynamics", ch. 7, from memory).
    const r = frontViewCentres(parallelogram);
    expect(r.kind).toBe('parallel');
    expect(r.swingArmLengthMm).toBe('infinite');
    expect(r.rollCentreHeightMm).toBeCloseTo(0, 10);
    expect(JSON.stringify(r)).not.toMatch(/NaN|Infinity/);
  });

  it('level parallel arms of any size put the roll centre on the ground (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 100, max: 400, noNaN: true }), fc.double({ min: 150, max: 450, noNaN: true }), fc.double({ min: 100, max: 300, noNaN: true }), (lowerY, upright, len) => {
        const r = frontViewCentres({
          lower: { inner: { x: 700 - len, y: lowerY }, outer: { x: 700, y: lowerY } },
          upper: { inner: { x: 680 - len * 0.8, y: lowerY + upright }, outer: { x: 680, y: lowerY + upright } },
          contactPatch: { x: 760, y: 0 },
        });
        return r.kind === 'parallel' && Math.abs(r.rollCentreHeightMm ?? 1) < 1e-9;
      }),
    );
  });

  it('a bigger car of the same shape has a proportionally higher roll centre (property)', () => {
    // Geometry scales linearly.
    fc.assert(
      fc.property(fc.double({ min: 0.5, max: 2, noNaN: true }), (k) => {
        const s = (p: { x: number; y: number }) => ({ x: p.x * k, y: p.y * k });
        const scaled = frontViewCentres({
          lower: { inner: s(sla.lower.inner), outer: s(sla.lower.outer) },
          upper: { inner: s(sla.upper.inner), outer: s(sla.upper.outer) },
          contactPatch: s(sla.contactPatch),
        });
        return Math.abs((scaled.rollCentreHeightMm ?? 0) - 102.1505376 * k) < 1e-6;
      }),
    );
  });
});

describe('camber and track change through travel (the linkage solved)', () => {
  it('runs from full droop to full bump in 5 mm steps, zero at ride height', () => {
    const c = camberCurve(sla);
    expect(c.steps).toHaveLength(21);
    expect(c.steps[0]?.travelMm).toBe(-50);
    expect(c.steps[20]?.travelMm).toBe(50);
    expect(c.steps[10]).toEqual({ travelMm: 0, camberChangeDeg: -0, trackChangeMm: 0 });
    expect(c.stoppedAt).toBeUndefined();
  });

  it('agrees with the small-angle limit at ride height: dγ/dz = −1/fvsa', () => {
    // Cross-check against an independent computation: the upright turns about the IC, so near ride
    // height the camber rate is 1/fvsa radians per mm (Milliken & Milliken ch. 17, from memory):
    // −(180/π)/1860 = −0.030804 °/mm. The solver's ±0.5 mm difference must match it.
    const c = camberCurve(sla, { droopMm: 0.5, bumpMm: 0.5, stepMm: 0.5 });
    const slope = ((c.steps[2]?.camberChangeDeg ?? 0) - (c.steps[0]?.camberChangeDeg ?? 0)) / 1;
    expect(slope).toBeCloseTo(-0.030804, 5);
    // The solved gain over 25 mm is close to, but not the same as, 25 × the linear rate (−0.770°).
    const gain = camberCurve(sla).camberGainPer25MmBumpDeg ?? 0;
    expect(gain).toBeLessThan(0);
    expect(Math.abs(gain - -0.7701)).toBeLessThan(0.1);
  });

  it('matches the closed form for equal parallel arms: no camber change, track −2·L·(1 − cos φ)', () => {
    // Cross-check: a parallelogram translates the upright; with level arms of length L the contact
    // patch moves in by L − √(L² − z²). By hand for L = 400, z = 50: track change −6.2746 mm.
    const c = camberCurve(parallelogram);
    for (const s of c.steps) {
      expect(Math.abs(s.camberChangeDeg)).toBeLessThan(1e-9);
      expect(s.trackChangeMm).toBeCloseTo(2 * (Math.sqrt(400 ** 2 - s.travelMm ** 2) - 400), 6);
    }
    expect(c.steps.at(-1)?.trackChangeMm).toBeCloseTo(-6.2746, 3);
    expect(c.camberGainPer25MmBumpDeg).toBeCloseTo(0, 9);
  });

  it('equal parallel arms at any angle give no camber change anywhere (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: -0.3, max: 0.3, noNaN: true }), fc.double({ min: 250, max: 450, noNaN: true }), (angle, len) => {
        const dx = len * Math.cos(angle);
        const dy = len * Math.sin(angle);
        const c = camberCurve({
          lower: { inner: { x: 700 - dx, y: 160 - dy }, outer: { x: 700, y: 160 } },
          upper: { inner: { x: 680 - dx, y: 460 - dy }, outer: { x: 680, y: 460 } },
          contactPatch: { x: 760, y: 0 },
        });
        return c.steps.every((s) => Math.abs(s.camberChangeDeg) < 1e-7);
      }),
    );
  });

  it('the same shape scaled up gives the same camber at the scaled travel (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.7, max: 1.5, noNaN: true }), (k) => {
        const s = (p: { x: number; y: number }) => ({ x: p.x * k, y: p.y * k });
        const big = camberCurve({ lower: { inner: s(sla.lower.inner), outer: s(sla.lower.outer) }, upper: { inner: s(sla.upper.inner), outer: s(sla.upper.outer) }, contactPatch: s(sla.contactPatch) }, { droopMm: 40 * k, bumpMm: 40 * k, stepMm: 10 * k });
        const small = camberCurve(sla, { droopMm: 40, bumpMm: 40, stepMm: 10 });
        return big.steps.every((b, i) => Math.abs(b.camberChangeDeg - (small.steps[i]?.camberChangeDeg ?? 99)) < 1e-6);
      }),
      { numRuns: 30 },
    );
  });

  it('stops the curve where the linkage cannot reach, and says so', () => {
    // Short 100 mm parallel arms cannot lift the wheel more than 100 mm.
    const short: FrontGeometryInput = {
      lower: { inner: { x: 600, y: 150 }, outer: { x: 700, y: 150 } },
      upper: { inner: { x: 580, y: 450 }, outer: { x: 680, y: 450 } },
      contactPatch: { x: 760, y: 0 },
    };
    const c = camberCurve(short, { droopMm: 0, bumpMm: 150, stepMm: 30 });
    expect(c.steps.map((s) => s.travelMm)).toEqual([0, 30, 60, 90]);
    expect(c.stoppedAt?.travelMm).toBe(120);
    expect(c.stoppedAt?.reason).toMatch(/cannot reach 120 mm of bump/);
  });

  it('never returns NaN or Infinity for any arm layout (property)', () => {
    const coord = fc.double({ min: 0, max: 900, noNaN: true });
    fc.assert(
      fc.property(coord, coord, coord, coord, coord, coord, coord, coord, (a, b, c, d, e, f, g, h) => {
        const input = { lower: { inner: { x: a, y: b } , outer: { x: c, y: d } }, upper: { inner: { x: e, y: f }, outer: { x: g, y: h } }, contactPatch: { x: 760, y: 0 } };
        for (const fn of [() => frontViewCentres(input), () => camberCurve(input, { stepMm: 10 })]) {
          try {
            const text = JSON.stringify(fn());
            if (/NaN|Infinity/.test(text)) return false;
          } catch (err) {
            if (!(err instanceof Error) || err.name !== 'CalcInputError') return false;
          }
        }
        return true;
      }),
      { numRuns: 200 },
    );
  });
});
