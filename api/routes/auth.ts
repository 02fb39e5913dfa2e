// /api/auth: session, sign-in, sign-out, sign-up.
import { Router } from 'express';
import type { Knex } from 'knex';
import type passport from 'passport';
import { rateLimit } from 'express-rate-limit';
import { loginBody, passwordResetConfirmBody, passwordResetRequestBody, signupBody } from '../../shared/api/schemas';
import type { Env } from '../config/env';
import { AppError } from '../lib/app-error';
import { hashPassword } from '../auth/passwords';
import { endSessionsOf, logIn, sessionBody } from '../auth/session';
import { hashToken, newToken } from '../lib/tokens';
import { publicUrl, sendQuietly, type Mailer } from '../mail/mailer';
import { validated } from '../middleware/validate';
import { findUserByEmail, getSetting, insertUser, toUser } from '../repositories/users';

export const RESET_MINUTES = 60;

export function authRoutes(db: Knex, env: Env, p: passport.PassportStatic, mailer: Mailer): Router {
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
  // Password reset: the answer is the same whether or not the account exists.
  r.post(
    '/password-reset',
    limiter,
    validated({ body: passwordResetRequestBody }, async ({ body }, _req, res) => {
      const user = await findUserByEmail(db, body.email);
      if (user && !user.disabled) {
        const { token, hash } = newToken();
        await db('user_tokens').insert({
          user_id: user.id,
          purpose: 'password_reset',
          token_hash: hash,
          expires_at: new Date(Date.now() + RESET_MINUTES * 60 * 1000),
        });
        await sendQuietly(mailer, {
          to: user.email,
          subject: 'Reset your Lobewright password',
          text: `Someone asked to reset the password of your Lobewright account. If it was you, choose a new password here within ${RESET_MINUTES} minutes:\n\n${publicUrl(env)}/reset-password?token=${token}\n\nIf it was not you, ignore this message; your password stays as it is.\n`,
        });
      }
      res.status(202).json({ ok: true });
    }),
  );

  r.post(
    '/password-reset/confirm',
    limiter,
    validated({ body: passwordResetConfirmBody }, async ({ body }, req, res) => {
      const user = await db.transaction(async (trx) => {
        const row = await trx('user_tokens')
          .where({ token_hash: hashToken(body.token), purpose: 'password_reset' })
          .forUpdate()
          .first();
        if (!row || row.used_at) {
          throw new AppError(400, 'invalid_token', 'this reset link is not valid or was already used', {
            token: 'not a valid or unused reset link',
          });
        }
        if (row.expires_at <= new Date()) throw new AppError(410, 'expired', 'this reset link has expired; ask for a new one');
        await trx('user_tokens').where({ id: row.id }).update({ used_at: trx.fn.now() });
        await trx('users').where({ id: row.user_id }).update({ password_hash: await hashPassword(body.password, env.BCRYPT_COST) });
        const u = await trx('users').where({ id: row.user_id }).first();
        return toUser(u);
      });
      await endSessionsOf(db, user.id);
      await logIn(req, user);
      res.json(await sessionBody(db, req));
    }),
  );
  return r;
}
