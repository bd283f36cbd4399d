import { describe, expect, it } from 'vitest';
import { countOf, formatDate, formatDateTime, waitingListWords } from '@shared/words';

describe('words a person reads', () => {
  it('counts with the right plural and thousands separators', () => {
    expect(countOf(1, 'account')).toBe('1 account');
    expect(countOf(0, 'account')).toBe('0 accounts');
    expect(countOf(2, 'entry', 'entries')).toBe('2 entries');
    expect(countOf(1204, 'build')).toBe('1,204 builds');
  });

  it('writes dates year-month-day and times on a 24-hour clock, and never "Invalid Date"', () => {
    // Local time on purpose: the reader's own clock. Built from local parts so the test holds in any zone.
    const d = new Date(2026, 0, 5, 9, 7);
    expect(formatDate(d)).toBe('2026-01-05');
    expect(formatDateTime(d)).toBe('2026-01-05 09:07');
    expect(formatDate(d.toISOString())).toBe('2026-01-05');
    expect(formatDate('not a date')).toBe('—');
  });
});

describe('the waiting list in the organiser’s words', () => {
  it('shows the place in the queue, or the offered place with its deadline on the show’s clock', () => {
    expect(waitingListWords({ waitingPosition: 1, offerExpiresAt: null }, 'Europe/Berlin')).toBe('#1');
    expect(waitingListWords({ waitingPosition: 1, offerExpiresAt: '2027-06-10T16:00:00.000Z' }, 'Europe/Berlin')).toBe('Place offered, until Thu 10 Jun, 18:00');
    expect(waitingListWords({ waitingPosition: null, offerExpiresAt: null }, 'Europe/Berlin')).toBe('');
  });
});

describe('counts in the show side’s sentences', () => {
  it('says one car, one judge’s sheet and one finished sheet in the singular', () => {
    expect(`Up to ${countOf(1, 'car')}`).toBe('Up to 1 car');
    expect(countOf(1, 'judge’s sheet', 'judges’ sheets')).toBe('1 judge’s sheet');
    expect(countOf(3, 'judge’s sheet', 'judges’ sheets')).toBe('3 judges’ sheets');
    expect(`${countOf(1, 'car')} with ${countOf(0, 'finished sheet')}`).toBe('1 car with 0 finished sheets');
  });
});
