// /api/auth: session, sign-in, sign-out, sign-up.
import { Router, type Request } from 'express';
import type { Knex } from 'knex';
import type passport from 'passport';
import { rateLimit } from 'express-rate-limit';
import { loginBody, signupBody, type Session } from '../../shared/api/schemas';
import type { Env } from '../config/env';
import { AppError } from '../lib/app-error';
import { hashPassword } from '../auth/passwords';
import { csrfToken } from '../middleware/csrf';
import { validated } from '../middleware/validate';
import { getSetting, insertUser, toUser } from '../repositories/users';

async function sessionBody(db: Knex, req: Request): Promise<Session> {
  return {
    user: req.user ?? null,
    csrfToken: csrfToken(req),
    signupEnabled: await getSetting(db, 'signup_enabled', true),
  };
}

function logIn(req: Request, user: Express.User): Promise<void> {
  return new Promise((resolve, reject) => req.logIn(user, (err) => (err ? reject(err) : resolve())));
}

export function authRoutes(db: Knex, env: Env, p: passport.PassportStatic): Router {
  const r = Router();
  const limiter = rateLimit({
    windowMs: 15 * 60 * 1000,
    limit: env.LOGIN_RATE_LIMIT,
    standardHeaders: 'draft-7',
    legacyHeaders: false,
    handler: (_req, _res, next) =>
      next(new AppError(429, 'too_many_attempts', 'too many sign-in attempts; wait a few minutes and try again')),
  });

  r.get('/session', async (req, res) => {
    res.json(await sessionBody(db, req));
  });

  r.post(
    '/login',
    limiter,
    validated({ body: loginBody }, async ({ body }, req, res) => {
      const user = await new Promise<Express.User | false>((resolve, reject) => {
        req.body = body;
        p.authenticate('local', (err: unknown, u: Express.User | false) => (err ? reject(err) : resolve(u)))(
          req,
          res,
          () => undefined,
        );
      });
      if (!user) {
        throw new AppError(401, 'bad_credentials', 'e-mail address or password is wrong', {
          password: 'e-mail address or password is wrong',
        });
      }
      await logIn(req, user); // passport regenerates the session, so a new CSRF token follows
      res.json(await sessionBody(db, req));
    }),
  );

  r.post('/logout', async (req, res, next) => {
    req.logOut((err) => {
      if (err) return next(err);
      void sessionBody(db, req).then((s) => res.json(s), next);
    });
  });

  r.post(
    '/signup',
    limiter,
    validated({ body: signupBody }, async ({ body }, req, res) => {
      if (!(await getSetting(db, 'signup_enabled', true)))
        throw new AppError(403, 'signup_disabled', 'sign-up is switched off on this site; ask an admin for an account');
      const row = await insertUser(db, {
        email: body.email,
        name: body.name,
        passwordHash: await hashPassword(body.password, env.BCRYPT_COST),
      });
      await logIn(req, toUser(row));
      res.status(201).json(await sessionBody(db, req));
    }),
  );
  return r;
}
