import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { NO_FIGURE, formatNumber, formatPercent, formatQuantity } from '@shared/calc/format';

describe('formatNumber', () => {
  it('rounds to the decimals asked for and groups thousands', () => {
    // Our display rule, with en-US grouping (Unicode CLDR).
    expect(formatNumber(4942.2221, { decimals: 1 })).toBe('4,942.2');
    expect(formatNumber(7.11111, { decimals: 2 })).toBe('7.11');
    expect(formatNumber(301.59)).toBe('302');
  });

  it('follows the locale for grouping and the decimal sign', () => {
    // Unicode CLDR conventions for de-DE: "." groups thousands, "," is the decimal sign.
    expect(formatNumber(4942.2221, { decimals: 1, locale: 'de-DE' })).toBe('4.942,2');
  });

  it('never prints NaN, Infinity or "-0"', () => {
    // Our display rule; checked over arbitrary doubles.
    expect(formatNumber(Number.NaN)).toBe(NO_FIGURE);
    expect(formatNumber(Number.POSITIVE_INFINITY)).toBe(NO_FIGURE);
    expect(formatNumber(-0.0001, { decimals: 2 })).toBe('0.00');
    fc.assert(
      fc.property(fc.double(), fc.integer({ min: -3, max: 12 }), (value, decimals) => {
        const text = formatNumber(value, { decimals });
        expect(text).not.toMatch(/NaN|Infinity|∞|^-0(\.0*)?$/);
      }),
    );
  });
});

describe('formatQuantity', () => {
  it('always prints the unit, with a no-break space', () => {
    // Our display rule: a figure always says which unit (labels per NIST SP 811 symbols).
    expect(formatQuantity({ value: 450, unit: 'hp' })).toBe('450\u00a0hp');
    expect(formatQuantity({ value: 335.56, unit: 'kW' })).toBe('336\u00a0kW');
    expect(formatQuantity({ value: 4.9422, unit: 'L' })).toBe('4.9\u00a0L');
    expect(formatQuantity({ value: 500, unit: 'lbft' })).toBe('500\u00a0lb·ft');
    expect(formatQuantity({ value: 301.6, unit: 'in3' }, { decimals: 1 })).toBe('301.6\u00a0in³');
  });

  it('prints a dash, not NaN hp, for a missing figure', () => {
    // Our display rule.
    expect(formatQuantity({ value: Number.NaN, unit: 'hp' })).toBe(NO_FIGURE);
  });
});

describe('formatPercent', () => {
  it('prints a percentage with one decimal by default', () => {
    // Our display rule.
    expect(formatPercent(48.6667)).toBe('48.7%');
    expect(formatPercent(Number.NaN)).toBe(NO_FIGURE);
  });
});
