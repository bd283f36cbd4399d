import type { Request } from 'express';
import type { User } from '../models/user';

declare module 'express-session' {
  interface SessionData {
    /** The address this browser signed up with, until its confirmation link is opened here. */
    signingUpAs?: string;
  }
}

/**
 * Sign-up answers a new and a known address alike, so it signs nobody in. The browser that signed
 * up remembers the address instead; when the confirmation link is opened in that same browser (it
 * knows the password, it typed it a moment ago), confirming signs the new account in. A link opened
 * anywhere else only confirms, so someone who signs up with another person's address gains nothing.
 */
export function rememberSignUp(req: Request, email: string): void {
  req.session.signingUpAs = email;
}

export function signedUpHere(req: Request, user: User): boolean {
  return !req.user && !user.disabledAt && req.session.signingUpAs === user.email;
}
