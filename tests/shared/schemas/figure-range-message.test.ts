import { describe, expect, it } from 'vitest';
import { figureRangeMessage, figureSchema, mmRangeMessage } from '@shared/schemas/figure';
import { ChassisSectionSchema, MM_RANGES } from '@shared/schemas/build-sections';

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

describe('messages in the chassis panel', () => {
  const issues = (input: unknown) => {
    const r = ChassisSectionSchema.safeParse(input);
    return r.success ? [] : r.error.issues.map((i) => i.message);
  };

  it('say which end a suspension field belongs to, since both ends share the panel', () => {
    expect(issues({ rear: { springRate: { value: 0, unit: 'N/mm', provenance: 'estimated' }, motionRatio: 9 } })).toEqual(['Rear spring rate must be between 1 and 1000 N/mm.', 'Rear motion ratio must be at most 2.']);
  });

  it('name the four-link pivot, give millimetres, and take a pivot filled in part way', () => {
    expect(issues({ rear: { fourLink: { upperFront: { x: 5000 } } } })).toEqual(['Upper link, front pivot: x must be between -3000 and 3000 mm.']);
    expect(issues({ rear: { fourLink: { upperFront: { x: 560 }, cgHeightMm: 480 } } })).toEqual([]);
    // 100 mm = 3.94 in and 1500 mm = 59.06 in (1 in = 25.4 mm exactly, NIST SP 811).
    expect(mmRangeMessage(MM_RANGES.cgHeight, 'in')).toBe('Centre of gravity height must be between 3.94 and 59.06\u00a0in (100 to 1500 mm).');
  });
});
