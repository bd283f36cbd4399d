import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { all, create } from 'mathjs';
import {
  UNITS,
  convert,
  convertQuantity,
  hpToW,
  inToMm,
  kgToLb,
  lbftToNm,
  lbPerInToNPerMm,
  lbToKg,
  mmToIn,
  mphToKmh,
  parseUnit,
  preferredUnit,
  psToW,
  psiToPa,
  in3ToCm3,
  toSystem,
  type QuantityKind,
  type UnitOf,
} from '@shared/calc/units';
import { CalcInputError } from '@shared/calc/errors';

// mathjs is a general-purpose reference library; it has no metric horsepower, so we define one
// on a private instance as 735.49875 W (75 kgf·m/s, NIST SP 811 B.8).
const math = create(all ?? {});
math.createUnit('metrichorsepower', '735.49875 W');

// Our unit id → the same unit in mathjs syntax.
const MATHJS_NAMES: { [K in QuantityKind]: Record<UnitOf<K>, string> } = {
  length: { mm: 'mm', cm: 'cm', m: 'm', km: 'km', in: 'inch', ft: 'ft', mi: 'mi' },
  mass: { kg: 'kg', g: 'g', t: 'tonne', lb: 'lbm' },
  force: { N: 'N', kN: 'kN', lbf: 'lbf', kgf: 'kgf' },
  torque: { Nm: 'N m', lbft: 'lbf ft' },
  power: { W: 'W', kW: 'kW', hp: 'hp', PS: 'metrichorsepower' },
  pressure: { Pa: 'Pa', kPa: 'kPa', bar: 'bar', psi: 'psi' },
  volume: { cm3: 'cm^3', L: 'L', in3: 'cuin' },
  speed: { 'km/h': 'km/h', mph: 'mi/h', 'm/s': 'm/s' },
  springRate: { 'N/mm': 'N/mm', 'N/m': 'N/m', 'lb/in': 'lbf/inch', 'kgf/mm': 'kgf/mm' },
  density: { 'kg/m3': 'kg/m^3', 'g/cm3': 'g/cm^3', 'lb/in3': 'lbm/inch^3' },
  massPerLength: { 'kg/m': 'kg/m', 'lb/ft': 'lbm/ft' },
};

const kinds = Object.keys(UNITS) as QuantityKind[];
const unitsOf = <K extends QuantityKind>(kind: K) => Object.keys(UNITS[kind]) as UnitOf<K>[];

function relative(a: number, b: number): number {
  return Math.abs(a - b) / Math.max(Math.abs(a), Math.abs(b));
}

describe('conversion factors', () => {
  it('agree with mathjs to 1e-9 relative for every pair of units of a kind', () => {
    // Reference: mathjs 15 unit definitions (general-purpose reference library).
    for (const kind of kinds) {
      const names: Record<string, string> = MATHJS_NAMES[kind];
      for (const from of unitsOf(kind)) {
        for (const to of unitsOf(kind)) {
          const ours = convert(kind, 1, from, to);
          const theirs = math.unit(1, names[from] as string).toNumber(names[to] as string);
          expect(relative(ours, theirs), `${kind}: ${from} → ${to}`).toBeLessThan(1e-9);
        }
      }
    }
  });

  it('use the exact definitional values', () => {
    // NIST SP 811 Appendix B.8; NIST Handbook 44 Appendix C.
    expect(inToMm(1)).toBe(25.4);
    expect(lbToKg(1)).toBe(0.45359237);
    // 1.3558179483314004 and 745.69987158227022 exactly: checked to the last digit a double holds.
    expect(lbftToNm(1)).toBeCloseTo(1.3558179483314, 15);
    expect(hpToW(1)).toBeCloseTo(745.69987158227, 12);
    expect(psToW(1)).toBe(735.49875);
    expect(psiToPa(1)).toBe(6894.757293168361);
    expect(convert('pressure', 1, 'bar', 'Pa')).toBe(100000);
    expect(in3ToCm3(1)).toBe(16.387064);
    expect(convert('length', 1, 'mi', 'm')).toBe(1609.344);
    expect(mphToKmh(1)).toBe(1.609344);
  });

  it('convert the other way by dividing by the same factors', () => {
    // NIST SP 811 Appendix B.8 (the inverse of each definition).
    expect(mmToIn(25.4)).toBe(1);
    expect(kgToLb(0.45359237)).toBe(1);
    expect(mmToIn(1)).toBeCloseTo(0.03937007874015748, 15);
  });

  it('keep mechanical hp, metric hp and kW apart', () => {
    // Derived from the definitions above: 1 PS = 735.49875 / 745.69987… hp = 0.98632 hp.
    expect(convert('power', 1, 'PS', 'hp')).toBeCloseTo(0.9863200706, 9);
    expect(convert('power', 100, 'kW', 'hp')).toBeCloseTo(134.1022089595, 9);
    expect(convert('power', 100, 'kW', 'PS')).toBeCloseTo(135.9621617304, 9);
  });

  it('give spring rates in N/mm from lb/in', () => {
    // 1 lbf = 4.4482216152605 N exactly (NIST SP 811 B.8), over 25.4 mm.
    expect(lbPerInToNPerMm(400)).toBeCloseTo((400 * 4.4482216152605) / 25.4, 12);
  });

  it('round-trip any value through any pair of units', () => {
    // Property: convert(convert(v, a, b), b, a) = v.
    const pair = fc
      .constantFrom(...kinds)
      .chain((kind) =>
        fc.tuple(
          fc.constant(kind),
          fc.constantFrom(...unitsOf(kind)),
          fc.constantFrom(...unitsOf(kind)),
        ),
      );
    fc.assert(
      fc.property(pair, fc.double({ min: -1e12, max: 1e12, noNaN: true }), ([kind, a, b], v) => {
        const back = convert(kind, convert(kind, v, a, b), b, a);
        expect(Math.abs(back - v)).toBeLessThanOrEqual(Math.abs(v) * 1e-14 + 1e-300);
      }),
    );
  });

  it('reject NaN, Infinity and unknown units with a typed error', () => {
    // Our input rule: never NaN or Infinity, in or out.
    expect(() => convert('length', Number.NaN, 'in', 'mm')).toThrow(CalcInputError);
    expect(() => convert('length', Number.POSITIVE_INFINITY, 'in', 'mm')).toThrow(CalcInputError);
    expect(() => convert('length', 1, 'furlong' as UnitOf<'length'>, 'mm')).toThrow(CalcInputError);
    // 1e308 in is finite, but in mm it overflows: an error, never Infinity.
    expect(() => inToMm(1e308)).toThrow(CalcInputError);
  });
});

describe('unit systems', () => {
  it('pick the preferred unit of each system', () => {
    // Our choice of display units per system.
    expect(preferredUnit('power', 'metric')).toBe('kW');
    expect(preferredUnit('power', 'imperial')).toBe('hp');
    expect(preferredUnit('torque', 'imperial')).toBe('lbft');
    expect(preferredUnit('volume', 'metric')).toBe('L');
  });

  it('express a quantity in the preferred unit of a system', () => {
    // 450 hp × 745.69987158227022 W = 335.564942 kW (NIST SP 811 B.8).
    const metric = toSystem('power', { value: 450, unit: 'hp' }, 'metric');
    expect(metric.unit).toBe('kW');
    expect(metric.value).toBeCloseTo(335.564942212, 9);
    expect(toSystem('length', { value: 660.4, unit: 'mm' }, 'imperial')).toEqual({
      value: 26,
      unit: 'in',
    });
    expect(convertQuantity('mass', { value: 1000, unit: 'kg' }, 't')).toEqual({
      value: 1,
      unit: 't',
    });
  });
});

describe('parseUnit', () => {
  it('reads the spellings owners type', () => {
    // Our alias table; 'CV', 'ch' and 'PS' all name the metric horsepower (NIST SP 811 B.8).
    expect(parseUnit('torque', 'ft-lb')).toBe('lbft');
    expect(parseUnit('torque', 'N·m')).toBe('Nm');
    expect(parseUnit('volume', 'cc')).toBe('cm3');
    expect(parseUnit('volume', 'Litres')).toBe('L');
    expect(parseUnit('volume', 'CID')).toBe('in3');
    expect(parseUnit('power', 'bhp')).toBe('hp');
    expect(parseUnit('power', 'CV')).toBe('PS');
    expect(parseUnit('power', 'kw')).toBe('kW');
    expect(parseUnit('speed', 'KPH')).toBe('km/h');
    expect(parseUnit('length', ' inches ')).toBe('in');
  });

  it('returns undefined for a unit of another kind or none at all', () => {
    // Our parsing rule.
    expect(parseUnit('power', 'lb')).toBeUndefined();
    expect(parseUnit('length', 'hp')).toBeUndefined();
    expect(parseUnit('mass', 'toString')).toBeUndefined();
    expect(parseUnit('mass', '')).toBeUndefined();
  });
});
