import { describe, expect, it } from 'vitest';
import { canPeoplesChoice } from '@server/policies/peoples-choice';
import type { Actor } from '@server/policies/actor';

const actor = (memberships: Actor['memberships'], flags: Partial<Actor> = {}): Actor => ({ id: 9, isSiteAdmin: false, mayOrganise: false, emailVerified: true, memberships, ...flags });

describe('who runs people’s choice', () => {
  const show = { id: 4 };
  it('lets the show’s organisers, and only them', () => {
    expect(canPeoplesChoice(actor([{ eventId: 4, role: 'organiser' }]), 'manage', show)).toBe(true);
    expect(canPeoplesChoice(actor([{ eventId: 5, role: 'organiser' }]), 'manage', show)).toBe(false);
    expect(canPeoplesChoice(actor([{ eventId: 4, role: 'judge' }]), 'manage', show)).toBe(false);
    expect(canPeoplesChoice(actor([{ eventId: 4, role: 'gate' }]), 'manage', show)).toBe(false);
    expect(canPeoplesChoice(actor([], { mayOrganise: true, isSiteAdmin: true }), 'manage', show)).toBe(false);
    expect(canPeoplesChoice(null, 'manage', show)).toBe(false);
  });
});
