import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { CalcInputError } from '@shared/calc/errors';
import { fourLinkAntiSquat, type LinkLine } from '@shared/calc/four-link';

// Side view: x forward from the axle centre, y up from the ground (inches here).
// Lower link y = 10 + x/12; upper link y = 18 − x/18.
const lowerLink: LinkLine = { axleEnd: { x: 0, y: 10 }, chassisEnd: { x: 24, y: 12 } };
const upperLink: LinkLine = { axleEnd: { x: 0, y: 18 }, chassisEnd: { x: 18, y: 17 } };

describe('four-link instant centre and anti-squat', () => {
  it('finds the instant centre where the link lines cross', () => {
    // Worked by hand: 10 + x/12 = 18 − x/18 → x·5/36 = 8 → x = 57.6, y = 14.8.
    const r = fourLinkAntiSquat({ upperLink, lowerLink, wheelbase: 108, cgHeight: 18 });
    expect(r.kind).toBe('instant-centre');
    expect(r.instantCentre?.x).toBeCloseTo(57.6, 10);
    expect(r.instantCentre?.y).toBeCloseTo(14.8, 10);
  });

  it('anti-squat = (IC height / IC distance) / (CG height / wheelbase) × 100', () => {
    // Herb Adams, "Chassis Engineering": (14.8 / 57.6) / (18 / 108) × 100 = 154.17%;
    // the anti-squat line is 14.8/57.6 × 108 = 27.75 in high at the front axle.
    const r = fourLinkAntiSquat({ upperLink, lowerLink, wheelbase: 108, cgHeight: 18 });
    expect(r.antiSquatPercent).toBeCloseTo(154.1667, 4);
    expect(r.antiSquatLineHeightAtFrontAxle).toBeCloseTo(27.75, 10);
  });

  it('gives 100% when the anti-squat line passes through the CG height at the front axle', () => {
    // Definition: an IC on the line from the contact patch to (wheelbase, CG height).
    // Lower link y = 8 + x/10 and upper y = 16 − x/30 cross at (60, 14); 14/60 × 120 = 28 = CG.
    const r = fourLinkAntiSquat({
      lowerLink: { axleEnd: { x: 0, y: 8 }, chassisEnd: { x: 20, y: 10 } },
      upperLink: { axleEnd: { x: 0, y: 16 }, chassisEnd: { x: 30, y: 15 } },
      wheelbase: 120,
      cgHeight: 28,
    });
    expect(r.antiSquatPercent).toBeCloseTo(100, 10);
  });

  it('does not care which link is called upper', () => {
    // Symmetry of a line intersection.
    const a = fourLinkAntiSquat({ upperLink, lowerLink, wheelbase: 108, cgHeight: 18 });
    const b = fourLinkAntiSquat({
      upperLink: lowerLink,
      lowerLink: upperLink,
      wheelbase: 108,
      cgHeight: 18,
    });
    expect(b.antiSquatPercent).toBeCloseTo(a.antiSquatPercent ?? Number.NaN, 9);
  });

  it('says so when the links are parallel, without dividing by zero', () => {
    // Parallel lines never meet: no instant centre. The anti-squat line then runs parallel to the
    // links (the limit as the IC recedes): slope 1/12 × 108 = 9 in; 9 / 18 = 50%.
    const r = fourLinkAntiSquat({
      lowerLink,
      upperLink: { axleEnd: { x: 0, y: 18 }, chassisEnd: { x: 24, y: 20 } },
      wheelbase: 108,
      cgHeight: 18,
    });
    expect(r.kind).toBe('parallel');
    expect(r.instantCentre).toBeNull();
    expect(r.antiSquatPercent).toBeCloseTo(50, 10);
    if (r.kind === 'parallel') expect(r.reason).toMatch(/no instant centre/);
  });

  it('says so when the instant centre is straight above the axle', () => {
    // Worked by hand: both links start at (0, 10), so they cross above the axle; x = 0 has no slope.
    const r = fourLinkAntiSquat({
      lowerLink: { axleEnd: { x: 0, y: 10 }, chassisEnd: { x: 20, y: 8 } },
      upperLink: { axleEnd: { x: 0, y: 10 }, chassisEnd: { x: 20, y: 16 } },
      wheelbase: 108,
      cgHeight: 18,
    });
    expect(r.kind).toBe('instant-centre-over-axle');
    expect(r.antiSquatPercent).toBeNull();
  });

  it('never returns NaN or Infinity for any link layout', () => {
    // Property: every result is finite or null, or the input is rejected with a typed error.
    const point = fc.record({
      x: fc.double({ min: -100, max: 100, noNaN: true }),
      y: fc.double({ min: -20, max: 60, noNaN: true }),
    });
    const link = fc.record({ axleEnd: point, chassisEnd: point });
    fc.assert(
      fc.property(link, link, (u, l) => {
        try {
          const r = fourLinkAntiSquat({ upperLink: u, lowerLink: l, wheelbase: 108, cgHeight: 18 });
          for (const v of [r.antiSquatPercent, r.instantCentre?.x, r.instantCentre?.y]) {
            if (v !== null && v !== undefined) expect(Number.isFinite(v)).toBe(true);
          }
        } catch (error) {
          expect(error).toBeInstanceOf(CalcInputError);
        }
      }),
    );
  });

  it('rejects a link of zero length and a zero wheelbase', () => {
    // Our input rule: a link needs two distinct ends; lengths must be above zero.
    const dot: LinkLine = { axleEnd: { x: 5, y: 5 }, chassisEnd: { x: 5, y: 5 } };
    expect(() =>
      fourLinkAntiSquat({ upperLink: dot, lowerLink, wheelbase: 108, cgHeight: 18 }),
    ).toThrow(/upperLink/);
    expect(() => fourLinkAntiSquat({ upperLink, lowerLink, wheelbase: 0, cgHeight: 18 })).toThrow(
      CalcInputError,
    );
    expect(() =>
      fourLinkAntiSquat({ upperLink, lowerLink, wheelbase: 108, cgHeight: Number.NaN }),
    ).toThrow(CalcInputError);
  });
});
