import type { Request, Response } from 'express';
import { DISABLED_REFUSAL, passport } from './passport';
import type { User } from '../models/user';
import { csrfToken } from '../middlewares/csrf';
import { recordSignIn } from '../services/accounts/accounts';

export type LocalSignIn = { user: User } | { user: undefined; disabled: boolean };

/** Checks e-mail and password with the local strategy: the user, or none and whether a right password met a disabled account. */
export function authenticateLocal(req: Request, res: Response): Promise<LocalSignIn> {
  return new Promise((resolve, reject) => {
    passport.authenticate('local', { session: false }, (err: unknown, user: User | false, info?: { message?: string }) => {
      if (err) reject(err);
      else if (user) resolve({ user });
      else resolve({ user: undefined, disabled: info?.message === DISABLED_REFUSAL });
    })(req, res, reject);
  });
}

/** Signs in: passport regenerates the session id first, so a planted pre-sign-in id is worthless. */
export function signIn(req: Request, user: User): Promise<void> {
  return new Promise((resolve, reject) => req.login(user, (err) => (err ? reject(err) : resolve())));
}

/** Signs the person in with a fresh session id and CSRF token, and notes the sign-in for the site admin. */
export async function startSession(req: Request, user: User): Promise<void> {
  await signIn(req, user);
  await recordSignIn(user);
  csrfToken(req, true);
}

/** Signs out and destroys the session row itself, not just its user. */
export function signOut(req: Request, res: Response, cookieName: string): Promise<void> {
  return new Promise((resolve, reject) => {
    req.logout({ keepSessionInfo: false }, (err) => {
      if (err) return reject(err);
      req.session.destroy((destroyErr) => {
        if (destroyErr) return reject(destroyErr);
        res.clearCookie(cookieName, { path: '/' });
        resolve();
      });
    });
  });
}
