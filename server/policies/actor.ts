import type { EventRole } from '@shared/constants';

/**
 * Who is asking. Site-wide flags now; per-event roles come from memberships when events arrive,
 * and policies read them only through hasEventRole so nothing else changes then.
 */
export type Actor = {
  id: number;
  isSiteAdmin: boolean;
  mayOrganise: boolean;
  /**
   * The account's e-mail address is confirmed. Taking part in shows (registering, accepting an
   * invitation) needs it; building and publishing do not. Absent counts as not confirmed.
   */
  emailVerified?: boolean;
  memberships?: ReadonlyArray<{ eventId: number; role: EventRole }>;
};

export function hasEventRole(actor: Actor | null | undefined, eventId: number, role: EventRole): boolean {
  return Boolean(actor?.memberships?.some((m) => m.eventId === eventId && m.role === role));
}
