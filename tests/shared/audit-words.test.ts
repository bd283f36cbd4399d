import { describe, expect, it } from 'vitest';
import { auditChangeWords, auditTimeWords } from '@shared/audit-words';

const ctx = { currency: 'USD', timeZone: 'America/Denver' };

describe('an entry history line in words', () => {
  it('names money in the show’s currency and hides ids and references', () => {
    expect(auditChangeWords({ status: 'awaiting_payment', paidAmount: null }, { status: 'confirmed', paymentRef: 'pi_1', paidAmount: 3000 }, ctx)).toEqual(['Status: Awaiting payment → Confirmed', 'Paid: $30.00']);
  });
  it('reads a class change by the classes’ names', () => {
    expect(auditChangeWords({ classId: 1, className: 'Customs' }, { classId: 2, className: 'Hot rods to 1948' }, ctx)).toEqual(['Class: Customs → Hot rods to 1948']);
  });
  it('says cash taken in words and leaves out what did not change', () => {
    expect(auditChangeWords({ status: 'checked_in' }, { status: 'checked_in', cashTaken: true }, ctx)).toEqual(['Cash taken at the gate']);
  });
  it('gives times in the show’s zone, not the reader’s', () => {
    expect(auditTimeWords('2026-12-04T19:05:00Z', 'America/Denver')).toMatch(/4 Dec 2026, 12:05/);
    expect(auditChangeWords(null, { offerExpiresAt: '2026-12-04T19:05:00Z' }, ctx)).toEqual(['Offer open until: 4 Dec, 12:05']);
  });
});
