import { describe, expect, it } from 'vitest';
import { authorizeBuild, buildAbilities, can, canViewPublic } from '@server/policies/build';
import { presentOwnerBuild } from '@server/presenters/build';
import type { Actor } from '@server/policies/actor';
import type { Build } from '@server/models/build';
import { NotFoundError, UnauthenticatedError } from '@server/errors';

const owner: Actor = { id: 1, isSiteAdmin: false, mayOrganise: false };
const stranger: Actor = { id: 2, isSiteAdmin: false, mayOrganise: true };
const admin: Actor = { id: 3, isSiteAdmin: true, mayOrganise: false };
const draft = { ownerId: 1, published: false };

describe('build policy', () => {
  it('lets the owner alone view, edit, publish, delete and see the private fields', () => {
    for (const action of ['view', 'edit', 'publish', 'delete', 'viewPrivate'] as const) {
      expect(can(owner, action, draft), `owner ${action}`).toBe(true);
      expect(can(stranger, action, draft), `stranger ${action}`).toBe(false);
      expect(can(admin, action, draft), `admin ${action}`).toBe(false);
      expect(can(null, action, draft), `anonymous ${action}`).toBe(false);
    }
    expect(can(owner, 'create')).toBe(true);
    expect(can(null, 'create')).toBe(false);
  });

  it('says the same in abilities, so the editor never decides for itself', () => {
    expect(buildAbilities(owner, draft)).toEqual({ viewPrivate: true, edit: true, delete: true, publish: true });
    expect(buildAbilities(stranger, draft)).toEqual({ viewPrivate: false, edit: false, delete: false, publish: false });
  });

  it('answers 401 to nobody and 404 to someone who may not see the build, as for a missing one', () => {
    expect(() => authorizeBuild(null, 'edit', draft)).toThrow(UnauthenticatedError);
    expect(() => authorizeBuild(stranger, 'edit', draft)).toThrow(NotFoundError);
    expect(() => authorizeBuild(owner, 'edit', draft)).not.toThrow();
  });

  it('shows a published build publicly unless its owner is disabled', () => {
    expect(canViewPublic({ published: true }, { disabledAt: null })).toBe(true);
    expect(canViewPublic({ published: false }, { disabledAt: null })).toBe(false);
    expect(canViewPublic({ published: true }, { disabledAt: new Date() })).toBe(false);
  });
});

describe('the owner presenter reads viewPrivate', () => {
  const build = {
    id: 9,
    code: 'K7P2M9Q',
    ownerId: 1,
    published: false,
    title: 'Night Shift',
    modelYear: null,
    bodyOrigin: null,
    style: null,
    story: '',
    weight: null,
    vin: 'VIN-SEEN-BY-OWNER',
    plate: 'PLATE-1',
    ownerPhone: '+99 0',
    ownerAddress: '1 Lane',
    credits: [],
    sections: [],
    photos: [],
    dynoRuns: [],
    weighIns: [],
    figureChanges: [],
    updatedAt: new Date('2026-12-02T10:00:00Z'),
  } as unknown as Build;

  it('includes the private fields for the owner', () => {
    expect(presentOwnerBuild(build, owner).private).toEqual({ vin: 'VIN-SEEN-BY-OWNER', plate: 'PLATE-1', ownerPhone: '+99 0', ownerAddress: '1 Lane' });
  });

  it('leaves them out for anyone the policy refuses', () => {
    const seen = presentOwnerBuild(build, stranger);
    expect(seen).not.toHaveProperty('private');
    expect(JSON.stringify(seen)).not.toContain('VIN-SEEN-BY-OWNER');
    expect(seen.abilities.viewPrivate).toBe(false);
  });
});
