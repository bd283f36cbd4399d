import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import type { Figure } from '@shared/calc/figure';
import { SPEC_SECTIONS, specCheck, type SpecCheckInput } from '@shared/calc/spec-check-rules';

const measured = (value: number, unit: string, measuredOn = '2024-05-11'): Figure => ({
  value,
  unit,
  provenance: 'measured',
  measuredOn,
});
const stated = (value: number, unit: string): Figure => ({ value, unit, provenance: 'estimated' });

// A consistent example car (invented figures). Gearing at 6500 rpm in 0.70 top gear, 3.73 axle,
// 285/35ZR18 (25.854 in): 6500 × 25.854 / (0.70 × 3.73 × 1056/π) = 191.5 mph.
function sheet(): SpecCheckInput {
  return {
    engine: {
      bore: stated(4, 'in'),
      stroke: stated(3, 'in'),
      cylinders: 8,
      displacement: stated(302, 'ci'),
      flywheelPower: stated(450, 'hp'),
      wheelPower: measured(380, 'whp'),
      torque: measured(430, 'lb-ft'),
      revLimitRpm: 6500,
    },
    drivetrain: { gearRatios: [2.52, 1.52, 1.0, 0.7], finalDrive: 3.73 },
    wheels: {
      front: { tyre: '245/40ZR18 97Y', rimWidth: stated(9, 'in'), offset: stated(30, 'mm') },
      rear: { tyre: '285/35ZR18', rimWidth: stated(12.5, 'in'), offset: stated(25, 'mm') },
    },
    chassis: { weight: measured(3200, 'lb') },
    performance: { topSpeed: stated(160, 'mph') },
  };
}

const codes = (input: SpecCheckInput) => specCheck(input).map((w) => w.code);

describe('specCheck', () => {
  it('finds nothing wrong with a consistent sheet', () => {
    // Every figure of the example car agrees with the definitions used in the other tests.
    expect(specCheck(sheet())).toEqual([]);
    expect(specCheck({})).toEqual([]);
  });

  it('flags displacement more than 1% away from bore × stroke', () => {
    // 4.000 × 3.000 in × 8 = 4.942 L (definition); a "5.0 L" claim is 1.2% high.
    const input = sheet();
    input.engine!.displacement = stated(5.0, 'L');
    const [w] = specCheck(input);
    expect(w).toMatchObject({
      code: 'displacement_mismatch',
      section: 'engine',
      field: 'engine.displacement',
    });
    expect(w?.message).toContain('4.94\u00a0L');
    // The owner's figure as typed ("5 L"), with no decimals it never had.
    expect(w?.message).toContain('the sheet says 5\u00a0L.');
    expect(w?.why).toMatch(/bore, stroke/);
    // 4.9 L is 0.85% low: within 1%.
    input.engine!.displacement = stated(4.9, 'L');
    expect(codes(input)).toEqual([]);
  });

  it('flags wheel power above flywheel power, across units', () => {
    // Definition of drivetrain loss: wheel power is flywheel power less a positive loss.
    const input = sheet();
    input.engine!.wheelPower = measured(480, 'hp');
    expect(specCheck(input)[0]).toMatchObject({
      code: 'wheel_power_above_flywheel',
      field: 'engine.wheelPower',
    });
    // 340 kW = 455.9 hp (NIST SP 811 B.8), above 450 hp.
    input.engine!.wheelPower = measured(340, 'kW');
    expect(codes(input)).toEqual(['wheel_power_above_flywheel']);
    // 330 kW = 442.5 hp: below.
    input.engine!.wheelPower = measured(330, 'kW');
    expect(codes(input)).toEqual([]);
  });

  it('flags a top speed the gearing cannot reach at the rev limit', () => {
    // Gearing definition (see gearing tests); 1% allowance for rounding is our choice.
    const input = sheet();
    input.performance!.topSpeed = stated(200, 'mph');
    const [w] = specCheck(input);
    expect(w).toMatchObject({ code: 'top_speed_beyond_gearing', section: 'performance' });
    expect(w?.message).toContain('191\u00a0mph');
    expect(w?.message).toContain('gear 4');
    // 193 mph is within 1% of 191.5: rounding, not a contradiction.
    input.performance!.topSpeed = stated(193, 'mph');
    expect(codes(input)).toEqual([]);
    // 320 km/h = 198.8 mph; the message answers in the claim's unit: 191.5 mph = 308 km/h.
    input.performance!.topSpeed = stated(320, 'km/h');
    expect(specCheck(input)[0]?.message).toContain('308\u00a0km/h');
  });

  it('uses the front tyres for a front-drive car', () => {
    // 245/40R18 is 25.717 in: 6500 × 25.717 / (0.7 × 3.73 × 336.135) = 190.5 mph.
    const input = sheet();
    input.drivetrain!.drivenAxle = 'front';
    input.performance!.topSpeed = stated(193, 'mph');
    expect(codes(input)).toEqual(['top_speed_beyond_gearing']);
  });

  it('flags front and rear tyre diameters more than 3% apart unless the car is raked', () => {
    // 225/50R15 = 23.86 in against 285/35R18 = 25.85 in: 8.4% (size code definition).
    const input = sheet();
    input.wheels!.front!.tyre = '225/50R15';
    const [w] = specCheck(input);
    expect(w).toMatchObject({ code: 'tyre_diameter_mismatch', section: 'wheels' });
    expect(w?.message).toContain('8.4%');
    input.wheels!.raked = true;
    expect(codes(input)).toEqual([]);
    // The threshold is configurable.
    input.wheels!.raked = false;
    expect(specCheck(input, { tyreDiameterTolerance: 0.1 })).toEqual([]);
  });

  it('flags backspacing that leaves less than zero frontspacing', () => {
    // 7 in rim, +120 mm: BS = 4 + 4.724 = 8.724 in of an 8 in wheel (+1 in: common practice).
    const input = sheet();
    input.wheels!.rear = {
      tyre: '285/35ZR18',
      rimWidth: stated(7, 'in'),
      offset: stated(120, 'mm'),
    };
    const [w] = specCheck(input);
    expect(w).toMatchObject({ code: 'negative_frontspacing', field: 'wheels.rear.offset' });
    expect(w?.message).toContain('-0.72 in');
    // A measured backspacing overrides the offset.
    input.wheels!.rear.backspacing = measured(9, 'in');
    expect(specCheck(input)[0]).toMatchObject({ field: 'wheels.rear.backspacing' });
    input.wheels!.rear.backspacing = measured(5, 'in');
    expect(codes(input)).toEqual([]);
  });

  it('flags a measured figure with no date, or a date that is not one', () => {
    // Our rule; dates as ISO 8601 calendar dates (YYYY-MM-DD).
    const input = sheet();
    input.engine!.torque = { value: 430, unit: 'lbft', provenance: 'measured' };
    input.chassis!.weight = measured(3200, 'lb', '2024-13-40');
    const warnings = specCheck(input);
    expect(warnings.map((w) => [w.code, w.field])).toEqual([
      ['measured_without_date', 'engine.torque'],
      ['measured_without_date', 'chassis.weight'],
    ]);
    expect(warnings[1]?.message).toMatch(/not a date/);
    // Estimates and targets need no date.
    input.engine!.torque = { value: 430, unit: 'lbft', provenance: 'target' };
    input.chassis!.weight = stated(3200, 'lb');
    expect(codes(input)).toEqual([]);
  });

  it('flags power-to-weight outside anything plausible', () => {
    // 450 hp on 32 kg (a weight typed in the wrong field) = 14 000 hp per tonne.
    const input = sheet();
    input.chassis!.weight = stated(32, 'kg');
    expect(specCheck(input)[0]).toMatchObject({
      code: 'power_to_weight_implausible',
      section: 'chassis',
      field: 'chassis.weight',
    });
    // 45 hp on 3200 lb = 31 hp per tonne: slow, but real cars have been.
    input.chassis!.weight = stated(3200, 'lb');
    input.engine!.flywheelPower = stated(45, 'hp');
    input.engine!.wheelPower = undefined;
    expect(codes(input)).toEqual([]);
  });

  it('turns unreadable figures into warnings instead of throwing', () => {
    // Our rule: the check runs live on half-typed sheets, so it never throws.
    const input = sheet();
    input.wheels!.rear!.tyre = 'banana';
    input.drivetrain!.gearRatios = [2.52, 0, 1, 0.7];
    input.chassis!.weight = stated(3200, 'hp');
    input.engine!.bore = stated(Number.NaN, 'in');
    const warnings = specCheck(input);
    expect(warnings.map((w) => [w.code, w.field])).toEqual(
      expect.arrayContaining([
        ['tyre_code_unreadable', 'wheels.rear.tyre'],
        ['figure_unreadable', 'drivetrain.gearRatios.1'],
        ['figure_unreadable', 'chassis.weight'],
        ['figure_unreadable', 'engine.bore'],
      ]),
    );
    expect(warnings.find((w) => w.code === 'tyre_code_unreadable')?.message).toMatch(
      /not a metric size/,
    );
  });

  it('never throws and never prints NaN or Infinity, whatever is typed', () => {
    // Property over messy input.
    const figure = fc.option(
      fc.record({
        value: fc.oneof(fc.double(), fc.integer({ min: -10, max: 10000 })),
        unit: fc.constantFrom(
          'in',
          'mm',
          'hp',
          'kW',
          'L',
          'cc',
          'lb',
          'kg',
          'mph',
          'km/h',
          '',
          'x',
        ),
        provenance: fc.constantFrom('measured', 'estimated', 'target'),
        measuredOn: fc.option(fc.constantFrom('2024-01-02', '', 'yesterday'), { nil: undefined }),
      }) as fc.Arbitrary<Figure>,
      { nil: undefined },
    );
    const tyre = fc.option(
      fc.oneof(fc.constantFrom('285/35R18', '33x12.50R15', '225/50R15', 'P215/65R15'), fc.string()),
      { nil: undefined },
    );
    const number = fc.option(fc.oneof(fc.double(), fc.integer({ min: -2, max: 9000 })), {
      nil: undefined,
    });
    const end = fc.record({ tyre, rimWidth: figure, offset: figure, backspacing: figure });
    const input = fc.record({
      engine: fc.record({
        bore: figure,
        stroke: figure,
        cylinders: number,
        displacement: figure,
        flywheelPower: figure,
        wheelPower: figure,
        revLimitRpm: number,
      }),
      drivetrain: fc.record({
        gearRatios: fc.option(fc.array(fc.double(), { maxLength: 6 }), { nil: undefined }),
        finalDrive: number,
      }),
      wheels: fc.record({ front: end, rear: end, raked: fc.boolean() }),
      chassis: fc.record({ weight: figure }),
      performance: fc.record({ topSpeed: figure }),
    }) as fc.Arbitrary<SpecCheckInput>;
    fc.assert(
      fc.property(input, (sheetInput) => {
        for (const w of specCheck(sheetInput)) {
          expect(SPEC_SECTIONS).toContain(w.section);
          expect(w.message + w.why).not.toMatch(/NaN|Infinity/);
          expect(w.field.split('.')[0]).toBe(w.section);
        }
      }),
      { numRuns: 300 },
    );
  });
});
