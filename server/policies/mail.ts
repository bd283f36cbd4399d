import type { Actor } from './actor';
import { authorize } from './authorize';

/** Caught mail exists only in demo mode, and only the site admin reads it. */
export function can(actor: Actor | null | undefined, action: 'read', ctx: { demoMode: boolean }): boolean {
  return action === 'read' && ctx.demoMode && Boolean(actor?.isSiteAdmin);
}

export const authorizeMail = (actor: Actor | null | undefined, action: 'read', ctx: { demoMode: boolean }) =>
  authorize(can(actor, action, ctx), actor);

/** Mail that failed to send is the site admin's to see, in demo mode or not. */
export const authorizeUndeliveredMail = (actor: Actor | null | undefined) => authorize(Boolean(actor?.isSiteAdmin), actor);
