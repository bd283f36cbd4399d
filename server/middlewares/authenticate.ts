import type { Request, RequestHandler } from 'express';
import type { User } from '../models/user';
import { UnauthenticatedError } from '../errors';

/** A route that needs a signed-in person starts with this. */
export const requireUser: RequestHandler = (req, _res, next) => {
  if (!req.user) throw new UnauthenticatedError();
  next();
};

/** The signed-in person, after requireUser. */
export function currentUser(req: Request): User {
  if (!req.user) throw new UnauthenticatedError();
  return req.user as User;
}
