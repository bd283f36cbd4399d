import { describe, expect, it } from 'vitest';
import { figureRangeMessage, figureSchema } from '@shared/schemas/figure';

const bore = figureSchema('length', { label: 'Bore', min: 20, max: 200, unit: 'mm' });
const messageOf = (input: unknown) => {
  const r = bore.safeParse(input);
  return r.success ? null : r.error.issues[0]!.message;
};

describe('the figure range message', () => {
  it('says the range in its own unit, or first in the unit the owner typed and then in its own', () => {
    expect(messageOf({ value: 5, unit: 'mm', provenance: 'measured' })).toBe('Bore must be between 20 and 200 mm.');
    // 20 mm = 0.787 in and 200 mm = 7.874 in (25.4 mm to the inch, exact by definition).
    expect(messageOf({ value: 9, unit: 'in', provenance: 'measured' })).toBe('Bore must be between 0.79 and 7.87\u00a0in (20 to 200 mm).');
    expect(messageOf({ value: 4, unit: 'in', provenance: 'measured' })).toBeNull();
  });

  it('is one function the form and the API share', () => {
    expect(figureRangeMessage('length', { label: 'Bore', min: 20, max: 200, unit: 'mm' }, 'cm')).toBe('Bore must be between 2.0 and 20.0\u00a0cm (20 to 200 mm).');
    expect(figureRangeMessage('length', { label: 'Bore', min: 20, max: 200, unit: 'mm' }, 'furlong')).toBe('Bore must be between 20 and 200 mm.');
  });
});
