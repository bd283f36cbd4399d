import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { powerFromTimeSlip, quarterMileEstimate, QUARTER_MILE_FORMULAS } from '@shared/calc/quarter-mile';

describe('quarter-mile estimates', () => {
  it('Hale: 3200 lb and 500 hp', () => {
    // racemarque.com, "How to calculate quarter mile ET and trap speed" (2014), Hale's constants 5.825 and 234,
    // with its example car of 3200 lb and 500 hp; worked by hand: 5.825 × 6.4^(1/3) = 10.815 s,
    // 234 × (500/3200)^(1/3) = 126.03 mph.
    const r = quarterMileEstimate({ power: { value: 500, unit: 'hp' }, weight: { value: 3200, unit: 'lb' } });
    expect(r.formula.id).toBe('hale');
    expect(r.elapsedTimeS).toBeCloseTo(10.815, 3);
    expect(r.trapSpeedMph).toBeCloseTo(126.03, 2);
  });

  it('keeps each formula’s published constants', () => {
    // Jeff Lucius, "Calculators for 1/4-mile ET & MPH vs. HP and weight": Huntington 6.290 / 224, Fox and McCaul 6.269 / 230.
    const by = Object.fromEntries(QUARTER_MILE_FORMULAS.map((f) => [f.id, [f.etConstant, f.mphConstant]]));
    expect(by).toEqual({ hale: [5.825, 234], huntington: [6.29, 224], fox: [6.269, 230] });
  });

  it('the power a time slip implies: 2000 lb in 5.825 s is 2000 hp', () => {
    // Worked example: "How to calculate horsepower from a quarter-mile" (verytime.online): ET ÷ 5.825, cubed, into the weight.
    const r = powerFromTimeSlip({ weight: { value: 2000, unit: 'lb' }, elapsedTimeS: 5.825 });
    expect(r.fromElapsedTimeHp).toBeCloseTo(2000, 9);
    expect(r.fromTrapSpeedHp).toBeNull();
  });

  it('reads a trap speed back to power: HP = W·(mph/234)³', () => {
    // piping-designer.com, "Engine horsepower", trap speed method. By hand: 3200 × (126.03/234)³ ≈ 500 hp.
    const r = powerFromTimeSlip({ weight: { value: 3200, unit: 'lb' }, trapSpeed: { value: 126.0344, unit: 'mph' } });
    expect(r.fromTrapSpeedHp).toBeCloseTo(500, 1);
  });

  it('works in metric: 1450 kg and 250 kW', () => {
    // Unit conversion (NIST SP 811) of the same formula: 3196.70 lb, 335.26 hp → 5.825 × 9.5351^(1/3) = 12.352 s.
    const r = quarterMileEstimate({ power: { value: 250, unit: 'kW' }, weight: { value: 1450, unit: 'kg' } });
    expect(r.elapsedTimeS).toBeCloseTo(12.352, 3);
  });

  it('estimate and reverse agree for every formula (property)', () => {
    // Property: the reverse is the inverse.
    fc.assert(
      fc.property(fc.double({ min: 50, max: 3000, noNaN: true }), fc.double({ min: 1000, max: 6000, noNaN: true }), fc.constantFrom('hale', 'huntington', 'fox' as const), (hp, lb, formula) => {
        const e = quarterMileEstimate({ power: { value: hp, unit: 'hp' }, weight: { value: lb, unit: 'lb' }, formula });
        const back = powerFromTimeSlip({ weight: { value: lb, unit: 'lb' }, elapsedTimeS: e.elapsedTimeS, trapSpeed: { value: e.trapSpeedMph, unit: 'mph' }, formula });
        return Math.abs((back.fromElapsedTimeHp ?? 0) / hp - 1) < 1e-9 && Math.abs((back.fromTrapSpeedHp ?? 0) / hp - 1) < 1e-9;
      }),
    );
  });

  it('refuses zero power or weight by name', () => {
    expect(() => quarterMileEstimate({ power: { value: 0, unit: 'hp' }, weight: { value: 3000, unit: 'lb' } })).toThrow(/power/);
    expect(() => quarterMileEstimate({ power: { value: 300, unit: 'hp' }, weight: { value: -1, unit: 'lb' } })).toThrow(/weight/);
  });
});
