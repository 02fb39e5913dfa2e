// Route guards: a signed-in user, or a site admin.
import type { Request, RequestHandler } from 'express';
import type { User } from '../../shared/api/schemas';
import { forbidden, unauthenticated } from '../lib/app-error';

export const requireUser: RequestHandler = (req, _res, next) => next(req.user ? undefined : unauthenticated());

export const requireAdmin: RequestHandler = (req, _res, next) =>
  next(!req.user ? unauthenticated() : !req.user.isAdmin ? forbidden('only site admins may do this') : undefined);

/** The signed-in user of a request that passed requireUser. */
export function currentUser(req: Request): User {
  if (!req.user) throw unauthenticated();
  return req.user;
}
