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

/** Any role at all in this show: what decides whether its records exist for the person (404) or are refused (403). */
export function hasAnyEventRole(actor: Actor | null | undefined, eventId: number): boolean {
  return Boolean(actor?.memberships?.some((m) => m.eventId === eventId));
}

export function hasEventRole(actor: Actor | null | undefined, eventId: number, role: EventRole): boolean {
  return Boolean(actor?.memberships?.some((m) => m.eventId === eventId && m.role === role));
}
