// How many decimals a figure is shown with: never more than the owner's own figure carries, and no
// finer than the trade gives that measurement.
import { DEFAULT_DECIMALS } from './format';
import { convert, type QuantityKind, type Unit, type UnitOf } from './units';

/** The finest the trade gives a measurement, as decimals per unit it is shown in (e.g. rotors: { mm: 0, in: 2 }). */
export type TradePrecision = Partial<Record<Unit, number>>;

const MOST_DECIMALS = 3;

/** Decimals of a number as it was typed (JSON keeps 2.50 as 2.5: the trailing zero is the one thing lost). */
export function enteredDecimals(value: number): number {
  const text = String(Math.abs(value));
  if (text.includes('e')) return MOST_DECIMALS;
  const point = text.indexOf('.');
  return point < 0 ? 0 : Math.min(MOST_DECIMALS, text.length - point - 1);
}

/**
 * Decimals for `value` typed in `from` and shown in `to`. In the unit it was typed in, as typed. Converted,
 * as fine as one step of the typed figure is in the new unit (355 mm is good to a millimetre, which
 * is 0.04 in: two decimals), but never finer than the trade's precision for the unit shown
 * (`trade[to]`, else the unit's usual decimals).
 */
export function shownDecimals<K extends QuantityKind>(kind: K, value: number, from: UnitOf<K>, to: UnitOf<K>, trade: TradePrecision = {}): number {
  const typed = enteredDecimals(value);
  if (from === to) return typed;
  const step = Math.abs(convert(kind, 10 ** -typed, from, to));
  const needed = step > 0 ? Math.max(0, Math.ceil(-Math.log10(step) - 1e-9)) : 0;
  return Math.min(needed, trade[to as Unit] ?? DEFAULT_DECIMALS[to as Unit] ?? MOST_DECIMALS);
}
