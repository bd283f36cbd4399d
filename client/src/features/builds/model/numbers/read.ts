import { CalcInputError, DEFAULT_DECIMALS, figureValueIn, formatNumber, formatQuantity, toSystem, type QuantityKind, type Unit, type UnitOf, type UnitSystem } from '@shared/calc';
import type { FigureInput } from '@shared/schemas/figure';

/** A figure's value in one unit, or undefined when it is missing or does not read. */
export function read<K extends QuantityKind>(kind: K, figure: FigureInput | undefined | null, unit: UnitOf<K>): number | undefined {
  if (!figure || typeof figure.value !== 'number' || !Number.isFinite(figure.value)) return undefined;
  try {
    return figureValueIn(kind, figure, unit);
  } catch (err) {
    if (err instanceof CalcInputError) return undefined;
    throw err;
  }
}

export const num = (v: unknown): number | undefined => (typeof v === 'number' && Number.isFinite(v) ? v : undefined);

/** Runs a computation; nonsense input (CalcInputError) gives undefined instead of NaN on screen. */
export function attempt<T>(fn: () => T): { ok: true; value: T } | { ok: false; reason: string } {
  try {
    return { ok: true, value: fn() };
  } catch (err) {
    if (err instanceof CalcInputError) return { ok: false, reason: `${err.field}: ${err.reason}` };
    throw err;
  }
}

/** A quantity in the wanted system's unit, formatted; extra decimals where the default is too coarse. */
export function show<K extends QuantityKind>(kind: K, value: number, unit: UnitOf<K>, system: UnitSystem, extraDecimals = 0): string {
  const r = attempt(() => toSystem(kind, { value, unit }, system));
  if (!r.ok) return '';
  const q = r.value as { value: number; unit: Unit };
  return formatQuantity(q, extraDecimals ? { decimals: defaultDecimals(q.unit) + extraDecimals } : {});
}

const defaultDecimals = (unit: Unit) => DEFAULT_DECIMALS[unit] ?? 0;

export const fmt = (value: number, decimals = 0) => formatNumber(value, { decimals });

/** The weakest provenance among a result's inputs: any target makes it a target, else any estimate an estimate. */
export function weakest(...figures: (FigureInput | undefined | null)[]): 'estimated' | 'target' | undefined {
  const words = figures.map((f) => f?.provenance);
  if (words.includes('target')) return 'target';
  if (words.includes('estimated')) return 'estimated';
  return undefined;
}

/** `{ provenance }` to spread into a row, or nothing for a result from measured figures. */
export const firmness = (...figures: (FigureInput | undefined | null)[]) => {
  const p = weakest(...figures);
  return p ? { provenance: p } : {};
};
