import { describe, expect, it } from 'vitest';
import { canEvent } from '@server/policies/event';
import type { Actor } from '@server/policies/actor';

const actor = (memberships: Actor['memberships'], flags: Partial<Actor> = {}): Actor => ({ id: 9, isSiteAdmin: false, mayOrganise: false, emailVerified: true, memberships, ...flags });

describe('who runs people’s choice', () => {
  const show = { id: 4, status: 'judging' };
  it('lets the show’s organisers, and only them', () => {
    expect(canEvent(actor([{ eventId: 4, role: 'organiser' }]), 'managePeoplesChoice', show)).toBe(true);
    expect(canEvent(actor([{ eventId: 5, role: 'organiser' }]), 'managePeoplesChoice', show)).toBe(false);
    expect(canEvent(actor([{ eventId: 4, role: 'judge' }]), 'managePeoplesChoice', show)).toBe(false);
    expect(canEvent(actor([{ eventId: 4, role: 'gate' }]), 'managePeoplesChoice', show)).toBe(false);
    expect(canEvent(actor([], { mayOrganise: true, isSiteAdmin: true }), 'managePeoplesChoice', show)).toBe(false);
    expect(canEvent(null, 'managePeoplesChoice', show)).toBe(false);
  });
});
