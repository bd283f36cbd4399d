import { expect } from 'vitest';
import { randomUUID } from 'node:crypto';
import { apiClient, type ApiClient } from './api-client';
import { createUser } from './factories';
import { createBuild } from './build-factory';

const DAY = 86400_000;

/** Settings of a valid show: entries open now, the show in 30 days, in Berlin. */
export function showSettings(overrides: Record<string, unknown> = {}) {
  const now = Date.now();
  return {
    name: 'Autumn Field Meet',
    slug: `meet-${randomUUID().slice(0, 8)}`,
    venueName: 'The old airfield',
    venueAddress: 'Hangar Road 1, Riverside',
    timeZone: 'Europe/Berlin',
    startsAt: new Date(now + 30 * DAY).toISOString(),
    endsAt: new Date(now + 31 * DAY).toISOString(),
    registrationOpensAt: new Date(now - DAY).toISOString(),
    registrationClosesAt: new Date(now + 20 * DAY).toISOString(),
    capacity: null,
    entryFee: 2500,
    currency: 'EUR',
    refundRule: { fullRefundUntil: new Date(now + 10 * DAY).toISOString(), afterwardsPercent: 50 },
    description: 'An invented test show.',
    ...overrides,
  };
}

export async function signedIn(flags: { mayOrganise?: boolean; name?: string } = {}) {
  const { user, email, password } = await createUser({ mayOrganise: flags.mayOrganise ?? false, name: flags.name ?? 'Test Person' });
  const client = await apiClient();
  expect((await client.signIn(email, password)).status).toBe(200);
  return { client, user, email };
}

/** An organiser with a show, its classes and (optionally) opened for entries. */
export async function showWithClasses(opts: { settings?: Record<string, unknown>; classes?: Array<{ name: string; capacity?: number | null }>; open?: boolean } = {}) {
  const organiser = await signedIn({ mayOrganise: true, name: 'Org Anizer' });
  const created = await organiser.client.post('/api/events', showSettings(opts.settings));
  expect(created.status, JSON.stringify(created.body)).toBe(201);
  const eventId = created.body.event.id as number;
  const classIds: number[] = [];
  for (const c of opts.classes ?? [{ name: 'Hot rods' }, { name: 'Customs' }]) {
    const res = await organiser.client.post(`/api/events/${eventId}/classes`, { name: c.name, capacity: c.capacity ?? null });
    expect(res.status).toBe(201);
    classIds.push(res.body.class.id);
  }
  if (opts.open !== false) expect((await organiser.client.post(`/api/events/${eventId}/lifecycle`, { action: 'open_registration' })).status).toBe(200);
  return { organiser, eventId, classIds, slug: created.body.event.slug as string };
}

/** An owner with a published build, signed in. */
export async function ownerWithBuild(title = 'Test coupe') {
  const owner = await signedIn({ name: 'Owen Ownerly' });
  const build = await createBuild(owner.user.id, { title, published: true });
  return { ...owner, build };
}

export type Owner = Awaited<ReturnType<typeof ownerWithBuild>>;
export type { ApiClient };
