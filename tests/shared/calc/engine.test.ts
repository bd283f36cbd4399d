import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { boreStrokeRatio, displacement } from '@shared/calc/engine';
import { CalcInputError } from '@shared/calc/errors';

describe('displacement', () => {
  it('4.000 in bore × 3.000 in stroke × 8 cylinders = 301.59289 in³ = 4942.2221 cm³', () => {
    // Definition: π/4 × bore² × stroke × cylinders = 96π in³; 1 in³ = 16.387064 cm³ (NIST SP 811).
    const d = displacement({ bore: 4, stroke: 3, unit: 'in', cylinders: 8 });
    expect(d.in3).toBeCloseTo(301.59289, 5);
    expect(d.cm3).toBeCloseTo(4942.2221, 4);
    expect(d.litres).toBeCloseTo(4.9422221, 7);
  });

  it('gives the same engine from millimetres', () => {
    // Definition, with 101.6 mm = 4.000 in and 76.2 mm = 3.000 in (1 in = 25.4 mm exactly).
    const d = displacement({ bore: 101.6, stroke: 76.2, unit: 'mm', cylinders: 8 });
    expect(d.cm3).toBeCloseTo(4942.2221, 4);
    expect(d.in3).toBeCloseTo(301.59289, 5);
  });

  it('86 mm square four-cylinder = 1998.23 cm³', () => {
    // Definition: π/4 × 86² × 86 × 4 mm³ = π × 86³ = π × 636 056 = 1 998 228.9 mm³.
    const d = displacement({ bore: 86, stroke: 86, unit: 'mm', cylinders: 4 });
    expect(d.cm3).toBeCloseTo(1998.2289, 3);
  });

  it('scales with the number of cylinders', () => {
    // Property of the definition: displacement is linear in cylinder count.
    fc.assert(
      fc.property(
        fc.double({ min: 10, max: 200, noNaN: true }),
        fc.double({ min: 10, max: 200, noNaN: true }),
        fc.integer({ min: 1, max: 16 }),
        (bore, stroke, n) => {
          const one = displacement({ bore, stroke, unit: 'mm', cylinders: 1 }).cm3;
          const many = displacement({ bore, stroke, unit: 'mm', cylinders: n }).cm3;
          expect(many).toBeCloseTo(one * n, 6);
        },
      ),
    );
  });

  it('rejects nonsense', () => {
    // Our input rule: lengths and cylinder counts must be finite, above zero, whole.
    expect(() => displacement({ bore: 0, stroke: 3, unit: 'in', cylinders: 8 })).toThrow(
      CalcInputError,
    );
    expect(() => displacement({ bore: 4, stroke: -3, unit: 'in', cylinders: 8 })).toThrow(
      CalcInputError,
    );
    expect(() => displacement({ bore: 4, stroke: 3, unit: 'in', cylinders: 7.5 })).toThrow(
      /whole number/,
    );
    expect(() => displacement({ bore: Number.NaN, stroke: 3, unit: 'in', cylinders: 8 })).toThrow(
      CalcInputError,
    );
  });

  it('names the offending field', () => {
    // Our API: CalcInputError carries the field and the reason.
    try {
      displacement({ bore: 4, stroke: 3, unit: 'in', cylinders: 0 });
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(CalcInputError);
      expect((error as CalcInputError).field).toBe('cylinders');
      expect((error as CalcInputError).reason).toBe('must be greater than zero');
    }
  });
});

describe('boreStrokeRatio', () => {
  it('is bore over stroke', () => {
    // Definition.
    expect(boreStrokeRatio(4, 3)).toBeCloseTo(1.333333, 6);
    expect(() => boreStrokeRatio(4, 0)).toThrow(CalcInputError);
  });
});
