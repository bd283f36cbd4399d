// Display helpers: a figure is always printed with its unit, and never as NaN or Infinity.
import type { Unit } from './units';

/** What a missing or impossible figure prints as. */
export const NO_FIGURE = '—';

export const UNIT_LABELS: Record<Unit, string> = {
  mm: 'mm',
  cm: 'cm',
  m: 'm',
  km: 'km',
  in: 'in',
  ft: 'ft',
  mi: 'mi',
  kg: 'kg',
  g: 'g',
  t: 't',
  lb: 'lb',
  N: 'N',
  kN: 'kN',
  lbf: 'lbf',
  kgf: 'kgf',
  Nm: 'N·m',
  lbft: 'lb·ft',
  W: 'W',
  kW: 'kW',
  hp: 'hp',
  PS: 'PS',
  Pa: 'Pa',
  kPa: 'kPa',
  bar: 'bar',
  psi: 'psi',
  cm3: 'cm³',
  L: 'L',
  in3: 'in³',
  'km/h': 'km/h',
  mph: 'mph',
  'm/s': 'm/s',
  'N/mm': 'N/mm',
  'N/m': 'N/m',
  'lb/in': 'lb/in',
  'kgf/mm': 'kgf/mm',
  'kg/m3': 'kg/m³',
  'g/cm3': 'g/cm³',
  'lb/in3': 'lb/in³',
  'kg/m': 'kg/m',
  'lb/ft': 'lb/ft',
};

// Decimals that suit each unit on a build sheet (a litre figure wants one, a kg figure none).
export const DEFAULT_DECIMALS: Record<Unit, number> = {
  mm: 0,
  cm: 1,
  m: 2,
  km: 1,
  in: 2,
  ft: 1,
  mi: 1,
  kg: 0,
  g: 0,
  t: 2,
  lb: 0,
  N: 0,
  kN: 2,
  lbf: 0,
  kgf: 0,
  Nm: 0,
  lbft: 0,
  W: 0,
  kW: 0,
  hp: 0,
  PS: 0,
  Pa: 0,
  kPa: 0,
  bar: 2,
  psi: 1,
  cm3: 0,
  L: 1,
  in3: 0,
  'km/h': 0,
  mph: 0,
  'm/s': 1,
  'N/mm': 1,
  'N/m': 0,
  'lb/in': 0,
  'kgf/mm': 2,
  'kg/m3': 0,
  'g/cm3': 2,
  'lb/in3': 4,
  'kg/m': 3,
  'lb/ft': 3,
};

export interface FormatOptions {
  decimals?: number;
  /** A BCP 47 tag for digit grouping and the decimal sign; defaults to 'en-US'. */
  locale?: string;
}

export function formatNumber(value: number, options: FormatOptions = {}): string {
  if (typeof value !== 'number' || !Number.isFinite(value)) return NO_FIGURE;
  const decimals = clampDecimals(options.decimals ?? 0);
  const scale = 10 ** decimals;
  // Round first so a tiny negative never prints as "-0"; `+ 0` turns -0 into 0.
  const rounded = Math.round(value * scale) / scale + 0;
  if (!Number.isFinite(rounded)) return NO_FIGURE;
  return new Intl.NumberFormat(options.locale ?? 'en-US', {
    minimumFractionDigits: decimals,
    maximumFractionDigits: decimals,
  }).format(rounded);
}

/** "450 hp", "4.9 L", "285 N·m"; a no-break space keeps the unit on the number's line. */
export function formatQuantity(
  quantity: { value: number; unit: Unit },
  options: FormatOptions = {},
): string {
  const number = formatNumber(quantity.value, {
    ...options,
    decimals: options.decimals ?? DEFAULT_DECIMALS[quantity.unit],
  });
  if (number === NO_FIGURE) return NO_FIGURE;
  return `${number}\u00a0${UNIT_LABELS[quantity.unit]}`;
}

/** A value already in percent (52.3 → "52.3%"), as corner weights and anti-squat are. */
export function formatPercent(percent: number, options: FormatOptions = {}): string {
  const number = formatNumber(percent, { ...options, decimals: options.decimals ?? 1 });
  return number === NO_FIGURE ? NO_FIGURE : `${number}%`;
}

function clampDecimals(decimals: number): number {
  if (!Number.isFinite(decimals)) return 0;
  return Math.min(10, Math.max(0, Math.round(decimals)));
}
