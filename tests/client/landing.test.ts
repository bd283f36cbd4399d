import { describe, expect, it } from 'vitest';
import type { EventSummary } from '@shared/schemas/show';
import { landingFor } from '@client/features/shows/model/landing';

// Only the fields landingFor reads; the rest of a summary does not decide where a person lands.
const show = (id: number, status: EventSummary['status'], myRoles: EventSummary['myRoles']) => ({ id, status, myRoles }) as EventSummary;

describe('landingFor', () => {
  it('puts gate staff of two shows on the field on the scanner of the show whose gate is open, whatever the order', () => {
    const judged = show(4, 'judging', ['gate']);
    const gateOpen = show(3, 'show_day', ['gate']);
    expect(landingFor([judged, gateOpen], { isSiteAdmin: false })).toBe('/gate/3');
    expect(landingFor([gateOpen, judged], { isSiteAdmin: false })).toBe('/gate/3');
  });

  it('still puts gate staff on a show being judged when it is their only one on the field (a late car may come)', () => {
    expect(landingFor([show(4, 'judging', ['gate']), show(1, 'registration_open', ['gate'])], { isSiteAdmin: false })).toBe('/gate/4');
  });
});
