// Unit conversions with exact definitional factors (NIST SP 811 Appendix B.8; NIST Handbook 44
// Appendix C). Our own small table rather than a units library, to keep the phone bundle light.
import { CalcInputError, finiteResult, requireFinite } from './errors';

// Exact by definition: 1 lbf = 0.45359237 kg × 9.80665 m/s² (standard gravity).
const POUND_FORCE_N = 4.4482216152605;
// 1 lbf·ft = 1.3558179483314004 N·m exactly; derived here because a double cannot hold all
// those digits (the literal would lose precision and draw a lint error).
const POUND_FOOT_NM = POUND_FORCE_N * 0.3048;
// 1 hp = 550 ft·lbf/s = 745.69987158227022 W exactly; derived for the same reason.
const HORSEPOWER_W = 550 * POUND_FORCE_N * 0.3048;

/**
 * How many base units one of each unit is. Each kind's base is chosen so the common factors are
 * short exact decimals (25.4 mm per inch, 16.387064 cm³ per in³), which keeps conversions from
 * the base as close to exact as floating point allows.
 */
export const UNITS = {
  length: { mm: 1, cm: 10, m: 1000, km: 1_000_000, in: 25.4, ft: 304.8, mi: 1_609_344 },
  mass: { kg: 1, g: 0.001, t: 1000, lb: 0.45359237 },
  force: { N: 1, kN: 1000, lbf: POUND_FORCE_N, kgf: 9.80665 },
  torque: { Nm: 1, lbft: POUND_FOOT_NM },
  // Mechanical hp (550 ft·lbf/s), metric hp (PS, 75 kgf·m/s) and kW are three different units.
  power: { W: 1, kW: 1000, hp: HORSEPOWER_W, PS: 735.49875 },
  pressure: { Pa: 1, kPa: 1000, bar: 100_000, psi: 6894.757293168361 },
  volume: { cm3: 1, L: 1000, in3: 16.387064 },
  speed: { 'km/h': 1, mph: 1.609344, 'm/s': 3.6 },
  springRate: { 'N/mm': 1, 'N/m': 0.001, 'lb/in': POUND_FORCE_N / 25.4, 'kgf/mm': 9.80665 },
  density: { 'kg/m3': 1, 'g/cm3': 1000, 'lb/in3': 0.45359237 / 16.387064e-6 },
  massPerLength: { 'kg/m': 1, 'lb/ft': 0.45359237 / 0.3048 },
} as const satisfies Record<string, Record<string, number>>;

export type QuantityKind = keyof typeof UNITS;
export type UnitOf<K extends QuantityKind> = keyof (typeof UNITS)[K] & string;
/** Any unit of any kind; unit ids are unique across kinds. */
export type Unit = { [K in QuantityKind]: UnitOf<K> }[QuantityKind];

export type LengthUnit = UnitOf<'length'>;
export type MassUnit = UnitOf<'mass'>;
export type TorqueUnit = UnitOf<'torque'>;
export type PowerUnit = UnitOf<'power'>;
export type PressureUnit = UnitOf<'pressure'>;
export type VolumeUnit = UnitOf<'volume'>;
export type SpeedUnit = UnitOf<'speed'>;
export type SpringRateUnit = UnitOf<'springRate'>;
export type DensityUnit = UnitOf<'density'>;

/** A number that always says which unit it is in. */
export interface Quantity<K extends QuantityKind> {
  value: number;
  unit: UnitOf<K>;
}

/**
 * Metric, imperial, or as the trade in Britain writes it: metric for size, weight and pressure, but
 * power in hp, torque in lb·ft and speed in mph (common practice in British motoring print; from memory).
 */
export type UnitSystem = 'metric' | 'imperial' | 'uk';

export const PREFERRED_UNITS: { [S in UnitSystem]: { [K in QuantityKind]: UnitOf<K> } } = {
  metric: {
    length: 'mm',
    mass: 'kg',
    force: 'N',
    torque: 'Nm',
    power: 'kW',
    pressure: 'bar',
    volume: 'L',
    speed: 'km/h',
    springRate: 'N/mm',
    density: 'kg/m3',
    massPerLength: 'kg/m',
  },
  imperial: {
    length: 'in',
    mass: 'lb',
    force: 'lbf',
    torque: 'lbft',
    power: 'hp',
    pressure: 'psi',
    volume: 'in3',
    speed: 'mph',
    springRate: 'lb/in',
    density: 'lb/in3',
    massPerLength: 'lb/ft',
  },
  uk: {
    length: 'mm',
    mass: 'kg',
    force: 'N',
    torque: 'lbft',
    power: 'hp',
    pressure: 'bar',
    volume: 'L',
    speed: 'mph',
    springRate: 'N/mm',
    density: 'kg/m3',
    massPerLength: 'kg/m',
  },
};

function factorOf<K extends QuantityKind>(kind: K, unit: UnitOf<K>, field: string): number {
  const table: Record<string, number> = UNITS[kind];
  const factor = Object.hasOwn(table, unit) ? table[unit] : undefined;
  if (factor === undefined) throw new CalcInputError(field, `"${unit}" is not a ${kind} unit`);
  return factor;
}

export function isUnitOf<K extends QuantityKind>(kind: K, unit: string): unit is UnitOf<K> {
  return Object.hasOwn(UNITS[kind], unit);
}

export function convert<K extends QuantityKind>(
  kind: K,
  value: number,
  from: UnitOf<K>,
  to: UnitOf<K>,
): number {
  requireFinite(value, 'value');
  if (from === to) return value;
  const result = (value * factorOf(kind, from, 'from')) / factorOf(kind, to, 'to');
  return finiteResult(result, 'value');
}

export function convertQuantity<K extends QuantityKind>(
  kind: K,
  quantity: Quantity<K>,
  to: UnitOf<K>,
): Quantity<K> {
  return { value: convert(kind, quantity.value, quantity.unit, to), unit: to };
}

export function preferredUnit<K extends QuantityKind>(kind: K, system: UnitSystem): UnitOf<K> {
  return PREFERRED_UNITS[system][kind];
}

/** The same quantity in the preferred unit of a system (e.g. 450 hp → 335.6 kW for metric). */
export function toSystem<K extends QuantityKind>(
  kind: K,
  quantity: Quantity<K>,
  system: UnitSystem,
): Quantity<K> {
  return convertQuantity(kind, quantity, preferredUnit(kind, system));
}

// Spellings owners type, mapped to our unit ids. 'hp', 'bhp' and 'whp' are mechanical hp;
// 'PS', 'CV', 'ch' and 'pk' are the metric hp. Compared case-insensitively, spaces ignored.
const UNIT_ALIASES: { [K in QuantityKind]: Record<string, UnitOf<K>> } = {
  length: {
    millimetre: 'mm',
    millimetres: 'mm',
    millimeter: 'mm',
    millimeters: 'mm',
    inch: 'in',
    inches: 'in',
    '"': 'in',
    foot: 'ft',
    feet: 'ft',
    mile: 'mi',
    miles: 'mi',
  },
  mass: { kgs: 'kg', lbs: 'lb', pound: 'lb', pounds: 'lb', tonne: 't', tonnes: 't' },
  force: {},
  torque: {
    'n·m': 'Nm',
    'n-m': 'Nm',
    'n.m': 'Nm',
    'lb·ft': 'lbft',
    'lb-ft': 'lbft',
    'lbf·ft': 'lbft',
    'lbf-ft': 'lbft',
    'ft-lb': 'lbft',
    'ft·lb': 'lbft',
    'ft-lbs': 'lbft',
    ftlb: 'lbft',
    'lbs-ft': 'lbft',
  },
  power: { bhp: 'hp', whp: 'hp', cv: 'PS', ch: 'PS', pk: 'PS' },
  pressure: {},
  volume: {
    cc: 'cm3',
    'cm³': 'cm3',
    ml: 'cm3',
    l: 'L',
    litre: 'L',
    litres: 'L',
    liter: 'L',
    liters: 'L',
    'in³': 'in3',
    ci: 'in3',
    cid: 'in3',
    cuin: 'in3',
  },
  speed: { kph: 'km/h', kmh: 'km/h' },
  springRate: { 'lbs/in': 'lb/in', 'lbf/in': 'lb/in', 'kg/mm': 'kgf/mm' },
  density: { 'kg/m³': 'kg/m3', 'lb/in³': 'lb/in3', 'g/cm³': 'g/cm3' },
  massPerLength: { 'lbs/ft': 'lb/ft' },
};

/** Reads a typed unit ("ft-lb", "cc", "Litres") as one of our ids, or undefined if unknown. */
export function parseUnit<K extends QuantityKind>(kind: K, text: string): UnitOf<K> | undefined {
  const trimmed = text.trim();
  if (isUnitOf(kind, trimmed)) return trimmed;
  const key = trimmed.toLowerCase().replace(/\s+/g, '');
  for (const id of Object.keys(UNITS[kind])) {
    if (id.toLowerCase() === key) return id as UnitOf<K>;
  }
  const aliases: Record<string, UnitOf<K>> = UNIT_ALIASES[kind];
  return Object.hasOwn(aliases, key) ? aliases[key] : undefined;
}

// Named one-way helpers for the most common pairs; each is `convert` with the units spelled out.
export const inToMm = (inches: number): number => convert('length', inches, 'in', 'mm');
export const mmToIn = (mm: number): number => convert('length', mm, 'mm', 'in');
export const milesToKm = (miles: number): number => convert('length', miles, 'mi', 'km');
export const kmToMiles = (km: number): number => convert('length', km, 'km', 'mi');
export const lbToKg = (lb: number): number => convert('mass', lb, 'lb', 'kg');
export const kgToLb = (kg: number): number => convert('mass', kg, 'kg', 'lb');
export const lbftToNm = (lbft: number): number => convert('torque', lbft, 'lbft', 'Nm');
export const nmToLbft = (nm: number): number => convert('torque', nm, 'Nm', 'lbft');
export const hpToW = (hp: number): number => convert('power', hp, 'hp', 'W');
export const wToHp = (w: number): number => convert('power', w, 'W', 'hp');
export const hpToKw = (hp: number): number => convert('power', hp, 'hp', 'kW');
export const kwToHp = (kw: number): number => convert('power', kw, 'kW', 'hp');
export const psToW = (ps: number): number => convert('power', ps, 'PS', 'W');
export const wToPs = (w: number): number => convert('power', w, 'W', 'PS');
export const psToKw = (ps: number): number => convert('power', ps, 'PS', 'kW');
export const kwToPs = (kw: number): number => convert('power', kw, 'kW', 'PS');
export const psiToPa = (psi: number): number => convert('pressure', psi, 'psi', 'Pa');
export const paToPsi = (pa: number): number => convert('pressure', pa, 'Pa', 'psi');
export const psiToKpa = (psi: number): number => convert('pressure', psi, 'psi', 'kPa');
export const kpaToPsi = (kpa: number): number => convert('pressure', kpa, 'kPa', 'psi');
export const psiToBar = (psi: number): number => convert('pressure', psi, 'psi', 'bar');
export const barToPsi = (bar: number): number => convert('pressure', bar, 'bar', 'psi');
export const in3ToCm3 = (in3: number): number => convert('volume', in3, 'in3', 'cm3');
export const cm3ToIn3 = (cm3: number): number => convert('volume', cm3, 'cm3', 'in3');
export const litresToIn3 = (litres: number): number => convert('volume', litres, 'L', 'in3');
export const in3ToLitres = (in3: number): number => convert('volume', in3, 'in3', 'L');
export const mphToKmh = (mph: number): number => convert('speed', mph, 'mph', 'km/h');
export const kmhToMph = (kmh: number): number => convert('speed', kmh, 'km/h', 'mph');
export const lbPerInToNPerMm = (lbPerIn: number): number =>
  convert('springRate', lbPerIn, 'lb/in', 'N/mm');
export const nPerMmToLbPerIn = (nPerMm: number): number =>
  convert('springRate', nPerMm, 'N/mm', 'lb/in');
