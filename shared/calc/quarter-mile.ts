// Quarter-mile estimates from power and weight: ET = c_et · (lb / hp)^(1/3) and
// trap speed = c_mph · (hp / lb)^(1/3), with hp the power at the flywheel (clutch) and the weight
// with the driver. Rules of thumb fitted to runs; traction, launch, gearing and air move a real
// slip well away from them. Each formula's constants and source are with it.
import { CalcInputError, finiteResult, requirePositive } from './errors';
import { convert, type Quantity } from './units';

export interface QuarterMileFormula {
  id: 'hale' | 'huntington' | 'fox';
  label: string;
  etConstant: number;
  mphConstant: number;
  source: string;
}

export const QUARTER_MILE_FORMULAS: readonly QuarterMileFormula[] = [
  {
    id: 'hale',
    label: 'Hale',
    etConstant: 5.825,
    mphConstant: 234,
    source: 'Patrick Hale, quarter-mile performance software notes (1985–86), as quoted in “How to calculate quarter mile ET and trap speed”, racemarque.com, 2014',
  },
  {
    id: 'huntington',
    label: 'Huntington',
    etConstant: 6.29,
    mphConstant: 224,
    source: 'Roger Huntington, “Horsepower at the Drag Strip”, Rod & Custom, Dec. 1958, pp. 50–53, as given by Jeff Lucius, “Calculators for 1/4-mile ET & MPH vs. HP and weight”',
  },
  {
    id: 'fox',
    label: 'Fox',
    etConstant: 6.269,
    mphConstant: 230,
    source: 'G. T. Fox, American Journal of Physics (1973), and E. McCaul, “Drag Strip Dyno”, Hot Rod (1973), as given by Jeff Lucius, same article',
  },
];

export const DEFAULT_QUARTER_MILE_FORMULA: QuarterMileFormula['id'] = 'hale';

export function quarterMileFormula(id: QuarterMileFormula['id'] = DEFAULT_QUARTER_MILE_FORMULA): QuarterMileFormula {
  const f = QUARTER_MILE_FORMULAS.find((x) => x.id === id);
  if (!f) throw new CalcInputError('formula', 'is not one of hale, huntington or fox');
  return f;
}

const poundsAndHp = (power: Quantity<'power'>, weight: Quantity<'mass'>) => {
  requirePositive(power.value, 'power');
  requirePositive(weight.value, 'weight');
  return { hp: convert('power', power.value, power.unit, 'hp'), lb: convert('mass', weight.value, weight.unit, 'lb') };
};

export interface QuarterMileEstimate {
  formula: QuarterMileFormula;
  elapsedTimeS: number;
  trapSpeedMph: number;
  trapSpeedKmh: number;
}

export function quarterMileEstimate(input: { power: Quantity<'power'>; weight: Quantity<'mass'>; formula?: QuarterMileFormula['id'] }): QuarterMileEstimate {
  const { hp, lb } = poundsAndHp(input.power, input.weight);
  const formula = quarterMileFormula(input.formula);
  const et = finiteResult(formula.etConstant * Math.cbrt(lb / hp), 'elapsedTimeS');
  const mph = finiteResult(formula.mphConstant * Math.cbrt(hp / lb), 'trapSpeedMph');
  return { formula, elapsedTimeS: et, trapSpeedMph: mph, trapSpeedKmh: convert('speed', mph, 'mph', 'km/h') };
}

/** The reverse: the flywheel power a time slip implies, in mechanical hp, from the ET and from the trap speed. */
export function powerFromTimeSlip(input: { weight: Quantity<'mass'>; elapsedTimeS?: number; trapSpeed?: Quantity<'speed'>; formula?: QuarterMileFormula['id'] }): { fromElapsedTimeHp: number | null; fromTrapSpeedHp: number | null } {
  requirePositive(input.weight.value, 'weight');
  const lb = convert('mass', input.weight.value, input.weight.unit, 'lb');
  const f = quarterMileFormula(input.formula);
  const fromEt = input.elapsedTimeS === undefined ? null : finiteResult(lb / (requirePositive(input.elapsedTimeS, 'elapsedTimeS') / f.etConstant) ** 3, 'power');
  const fromTrap =
    input.trapSpeed === undefined
      ? null
      : finiteResult(lb * (convert('speed', requirePositive(input.trapSpeed.value, 'trapSpeed'), input.trapSpeed.unit, 'mph') / f.mphConstant) ** 3, 'power');
  return { fromElapsedTimeHp: fromEt, fromTrapSpeedHp: fromTrap };
}
