// The spec check's working state: collects warnings and turns unreadable figures into warnings
// rather than exceptions, because it runs live on whatever the owner has typed so far.
import { CalcInputError } from './errors';
import type { Figure } from './figure';
import { formatNumber, formatQuantity } from './format';
import {
  SPEC_SECTIONS,
  type SpecCheckOptions,
  type SpecSection,
  type SpecWarning,
  type SpecWarningCode,
} from './spec-check-contract';
import { tryParseTyreCode, tyreDimensions, type TyreDimensions } from './tyres';
import { convert, parseUnit, type QuantityKind, type UnitOf } from './units';

export class SpecWarningCollector {
  readonly warnings: SpecWarning[] = [];
  private readonly tyres = new Map<string, TyreDimensions | null>();

  constructor(readonly options: Required<SpecCheckOptions>) {}

  warn(code: SpecWarningCode, field: string, message: string, why: string): void {
    if (this.warnings.some((w) => w.code === code && w.field === field)) return;
    this.warnings.push({ code, section: sectionOf(field), field, message, why });
  }

  /** Runs one rule; a figure it cannot use becomes a warning instead of an exception. */
  run(field: string, rule: () => void): void {
    try {
      rule();
    } catch (error) {
      if (!(error instanceof CalcInputError)) throw error;
      this.unreadable(field, error.reason);
    }
  }

  unreadable(field: string, reason: string): void {
    this.warn(
      'figure_unreadable',
      field,
      `This figure could not be used: ${reason}.`,
      'The checks that depend on it were skipped.',
    );
  }

  /** A figure's value in `to`, or undefined (with a warning) if it cannot be read. */
  read<K extends QuantityKind>(
    kind: K,
    figure: Figure | undefined,
    to: UnitOf<K>,
    field: string,
    allowNegative = false,
  ): number | undefined {
    if (figure === undefined) return undefined;
    const unit = parseUnit(kind, String(figure.unit ?? ''));
    if (unit === undefined) {
      this.unreadable(field, `"${figure.unit}" is not a ${kind} unit`);
      return undefined;
    }
    const ok = Number.isFinite(figure.value) && (allowNegative || figure.value > 0);
    if (!ok) {
      this.unreadable(
        field,
        allowNegative ? 'it is not a number' : 'it must be a number above zero',
      );
      return undefined;
    }
    return convert(kind, figure.value, unit, to);
  }

  /** A plain number that must be above zero (a ratio, a rev limit), or undefined with a warning. */
  positive(value: number, field: string): number | undefined {
    if (typeof value === 'number' && Number.isFinite(value) && value > 0) return value;
    this.unreadable(field, 'it must be a number above zero');
    return undefined;
  }

  /** Nominal dimensions of a tyre code, or null (with a warning) if it cannot be read. */
  tyre(code: string | undefined, field: string): TyreDimensions | null {
    if (code === undefined || code.trim() === '') return null;
    if (!this.tyres.has(field)) {
      const parsed = tryParseTyreCode(code);
      if (!parsed.ok) {
        this.warn(
          'tyre_code_unreadable',
          field,
          `“${code}” could not be read as a tyre size: ${parsed.error.reason}.`,
          'The speed and stagger checks need a size code such as 285/35R18 or 33x12.50R15.',
        );
      }
      this.tyres.set(field, parsed.ok ? tyreDimensions(parsed.size) : null);
    }
    return this.tyres.get(field) ?? null;
  }
}

/** "450 hp", or the number and unit as typed if the unit is not one we know. */
export function showFigure(kind: QuantityKind, figure: Figure): string {
  const unit = parseUnit(kind, figure.unit);
  if (unit) return formatQuantity({ value: figure.value, unit });
  return `${formatNumber(figure.value)} ${figure.unit}`;
}

export function isFigure(value: object): value is Figure {
  const v = value as Partial<Figure>;
  return (
    typeof v.value === 'number' && typeof v.unit === 'string' && typeof v.provenance === 'string'
  );
}

/** A real calendar date written YYYY-MM-DD. */
export function isIsoDate(text: string | undefined): boolean {
  if (typeof text !== 'string' || !/^\d{4}-\d{2}-\d{2}$/.test(text)) return false;
  const date = new Date(`${text}T00:00:00Z`);
  return !Number.isNaN(date.getTime()) && date.toISOString().startsWith(text);
}

function sectionOf(field: string): SpecSection {
  const head = field.split('.')[0] as SpecSection;
  // Fields outside the known sections can only come from extra keys in the input.
  return SPEC_SECTIONS.includes(head) ? head : 'chassis';
}
