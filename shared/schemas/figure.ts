import { z } from 'zod';
import { UNITS, convert, type QuantityKind, type Unit, type UnitOf } from '../calc/units';
import { DEFAULT_DECIMALS, UNIT_LABELS, formatNumber } from '../calc/format';

export const PROVENANCES = ['measured', 'estimated', 'target'] as const;
export const ProvenanceSchema = z.enum(PROVENANCES, { error: 'Say whether the figure is measured, estimated or a target.' });

import { calendarDate } from './dates';
export { shortText } from './text';

type Range<K extends QuantityKind> = { label: string; min: number; max: number; unit: UnitOf<K> };

/**
 * A build-sheet figure of one kind (length, mass, power, …): value, unit, provenance, and when
 * measured, the date and an optional evidence photo. The range is checked in the range's own unit
 * whatever unit the owner typed, so "a 200-inch rim" fails the same as "5 m".
 */
export function figureSchema<K extends QuantityKind>(kind: K, range: Range<K>) {
  const units = Object.keys(UNITS[kind]) as [UnitOf<K>, ...UnitOf<K>[]];
  return z
    .object({
      value: z.number({ error: `${range.label} must be a number.` }).finite({ error: `${range.label} must be a finite number.` }),
      unit: z.enum(units, { error: `${range.label}: the unit must be one of ${units.join(', ')}.` }),
      provenance: ProvenanceSchema,
      measuredOn: calendarDate('Measurement date').optional(),
      evidencePhotoId: z.number().int().positive().optional(),
    })
    .superRefine((f, ctx) => {
      const inRangeUnit = convert(kind, f.value, f.unit, range.unit);
      if (inRangeUnit < range.min || inRangeUnit > range.max) {
        ctx.addIssue({ code: 'custom', path: ['value'], message: figureRangeMessage(kind, range, f.unit) });
      }
      if (f.measuredOn && f.provenance !== 'measured') {
        ctx.addIssue({ code: 'custom', path: ['measuredOn'], message: 'Only a measured figure has a measurement date.' });
      }
    });
}

/**
 * "Bore must be between 20 and 200 mm." When the owner typed another unit, the range leads in that
 * unit and the rule's own follows ("Bore must be between 0.79 and 7.87 in (20 to 200 mm)."), so
 * inches need no sums. The one wording the form and the API both show.
 */
export function figureRangeMessage<K extends QuantityKind>(kind: K, range: Range<K>, typedUnit?: string): string {
  if (!typedUnit || typedUnit === range.unit || !(typedUnit in UNITS[kind])) return `${range.label} must be between ${range.min} and ${range.max} ${range.unit}.`;
  const unit = typedUnit as UnitOf<K>;
  const inTyped = (v: number) => formatNumber(convert(kind, v, range.unit, unit), { decimals: DEFAULT_DECIMALS[unit as Unit] });
  return `${range.label} must be between ${inTyped(range.min)} and ${inTyped(range.max)}\u00a0${UNIT_LABELS[unit as Unit]} (${range.min} to ${range.max} ${range.unit}).`;
}

export type FigureInput = {
  value: number;
  unit: string;
  provenance: (typeof PROVENANCES)[number];
  measuredOn?: string;
  evidencePhotoId?: number;
};

/** A length the sheet keeps as plain millimetres (four-link pivots, centre of gravity height, bell-crank arms). */
export type MmRange = { label: string; min: number; max: number };

/** "… must be between 3.94 and 59.06 in (100 to 1500 mm).": led by the unit the person typed in. */
export function mmRangeMessage(range: MmRange, typedUnit: 'mm' | 'in' = 'mm'): string {
  if (typedUnit === 'mm') return `${range.label} must be between ${range.min} and ${range.max} mm.`;
  const inches = (v: number) => formatNumber(convert('length', v, 'mm', 'in'), { decimals: 2 });
  return `${range.label} must be between ${inches(range.min)} and ${inches(range.max)}\u00a0in (${range.min} to ${range.max} mm).`;
}

/** A plain-millimetre length with its limits; the message gives the unit. */
export const plainMm = (range: MmRange) =>
  z
    .number({ error: `${range.label} must be a number.` })
    .finite({ error: `${range.label} must be a number.` })
    .min(range.min, { error: mmRangeMessage(range) })
    .max(range.max, { error: mmRangeMessage(range) });

/** A plain number with limits (ratios, counts, rpm), with an error that names the rule. */
export const boundedNumber = (label: string, min: number, max: number, opts: { int?: boolean } = {}) => {
  const base = z.number({ error: `${label} must be a number.` }).finite({ error: `${label} must be a finite number.` });
  return (opts.int ? base.int({ error: `${label} must be a whole number.` }) : base)
    .min(min, { error: `${label} must be at least ${min}.` })
    .max(max, { error: `${label} must be at most ${max}.` });
};
