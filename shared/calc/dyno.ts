// A dyno run's curve: the values a curve point may hold, the peaks read from the curve, and how
// finely dyno figures are shown.
import type { TradePrecision } from './precision';

export type CurvePoint = { rpm: number; power: number; torque: number };

/**
 * What one curve point may hold, in the run's own units. The run schema and the CSV reader both read
 * these, so the preview refuses exactly what saving would. No road car's dyno sheet comes near the
 * upper ends; a negative power or torque is a misread cell (common practice).
 */
export const DYNO_POINT_LIMITS = {
  rpm: { min: 300, max: 25_000 },
  power: { min: 0, max: 5000 },
  torque: { min: 0, max: 8000 },
} as const satisfies Record<keyof CurvePoint, { min: number; max: number }>;

/** Peaks in the run's units: power up to 5000, torque up to 8000, the rpm of each a whole number. */
export const DYNO_PEAK_LIMITS = {
  power: { min: 1, max: 5000 },
  torque: { min: 1, max: 8000 },
  rpm: DYNO_POINT_LIMITS.rpm,
} as const;

/** Dyno peaks are given in whole hp, PS, kW, lb·ft and N·m (common practice): a converted peak is shown no finer. */
export const DYNO_PRECISION: TradePrecision = { hp: 0, PS: 0, kW: 0, lbft: 0, Nm: 0 };

export type CurvePeaks = { peakPower: number; peakPowerRpm: number; peakTorque: number; peakTorqueRpm: number };

/**
 * The highest power and the highest torque on a curve, each with its rpm (the lower rpm when a
 * value repeats, as a dyno sheet reads its first peak). Null for an empty curve.
 */
export function curvePeaks(points: readonly CurvePoint[]): CurvePeaks | null {
  if (!points.length) return null;
  const byRpm = [...points].sort((a, b) => a.rpm - b.rpm);
  const top = (key: 'power' | 'torque') => byRpm.reduce((best, p) => (p[key] > best[key] ? p : best), byRpm[0]!);
  const power = top('power');
  const torque = top('torque');
  return { peakPower: power.power, peakPowerRpm: Math.round(power.rpm), peakTorque: torque.torque, peakTorqueRpm: Math.round(torque.rpm) };
}
