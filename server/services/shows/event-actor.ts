import type { Transaction } from 'sequelize';
import type { Actor } from '../../policies/actor';
import { EventMembership } from '../../models/event-membership';

type Person = { id: number; isSiteAdmin: boolean; mayOrganise: boolean; emailVerified?: boolean };

const identity = (person: Person) => ({ id: person.id, isSiteAdmin: person.isSiteAdmin, mayOrganise: person.mayOrganise, emailVerified: person.emailVerified === true });

/** The person as an Actor carrying their roles in this show (and no other), for the event policy. */
export async function actorInEvent(person: Person | null | undefined, eventId: number, transaction?: Transaction): Promise<Actor | null> {
  if (!person) return null;
  const rows = await EventMembership.findAll({ where: { userId: person.id, eventId }, attributes: ['eventId', 'role'], transaction });
  return { ...identity(person), memberships: rows.map((r) => ({ eventId: r.eventId, role: r.role })) };
}

/** The person with every show role they hold, for lists across shows. */
export async function actorWithAllRoles(person: Person): Promise<Actor> {
  const rows = await EventMembership.findAll({ where: { userId: person.id }, attributes: ['eventId', 'role'] });
  return { ...identity(person), memberships: rows.map((r) => ({ eventId: r.eventId, role: r.role })) };
}
