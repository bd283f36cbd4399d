import { describe, expect, it } from 'vitest';
import { enteredDecimals, shownDecimals } from '@shared/calc';
import { sectionViews } from '@shared/build-sheet/spec-lines';
import type { Sections } from '@shared/schemas/build-sections';

// Conversions by the exact inch, 1 in = 25.4 mm (NIST SP 811, appendix B), and mechanical horsepower,
// 1 hp = 745.699872 W (same source). The trade precisions are common practice (see spec-lines.ts).

describe('how many decimals a figure is shown with', () => {
  it('keeps the decimals the owner typed when shown in the unit they typed', () => {
    expect(enteredDecimals(92.2)).toBe(1);
    expect(enteredDecimals(355)).toBe(0);
    expect(enteredDecimals(0.065)).toBe(3);
    expect(shownDecimals('length', 92.2, 'mm', 'mm')).toBe(1);
    expect(shownDecimals('length', 5.25, 'in', 'in')).toBe(2);
  });

  it('after converting, is as fine as one step of the typed figure, and no finer than the trade gives it', () => {
    // 355 mm is good to 1 mm = 0.039 in: two decimals, which rotors are given to.
    expect(shownDecimals('length', 355, 'mm', 'in', { mm: 0, in: 2 })).toBe(2);
    // 5.5 in is good to 0.1 in = 2.54 mm: whole millimetres.
    expect(shownDecimals('length', 5.5, 'in', 'mm', { mm: 0, in: 1 })).toBe(0);
    // 140 mm backspacing would allow two decimals of an inch; the trade gives it to 0.1 in.
    expect(shownDecimals('length', 140, 'mm', 'in', { mm: 0, in: 1 })).toBe(1);
    // 650 hp is good to 1 hp = 0.75 kW: power is given in whole kilowatts.
    expect(shownDecimals('power', 650, 'hp', 'kW')).toBe(0);
  });
});

describe('the build sheet in words, to the trade’s precision', () => {
  const m = (value: number, unit: string) => ({ value, unit, provenance: 'measured' as const });
  const sections: Sections = {
    engine: { bore: m(92.2, 'mm'), stroke: m(101.6, 'mm'), cylinders: 8 },
    brakes: { front: { type: 'disc', rotorDiameter: m(355, 'mm'), rotorThickness: m(32, 'mm') } },
    wheels: { front: { backspacing: m(5.5, 'in') } },
  } as Sections;
  const row = (units: 'metric' | 'imperial', kind: string, label: string) => sectionViews(sections, units).find((v) => v.kind === kind)!.rows.find((r) => r.label === label)!.value;

  it('prints bore and stroke as typed, rotors to 0.01 in, backspacing to the millimetre or as typed', () => {
    expect(row('metric', 'engine', 'Bore × stroke')).toBe('92.2\u00a0mm × 101.6\u00a0mm');
    expect(row('imperial', 'engine', 'Bore × stroke')).toBe('3.630\u00a0in × 4.000\u00a0in');
    expect(row('imperial', 'brakes', 'Front')).toContain('13.98\u00a0in × 1.26\u00a0in');
    expect(row('metric', 'brakes', 'Front')).toContain('355\u00a0mm × 32\u00a0mm');
    expect(row('metric', 'wheels', 'Front')).toContain('140\u00a0mm backspacing');
    expect(row('imperial', 'wheels', 'Front')).toContain('5.5\u00a0in backspacing');
  });
});

describe('extra lines', () => {
  it('show their lines only: "Made by" and "why this choice" belong to spec sections', () => {
    const sections = { extra: { lines: [{ label: 'Fuel cell', value: '16 gal' }], madeBy: { kind: 'shop', name: 'Old Kept Shop' }, note: 'An old reason' } } as unknown as Sections;
    const view = sectionViews(sections, 'metric').find((v) => v.kind === 'extra')!;
    expect(view.rows).toEqual([{ label: 'Fuel cell', value: '16 gal' }]);
    expect(view.madeBy).toBeNull();
    expect(view.note).toBeNull();
  });
});
