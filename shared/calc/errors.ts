// Typed rejection of nonsense input, and guards that keep NaN and Infinity out of every result.

/** Thrown when an input cannot give a meaningful figure (zero length, NaN, bad tyre code). */
export class CalcInputError extends Error {
  override readonly name: string = 'CalcInputError';
  /** The offending input, as a dotted path or parameter name (e.g. `gears[2]`, `wallThickness`). */
  readonly field: string;
  /** Why it was rejected, in plain words. */
  readonly reason: string;

  constructor(field: string, reason: string) {
    super(`${field}: ${reason}`);
    this.field = field;
    this.reason = reason;
  }
}

/** A tyre size code that could not be read; `code` is the text as given. */
export class TyreCodeError extends CalcInputError {
  override readonly name: string = 'TyreCodeError';
  readonly code: string;

  constructor(code: string, reason: string, field = 'tyreCode') {
    super(field, reason);
    this.code = code;
  }
}

export function requireFinite(value: number, field: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new CalcInputError(field, 'must be a finite number');
  }
  return value;
}

export function requirePositive(value: number, field: string): number {
  requireFinite(value, field);
  if (value <= 0) throw new CalcInputError(field, 'must be greater than zero');
  return value;
}

export function requireNonNegative(value: number, field: string): number {
  requireFinite(value, field);
  if (value < 0) throw new CalcInputError(field, 'must not be negative');
  return value;
}

export function requirePositiveInteger(value: number, field: string): number {
  requirePositive(value, field);
  if (!Number.isInteger(value)) throw new CalcInputError(field, 'must be a whole number');
  return value;
}

/** A fraction in [0, max): e.g. a drivetrain loss, which must stay below 1 to leave any power. */
export function requireFraction(value: number, field: string, max = 1): number {
  requireNonNegative(value, field);
  if (value >= max) throw new CalcInputError(field, `must be below ${max}`);
  return value;
}

/**
 * Guards a computed value: finite inputs can still overflow (1e200 × 1e200),
 * and the editor must never show NaN or Infinity.
 */
export function finiteResult(value: number, field: string): number {
  if (!Number.isFinite(value)) {
    throw new CalcInputError(field, 'inputs are too large to give a finite result');
  }
  return value;
}
