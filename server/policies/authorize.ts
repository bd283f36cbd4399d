import { ForbiddenError, UnauthenticatedError } from '../errors';
import type { Actor } from './actor';

/** Throws 401 when nobody is signed in and the rule needs someone, 403 when the rule says no. */
export function authorize(allowed: boolean, actor: Actor | null | undefined, message?: string): void {
  if (allowed) return;
  if (!actor) throw new UnauthenticatedError();
  throw new ForbiddenError(message);
}
