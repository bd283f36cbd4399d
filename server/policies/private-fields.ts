import type { AskablePrivateField } from '@shared/constants';
import { hasEventRole, type Actor } from './actor';

/** The entrant's contact details and their build's private fields, as one list of names. */
export type EntrantField = 'email' | 'phone' | AskablePrivateField;

/**
 * Who sees which private field of an entrant, decided here only. The entrant sees all of theirs.
 * The show's organisers see what running a show needs (e-mail and phone), and the plate, VIN or
 * address only where the show asked for it on its entry form and the entrant agreed when entering.
 * Nobody else (judges, gate staff, visitors) sees any of them.
 */
export function entrantFieldsVisibleTo(actor: Actor | null | undefined, entry: { ownerId: number; eventId: number; sharedFields: readonly AskablePrivateField[] }): ReadonlySet<EntrantField> {
  if (!actor) return new Set();
  if (entry.ownerId === actor.id) return new Set<EntrantField>(['email', 'phone', 'plate', 'vin', 'address']);
  if (hasEventRole(actor, entry.eventId, 'organiser')) return new Set<EntrantField>(['email', 'phone', ...entry.sharedFields]);
  return new Set();
}
