import { describe, expect, it } from 'vitest';
import { figureRangeMessage, figureSchema } from '@shared/schemas/figure';

const bore = figureSchema('length', { label: 'Bore', min: 20, max: 200, unit: 'mm' });
const messageOf = (input: unknown) => {
  const r = bore.safeParse(input);
  return r.success ? null : r.error.issues[0]!.message;
};

describe('the figure range message', () => {
  it('says the range in its own unit, and again in the unit the owner typed', () => {
    expect(messageOf({ value: 5, unit: 'mm', provenance: 'measured' })).toBe('Bore must be between 20 and 200 mm.');
    // 20 mm = 0.787 in and 200 mm = 7.874 in (25.4 mm to the inch, exact by definition).
    expect(messageOf({ value: 9, unit: 'in', provenance: 'measured' })).toBe('Bore must be between 20 and 200 mm (0.79\u00a0in to 7.87\u00a0in).');
    expect(messageOf({ value: 4, unit: 'in', provenance: 'measured' })).toBeNull();
  });

  it('is one function the form and the API share', () => {
    expect(figureRangeMessage('length', { label: 'Bore', min: 20, max: 200, unit: 'mm' }, 'cm')).toBe('Bore must be between 20 and 200 mm (2.0\u00a0cm to 20.0\u00a0cm).');
    expect(figureRangeMessage('length', { label: 'Bore', min: 20, max: 200, unit: 'mm' }, 'furlong')).toBe('Bore must be between 20 and 200 mm.');
  });
});
