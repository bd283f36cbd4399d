import { describe, expect, it } from 'vitest';
import { can as canUser, authorizeUser } from '@server/policies/user';
import { can as canMail } from '@server/policies/mail';
import { canEvent } from '@server/policies/event';
import { hasEventRole, type Actor } from '@server/policies/actor';
import { ForbiddenError, UnauthenticatedError } from '@server/errors';

const owner: Actor = { id: 1, isSiteAdmin: false, mayOrganise: false };
const organiser: Actor = { id: 2, isSiteAdmin: false, mayOrganise: true };
const admin: Actor = { id: 3, isSiteAdmin: true, mayOrganise: false };

describe('user policy', () => {
  it('lets only the site admin list accounts and change roles', () => {
    expect(canUser(owner, 'list')).toBe(false);
    expect(canUser(organiser, 'list')).toBe(false);
    expect(canUser(admin, 'list')).toBe(true);
    expect(canUser(null, 'list')).toBe(false);
    expect(canUser(owner, 'updateRoles', { id: 1 })).toBe(false);
    expect(canUser(admin, 'updateRoles', { id: 1 })).toBe(true);
  });

  it('lets a person edit their own account and nobody else’s (but the admin)', () => {
    expect(canUser(owner, 'updateAccount', { id: 1 })).toBe(true);
    expect(canUser(owner, 'updateAccount', { id: 2 })).toBe(false);
    expect(canUser(admin, 'updateAccount', { id: 2 })).toBe(true);
  });

  it('throws 401 for nobody and 403 for the wrong person', () => {
    expect(() => authorizeUser(null, 'list')).toThrow(UnauthenticatedError);
    expect(() => authorizeUser(owner, 'list')).toThrow(ForbiddenError);
    expect(() => authorizeUser(admin, 'list')).not.toThrow();
  });
});

describe('mail and event policies', () => {
  it('shows caught mail to the admin in demo mode only', () => {
    expect(canMail(admin, 'read', { demoMode: true })).toBe(true);
    expect(canMail(admin, 'read', { demoMode: false })).toBe(false);
    expect(canMail(owner, 'read', { demoMode: true })).toBe(false);
  });

  it('lets organisers and admins create events', () => {
    expect(canEvent(owner, 'create')).toBe(false);
    expect(canEvent(organiser, 'create')).toBe(true);
    expect(canEvent(admin, 'create')).toBe(true);
    expect(canEvent(undefined, 'create')).toBe(false);
  });

  it('reads per-event roles from memberships', () => {
    const judge: Actor = { ...owner, memberships: [{ eventId: 7, role: 'judge' }] };
    expect(hasEventRole(judge, 7, 'judge')).toBe(true);
    expect(hasEventRole(judge, 7, 'organiser')).toBe(false);
    expect(hasEventRole(judge, 8, 'judge')).toBe(false);
    expect(hasEventRole(null, 7, 'judge')).toBe(false);
  });

  it('lets only the show’s organisers print its numbered cards in bulk', () => {
    const show = { id: 7, status: 'show_day' as const };
    const as = (role: 'organiser' | 'judge' | 'gate', eventId = 7): Actor => ({ ...owner, memberships: [{ eventId, role }] });
    expect(canEvent(as('organiser'), 'printCards', show)).toBe(true);
    expect(canEvent(as('judge'), 'printCards', show)).toBe(false);
    expect(canEvent(as('gate'), 'printCards', show)).toBe(false);
    expect(canEvent(as('organiser', 8), 'printCards', show)).toBe(false);
    expect(canEvent(admin, 'printCards', show)).toBe(false);
    expect(canEvent(owner, 'printCards', show)).toBe(false);
  });
});
