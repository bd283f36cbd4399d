import { describe, expect, it } from 'vitest';
import { currencyDecimals, formatMoney, isKnownCurrency, parseMoney } from '@shared/calc/money';
import { refundDue } from '@shared/calc/refund';
import { formatInZone, instantToWallTime, isValidTimeZone, wallTimeToInstant, zoneOffsetMinutes } from '@shared/calc/time-zone';
import { actionsFrom, EVENT_ACTIONS } from '@shared/event-lifecycle';
import { EVENT_STATUSES } from '@shared/constants';

describe('money in minor units (ISO 4217 minor units, read through Intl)', () => {
  it('knows each currency’s decimals: JPY 0, EUR 2, BHD 3 (ISO 4217 list of minor units)', () => {
    expect(currencyDecimals('JPY')).toBe(0);
    expect(currencyDecimals('EUR')).toBe(2);
    expect(currencyDecimals('BHD')).toBe(3);
    expect(formatMoney(2500, 'EUR')).toBe('€25.00');
    expect(formatMoney(3000, 'JPY')).toBe('¥3,000');
    expect(formatMoney(12345, 'BHD')).toMatch(/12\.345/);
    expect(formatMoney(0, 'USD')).toBe('$0.00');
  });
  it('reads a typed amount into minor units and refuses more decimals than the currency has', () => {
    expect(parseMoney('25', 'EUR')).toBe(2500);
    expect(parseMoney('25.5', 'EUR')).toBe(2550);
    expect(parseMoney('3000', 'JPY')).toBe(3000);
    expect(parseMoney('30.5', 'JPY')).toBeNull();
    expect(parseMoney('1.234', 'USD')).toBeNull();
    expect(parseMoney('-3', 'USD')).toBeNull();
  });
  it('accepts ISO 4217 codes only', () => {
    expect(isKnownCurrency('USD')).toBe(true);
    expect(isKnownCurrency('ZZZ')).toBe(false);
    expect(isKnownCurrency('usd')).toBe(false);
  });
});

describe('the refund rule (the show’s own rule; rounding down is our choice, common practice)', () => {
  const rule = { fullRefundUntil: '2027-05-01T00:00:00Z', afterwardsPercent: 50 };
  it('gives everything back until the date, then the percentage, rounded down to the minor unit', () => {
    expect(refundDue(2500, rule, new Date('2027-04-30T23:59:59Z'))).toBe(2500);
    expect(refundDue(2500, rule, new Date('2027-05-01T00:00:00Z'))).toBe(2500);
    expect(refundDue(2500, rule, new Date('2027-05-01T00:00:01Z'))).toBe(1250);
    expect(refundDue(2555, { fullRefundUntil: null, afterwardsPercent: 33 }, new Date())).toBe(843);
    expect(refundDue(2500, { fullRefundUntil: null, afterwardsPercent: 0 }, new Date())).toBe(0);
    expect(refundDue(0, rule, new Date('2027-01-01T00:00:00Z'))).toBe(0);
  });
});

describe('time zones by IANA name', () => {
  it('accepts real zones and refuses made-up ones', () => {
    expect(isValidTimeZone('Europe/Berlin')).toBe(true);
    expect(isValidTimeZone('America/Chicago')).toBe(true);
    expect(isValidTimeZone('Mars/Olympus_Mons')).toBe(false);
    expect(isValidTimeZone('')).toBe(false);
  });
  it('converts wall time both ways across daylight saving (EU summer time: last Sunday of March and of October at 01:00 UTC, Directive 2000/84/EC)', () => {
    expect(zoneOffsetMinutes(new Date('2027-01-15T12:00:00Z'), 'Europe/Berlin')).toBe(60);
    expect(zoneOffsetMinutes(new Date('2027-07-15T12:00:00Z'), 'Europe/Berlin')).toBe(120);
    expect(wallTimeToInstant('2027-06-12T09:00', 'Europe/Berlin')).toBe('2027-06-12T07:00:00.000Z');
    expect(wallTimeToInstant('2027-12-12T09:00', 'Europe/Berlin')).toBe('2027-12-12T08:00:00.000Z');
    expect(wallTimeToInstant('2027-03-28T03:30', 'Europe/Berlin')).toBe('2027-03-28T01:30:00.000Z');
    expect(instantToWallTime('2027-06-12T07:00:00.000Z', 'Europe/Berlin')).toBe('2027-06-12T09:00');
    expect(instantToWallTime('2027-06-12T07:00:00.000Z', 'America/Chicago')).toBe('2027-06-12T02:00');
    expect(formatInZone('2027-06-12T07:00:00.000Z', 'Europe/Berlin', { hour: '2-digit', minute: '2-digit', hourCycle: 'h23' })).toBe('09:00');
  });
});

describe('the lifecycle', () => {
  it('leads from each step to the next, one way, ending in archived', () => {
    expect(actionsFrom('draft')).toEqual(['open_registration']);
    expect(actionsFrom('registration_closed')).toEqual(['reopen_registration', 'open_gate']);
    expect(actionsFrom('archived')).toEqual([]);
    for (const a of Object.values(EVENT_ACTIONS)) expect(EVENT_STATUSES).toContain(a.to);
  });
});
