import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { CalcInputError } from '@shared/calc/errors';
import { FLANGE_ALLOWANCE_IN, offsetFromBackspacing, wheelSpacing } from '@shared/calc/wheels';

describe('backspacing and frontspacing', () => {
  it('18 × 12.5 rim with +25 mm offset → 7.73425 in backspacing', () => {
    // BS = (width + 1 in)/2 + ET; the +1 in for the bead flanges is common practice.
    // (12.5 + 1)/2 + 25/25.4 = 6.75 + 0.98425 = 7.73425 in.
    const s = wheelSpacing({ rimWidthIn: 12.5, offsetMm: 25 });
    expect(s.backspacingIn).toBeCloseTo(7.73425, 5);
    expect(s.frontspacingIn).toBeCloseTo(13.5 - 7.73425, 5);
    expect(s.backspacingMm).toBeCloseTo(196.45, 2);
    expect(s.source).toBe('calculated');
    expect(s.note).toMatch(/\+1 in/);
  });

  it('zero offset centres the wheel; negative offset moves it out', () => {
    // Definition of ET: distance from the rim centreline to the hub face.
    const zero = wheelSpacing({ rimWidthIn: 8, offsetMm: 0 });
    expect(zero.backspacingIn).toBeCloseTo(4.5, 12);
    expect(zero.frontspacingIn).toBeCloseTo(4.5, 12);
    // −12.7 mm = −0.5 in.
    expect(wheelSpacing({ rimWidthIn: 8, offsetMm: -12.7 }).backspacingIn).toBeCloseTo(4, 12);
  });

  it('lets a measured backspacing override the offset', () => {
    // Our rule: a measurement beats the +1 in convention (common practice).
    const s = wheelSpacing({ rimWidthIn: 10, offsetMm: 999, measuredBackspacingIn: 6.25 });
    expect(s.source).toBe('measured');
    expect(s.backspacingIn).toBe(6.25);
    expect(s.frontspacingIn).toBeCloseTo(4.75, 12);
    // Implied offset: (6.25 − 5.5) × 25.4 = 19.05 mm.
    expect(s.offsetMm).toBeCloseTo(19.05, 10);
  });

  it('backspacing + frontspacing = width + 1 in', () => {
    // Property of the convention (common practice).
    fc.assert(
      fc.property(
        fc.double({ min: 3, max: 20, noNaN: true }),
        fc.double({ min: -100, max: 100, noNaN: true }),
        (rimWidthIn, offsetMm) => {
          const s = wheelSpacing({ rimWidthIn, offsetMm });
          expect(s.backspacingIn + s.frontspacingIn).toBeCloseTo(
            rimWidthIn + FLANGE_ALLOWANCE_IN,
            10,
          );
          // And the offset comes back from the backspacing (where that is physical).
          if (s.backspacingIn >= 0) {
            const back = offsetFromBackspacing({ rimWidthIn, backspacingIn: s.backspacingIn });
            expect(back).toBeCloseTo(offsetMm, 6);
          }
        },
      ),
    );
  });

  it('returns negative frontspacing rather than hiding it', () => {
    // 7 in rim with +120 mm: BS = 4 + 4.724 = 8.724 in > 8 in overall.
    expect(wheelSpacing({ rimWidthIn: 7, offsetMm: 120 }).frontspacingIn).toBeCloseTo(-0.72441, 5);
  });

  it('rejects a zero rim width and NaN offset', () => {
    // Our input rule.
    expect(() => wheelSpacing({ rimWidthIn: 0, offsetMm: 25 })).toThrow(CalcInputError);
    expect(() => wheelSpacing({ rimWidthIn: 8, offsetMm: Number.NaN })).toThrow(/offsetMm/);
    expect(() => wheelSpacing({ rimWidthIn: 8, offsetMm: 0, measuredBackspacingIn: -1 })).toThrow(
      CalcInputError,
    );
  });
});
