// The session answer every sign-in-like route gives, and signing a user into the current session.
import type { Request } from 'express';
import type { Knex } from 'knex';
import type { Session } from '../../shared/api/schemas';
import { csrfToken } from '../middleware/csrf';
import { getSetting } from '../repositories/users';

export async function sessionBody(db: Knex, req: Request): Promise<Session> {
  return {
    user: req.user ?? null,
    csrfToken: csrfToken(req),
    signupEnabled: await getSetting(db, 'signup_enabled', true),
  };
}

/** Signs the user in; passport regenerates the session, so a new CSRF token follows. */
export function logIn(req: Request, user: Express.User): Promise<void> {
  return new Promise((resolve, reject) => req.logIn(user, (err) => (err ? reject(err) : resolve())));
}

/** Ends every stored session of a user except the one given (password change, reset, disable). */
export async function endSessionsOf(db: Knex, userId: number, exceptSid?: string): Promise<number> {
  const q = db('session').whereRaw("(sess::jsonb -> 'passport' ->> 'user') = ?", [String(userId)]);
  if (exceptSid) q.whereNot({ sid: exceptSid });
  return q.delete();
}
