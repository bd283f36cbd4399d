import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { CalcInputError, TyreCodeError } from '@shared/calc/errors';
import {
  NOMINAL_TYRE_NOTE,
  parseTyreCode,
  tryParseTyreCode,
  tyreDimensions,
  tyreDimensionsFromCode,
} from '@shared/calc/tyres';

// The geometry of a size code is its definition (ETRTO / Tire and Rim Association; ISO 4000-1):
// sidewall = width × aspect / 100; diameter = rim + 2 × sidewall; flotation codes state the
// diameter and width in inches. Revolutions per mile = 63 360 in / (π × diameter).

describe('metric size codes', () => {
  it('315/30R18 → 25.44094 in overall, 792.742 revolutions per mile', () => {
    // Size code definition: 18 + 2 × 315 × 0.30 / 25.4 = 25.440945 in.
    const d = tyreDimensionsFromCode('315/30R18');
    expect(d.diameterIn).toBeCloseTo(25.44094, 5);
    expect(d.revsPerMile).toBeCloseTo(792.742, 3);
    expect(d.sidewallMm).toBeCloseTo(94.5, 10);
    expect(d.sectionWidthMm).toBe(315);
  });

  it('285/35R18 → 25.854 in overall', () => {
    // Size code definition: sidewall 99.75 mm; 18 + 2 × 99.75 / 25.4 = 25.8543 in.
    const d = tyreDimensionsFromCode('285/35R18');
    expect(d.diameterIn).toBeCloseTo(25.8543, 4);
    expect(d.diameterMm).toBeCloseTo(656.7, 1);
    // Revolutions per km = 10⁶ mm / (π × 656.7 mm) = 484.7.
    expect(d.revsPerKm).toBeCloseTo(484.71, 2);
    expect(d.circumferenceMm).toBeCloseTo(Math.PI * 656.7, 1);
  });

  it('reads the ZR construction, P and LT prefixes', () => {
    // Size code definition (ETRTO / TRA).
    const zr = parseTyreCode('275/35ZR18');
    expect(zr).toMatchObject({ system: 'metric', construction: 'ZR', sectionWidthMm: 275 });
    const p = parseTyreCode('P215/65R15');
    expect(p).toMatchObject({
      prefix: 'P',
      sectionWidthMm: 215,
      aspectRatio: 65,
      rimDiameterIn: 15,
    });
    // 15 + 2 × 139.75 / 25.4 = 26.004 in.
    expect(tyreDimensions(p).diameterIn).toBeCloseTo(26.0039, 4);
    const lt = parseTyreCode('LT265/75R16');
    expect(lt).toMatchObject({ prefix: 'LT', code: 'LT265/75R16' });
    // 16 + 2 × 198.75 / 25.4 = 31.6496 in.
    expect(tyreDimensions(lt).diameterIn).toBeCloseTo(31.6496, 4);
  });

  it('keeps the load index and speed symbol but ignores them for geometry', () => {
    // Size code definition: the service description (load index + speed symbol) carries no dimension.
    const withService = parseTyreCode('245/40ZR18 93Y');
    expect(withService.service).toEqual({
      text: '93Y',
      loadIndex: 93,
      speedSymbol: 'Y',
      markings: [],
    });
    expect(withService.code).toBe('245/40ZR18');
    expect(tyreDimensions(withService)).toEqual(tyreDimensionsFromCode('245/40ZR18'));
    expect(parseTyreCode('LT265/75R16 123/120S').service).toMatchObject({
      loadIndex: 123,
      dualLoadIndex: 120,
      speedSymbol: 'S',
    });
    expect(parseTyreCode('275/35 ZR 18 (95Y) XL').service).toMatchObject({
      loadIndex: 95,
      speedSymbol: 'Y',
      markings: ['XL'],
    });
  });

  it('is forgiving about case and spaces', () => {
    // Our parsing rule: owners type codes loosely.
    expect(parseTyreCode(' p215/65 r15 ').code).toBe('P215/65R15');
  });
});

describe('flotation size codes', () => {
  it('33x12.50R15 → 33 in overall, 12.5 in wide, 9 in sidewall', () => {
    // Flotation code definition: overall diameter × section width, rim 15 in.
    const size = parseTyreCode('33x12.50R15');
    expect(size).toMatchObject({
      system: 'flotation',
      overallDiameterIn: 33,
      sectionWidthIn: 12.5,
    });
    const d = tyreDimensions(size);
    expect(d.diameterIn).toBeCloseTo(33, 10);
    expect(d.sidewallIn).toBeCloseTo(9, 10);
    expect(d.sectionWidthMm).toBeCloseTo(317.5, 10);
    // 63 360 / (π × 33) = 63 360 / 103.6726 = 611.155 revolutions per mile.
    expect(d.revsPerMile).toBeCloseTo(611.155, 3);
  });

  it('accepts an LT suffix, a capital X and bias construction', () => {
    // Size code definition: '-' or D for bias, LT for light truck (Tire and Rim Association).
    expect(parseTyreCode('35X12.50R17LT 121Q')).toMatchObject({ suffix: 'LT', rimDiameterIn: 17 });
    expect(parseTyreCode('31x10.50-15').construction).toBe('-');
  });
});

describe('every result', () => {
  it('carries the nominal-figures note', () => {
    // Common practice: a maker's loaded radius differs by a few percent from the nominal figure.
    expect(tyreDimensionsFromCode('315/30R18').note).toBe(NOMINAL_TYRE_NOTE);
    expect(NOMINAL_TYRE_NOTE).toMatch(/few percent/);
  });

  it('round-trips a generated metric code', () => {
    // Property of the definition: the fields we print are the fields we read back.
    fc.assert(
      fc.property(
        fc.integer({ min: 10, max: 45 }).map((n) => n * 10 + 5),
        fc.integer({ min: 5, max: 16 }).map((n) => n * 5),
        fc.integer({ min: 12, max: 24 }),
        (width, aspect, rim) => {
          const size = parseTyreCode(`${width}/${aspect}R${rim}`);
          expect(size).toMatchObject({
            sectionWidthMm: width,
            aspectRatio: aspect,
            rimDiameterIn: rim,
          });
          const d = tyreDimensions(size);
          expect(d.diameterMm).toBeCloseTo(rim * 25.4 + (2 * width * aspect) / 100, 9);
          expect(d.revsPerMile * d.circumferenceIn).toBeCloseTo(63360, 6);
        },
      ),
    );
  });
});

describe('unreadable codes', () => {
  const cases: [string, RegExp][] = [
    ['', /empty/],
    ['banana', /not a metric size/],
    ['285/35', /construction letter/],
    ['285/35R', /rim diameter/],
    ['2855/35R18', /three digits/],
    ['285-35R18', /"\/"/],
    ['285/5R18', /aspect ratio/],
    ['285/35R40', /between 8 and 30/],
    ['285/35R18 hello', /unrecognised text.*HELLO/],
    ['15x12.50R15', /larger than the rim/],
    ['33x12.50', /construction letter/],
  ];
  it.each(cases)('%j is rejected with a reason', (code, reason) => {
    // Our parsing rule: each failure says which part of the code is wrong.
    expect(() => parseTyreCode(code)).toThrow(TyreCodeError);
    expect(() => parseTyreCode(code)).toThrow(reason);
    const result = tryParseTyreCode(code);
    expect(result.ok).toBe(false);
    if (!result.ok) {
      expect(result.error).toBeInstanceOf(CalcInputError);
      expect(result.error.code).toBe(code);
    }
  });

  it('tryParseTyreCode returns the size when it can', () => {
    // Our API for the live editor.
    const result = tryParseTyreCode('285/35R18');
    expect(result.ok && result.size.code).toBe('285/35R18');
  });
});
