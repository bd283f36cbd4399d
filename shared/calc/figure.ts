// A figure as the build sheet holds it: a number, its unit as typed, and where it came from.
// Plain TypeScript on purpose; the build-sheet schema maps onto this for the spec check.
import { CalcInputError } from './errors';
import { convert, parseUnit, type QuantityKind, type UnitOf } from './units';

export type Provenance = 'measured' | 'estimated' | 'target';

export interface Figure {
  value: number;
  /** As typed or chosen: "hp", "kW", "lb-ft", "cc"... read with `parseUnit`. */
  unit: string;
  provenance: Provenance;
  /** ISO date (YYYY-MM-DD) of the measurement, e.g. the dyno day or the weigh-in. */
  measuredOn?: string;
}

/** The figure's value in the wanted unit; throws CalcInputError if its unit is not of that kind. */
export function figureValueIn<K extends QuantityKind>(
  kind: K,
  figure: Figure,
  to: UnitOf<K>,
  field = 'figure',
): number {
  const unit = parseUnit(kind, figure.unit);
  if (unit === undefined) {
    throw new CalcInputError(field, `"${figure.unit}" is not a ${kind} unit`);
  }
  return convert(kind, figure.value, unit, to);
}
