// /api/account: the signed-in user's name, e-mail (changed only after the new address confirms),
// password, and other sessions.
import { Router, type Request } from 'express';
import type { Knex } from 'knex';
import {
  changeEmailBody,
  changePasswordBody,
  confirmEmailBody,
  updateAccountBody,
  type Account,
} from '../../shared/api/schemas';
import type { Env } from '../config/env';
import { hashPassword, verifyPassword } from '../auth/passwords';
import { endSessionsOf } from '../auth/session';
import { AppError } from '../lib/app-error';
import { hashToken, newToken } from '../lib/tokens';
import { publicUrl, sendQuietly, type Mailer } from '../mail/mailer';
import { currentUser, requireUser } from '../middleware/require-user';
import { validated } from '../middleware/validate';
import { findUserByEmail, findUserById, toUser } from '../repositories/users';

const EMAIL_CHANGE_HOURS = 24;

async function accountOf(db: Knex, req: Request): Promise<Account> {
  const user = currentUser(req);
  const row = (await findUserById(db, user.id))!;
  const { n } = (await db('session')
    .whereRaw("(sess::jsonb -> 'passport' ->> 'user') = ?", [String(user.id)])
    .whereNot({ sid: req.sessionID })
    .where('expire', '>', db.fn.now())
    .count('* as n')
    .first()) as { n: string };
  return { user: toUser(row), createdAt: (row as unknown as { created_at: Date }).created_at.toISOString(), otherSessions: Number(n) };
}

async function checkPassword(db: Knex, userId: number, password: string, field: string): Promise<void> {
  const row = (await findUserById(db, userId))!;
  if (!(await verifyPassword(password, row.password_hash))) {
    throw new AppError(400, 'wrong_password', 'the password is not right', { [field]: 'not your current password' });
  }
}

export function accountRoutes(db: Knex, env: Env, mailer: Mailer): Router {
  const r = Router();
  r.use(requireUser);

  r.get('/', async (req, res) => {
    res.json(await accountOf(db, req));
  });

  r.patch(
    '/',
    validated({ body: updateAccountBody }, async ({ body }, req, res) => {
      await db('users').where({ id: currentUser(req).id }).update({ name: body.name });
      req.user = { ...currentUser(req), name: body.name };
      res.json(await accountOf(db, req));
    }),
  );

  r.post(
    '/password',
    validated({ body: changePasswordBody }, async ({ body }, req, res) => {
      const user = currentUser(req);
      await checkPassword(db, user.id, body.currentPassword, 'currentPassword');
      await db('users').where({ id: user.id }).update({ password_hash: await hashPassword(body.newPassword, env.BCRYPT_COST) });
      await endSessionsOf(db, user.id, req.sessionID);
      res.status(204).end();
    }),
  );

  r.post(
    '/email',
    validated({ body: changeEmailBody }, async ({ body }, req, res) => {
      const user = currentUser(req);
      await checkPassword(db, user.id, body.password, 'password');
      if (await findUserByEmail(db, body.newEmail)) {
        throw new AppError(409, 'duplicate_email', 'an account with this e-mail address already exists', {
          newEmail: 'already used by another account',
        });
      }
      const { token, hash } = newToken();
      await db('user_tokens').insert({
        user_id: user.id,
        purpose: 'email_change',
        token_hash: hash,
        payload: JSON.stringify({ newEmail: body.newEmail }),
        expires_at: new Date(Date.now() + EMAIL_CHANGE_HOURS * 3600 * 1000),
      });
      await sendQuietly(mailer, {
        to: body.newEmail,
        subject: 'Confirm your new Lobewright e-mail address',
        text: `${user.name}, confirm that this is your new e-mail address for Lobewright within ${EMAIL_CHANGE_HOURS} hours:\n\n${publicUrl(env)}/confirm-email?token=${token}\n\nUntil then, sign in with ${user.email}.\n`,
      });
      res.status(202).json({ ok: true });
    }),
  );

  r.post(
    '/email/confirm',
    validated({ body: confirmEmailBody }, async ({ body }, req, res) => {
      const user = currentUser(req);
      await db.transaction(async (trx) => {
        const row = await trx('user_tokens')
          .where({ token_hash: hashToken(body.token), purpose: 'email_change', user_id: user.id })
          .forUpdate()
          .first();
        if (!row || row.used_at) {
          throw new AppError(400, 'invalid_token', 'this confirmation link is not valid or was already used', { token: 'not a valid link' });
        }
        if (row.expires_at <= new Date()) throw new AppError(410, 'expired', 'this confirmation link has expired; change the address again');
        await trx('user_tokens').where({ id: row.id }).update({ used_at: trx.fn.now() });
        await trx('users').where({ id: user.id }).update({ email: row.payload.newEmail });
      });
      req.user = toUser((await findUserById(db, user.id))!);
      res.json(await accountOf(db, req));
    }),
  );

  r.post('/sign-out-others', async (req, res) => {
    res.json({ signedOut: await endSessionsOf(db, currentUser(req).id, req.sessionID) });
  });
  return r;
}
