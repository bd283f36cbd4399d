import { describe, expect, it } from 'vitest';
import { decidedByWords, ordinal, placeWords, totalShown } from '@shared/schemas/results';

describe('words for places', () => {
  // English ordinal suffixes: -st, -nd, -rd after 1, 2, 3 except in 11–13, -th otherwise (common practice of English spelling).
  it('spells ordinals, including the teens', () => {
    expect([1, 2, 3, 4, 10, 11, 12, 13, 14, 21, 22, 23, 101, 111, 112].map(ordinal)).toEqual(['1st', '2nd', '3rd', '4th', '10th', '11th', '12th', '13th', '14th', '21st', '22nd', '23rd', '101st', '111th', '112th']);
  });

  it('marks a shared place and rounds totals to two decimals for display only', () => {
    expect(placeWords(2, true)).toBe('2nd (shared)');
    expect(placeWords(1, false)).toBe('1st');
    expect(totalShown(109.83333333333333)).toBe('109.83');
    expect(totalShown(96)).toBe('96.00');
  });

  it('says how a place was decided', () => {
    const name = (id: number) => (id === 7 ? 'Paint and bodywork' : undefined);
    expect(decidedByWords({ kind: 'criterion', criterionId: 7 }, name)).toBe('tie broken on Paint and bodywork');
    expect(decidedByWords({ kind: 'organiser', reason: 'Cleaner underside' }, name)).toBe('placed by the organiser: Cleaner underside');
    expect(decidedByWords({ kind: 'shared' }, name)).toBe('shared place');
  });
});
