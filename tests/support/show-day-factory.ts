import { expect } from 'vitest';
import type { EventRole } from '@shared/constants';
import { EventMembership } from '@server/models/event-membership';
import { Build } from '@server/models/build';
import { ownerWithBuild, signedIn, type ApiClient, type Owner } from './event-factory';
import { createBuild } from './build-factory';

/** A signed-in person holding `role` in the show (the membership row made directly; invitations have their own tests). */
export async function memberOf(eventId: number, role: EventRole, name = `${role} person`) {
  const person = await signedIn({ name });
  await EventMembership.create({ eventId, userId: person.user.id, role });
  return person;
}

/** An owner enters a build through the API; private fields set on the build so tests can look for leaks. */
export async function enter(eventId: number, classId: number, title: string, privateFields: Partial<Pick<Build, 'vin' | 'plate' | 'ownerPhone' | 'ownerAddress'>> = {}) {
  const owner = await ownerWithBuild(title);
  if (Object.keys(privateFields).length) await owner.build.update(privateFields);
  const res = await owner.client.post(`/api/events/${eventId}/entries`, { buildId: owner.build.id, classId });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return { owner, entry: res.body.entry as { id: number; number: number | null; status: string } };
}

export async function step(organiser: ApiClient, eventId: number, ...actions: string[]) {
  for (const action of actions) {
    const res = await organiser.post(`/api/events/${eventId}/lifecycle`, { action });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
  }
}

/** Another build of an owner already signed in, entered through the API (one account, many cars: quicker than a new account each). */
export async function enterAs(owner: Owner, eventId: number, classId: number, title: string, privateFields: Partial<Pick<Build, 'vin' | 'plate' | 'ownerPhone' | 'ownerAddress'>> = {}) {
  const build = await createBuild(owner.user.id, { title, published: true });
  if (Object.keys(privateFields).length) await build.update(privateFields);
  const res = await owner.client.post(`/api/events/${eventId}/entries`, { buildId: build.id, classId });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return { owner, build, entry: res.body.entry as { id: number; number: number | null; status: string } };
}
