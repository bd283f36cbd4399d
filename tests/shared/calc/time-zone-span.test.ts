import { describe, expect, it } from 'vitest';
import { spanInZone } from '@shared/calc/time-zone';

describe('a show’s span in its own zone', () => {
  it('says the day once for a one-day show, on the show’s clock', () => {
    // 14:00–22:00 UTC is 08:00–16:00 in Chicago (UTC−6 in December).
    expect(spanInZone('2026-12-05T14:00:00Z', '2026-12-05T22:00:00Z', 'America/Chicago')).toBe('Sat, 5 December 2026, 08:00–16:00');
  });

  it('says both days for a show over two days, and when UTC’s day differs from the show’s', () => {
    expect(spanInZone('2026-12-05T14:00:00Z', '2026-12-06T22:00:00Z', 'America/Chicago', 'short')).toBe('Sat, 5 Dec 2026, 08:00 – Sun, 6 Dec 2026, 16:00');
    // 23:00–03:00 UTC falls on one evening in Chicago (17:00–21:00), though on two UTC days.
    expect(spanInZone('2026-12-05T23:00:00Z', '2026-12-06T03:00:00Z', 'America/Chicago')).toBe('Sat, 5 December 2026, 17:00–21:00');
  });
});
