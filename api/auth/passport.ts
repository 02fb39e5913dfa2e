// passport-local strategy: e-mail and password; the session stores only the user id.
import type { Knex } from 'knex';
import passport from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import type { User } from '../../shared/api/schemas';
import { findUserByEmail, findUserById, toUser } from '../repositories/users';
import { verifyPassword } from './passwords';

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    // eslint-disable-next-line @typescript-eslint/no-empty-object-type
    interface User extends Omit<import('../../shared/api/schemas').User, never> {}
  }
}

// A fixed hash to compare against when the e-mail is unknown, so timing does not reveal accounts.
const DUMMY_HASH = '$2b$12$C6UzMDM.H6dfI/f/IKcEeO3fQWAXg8W7Jm6x1zIuYVnF5P3qBq3ZW';

export function configurePassport(db: Knex): passport.PassportStatic {
  const p = new passport.Passport() as unknown as passport.PassportStatic;
  p.use(
    new LocalStrategy({ usernameField: 'email', passwordField: 'password' }, async (email, password, done) => {
      try {
        const row = await findUserByEmail(db, email);
        const ok = await verifyPassword(password, row?.password_hash ?? DUMMY_HASH);
        if (!row || !ok || row.disabled) return done(null, false);
        return done(null, toUser(row));
      } catch (err) {
        return done(err);
      }
    }),
  );
  p.serializeUser((user, done) => done(null, (user as User).id));
  p.deserializeUser(async (id: number, done) => {
    try {
      const row = await findUserById(db, id);
      done(null, row && !row.disabled ? toUser(row) : false);
    } catch (err) {
      done(err);
    }
  });
  return p;
}
