// /api/admin: site settings (site admins only).
import { Router } from 'express';
import type { Knex } from 'knex';
import { z } from 'zod';
import { idParam, siteSettingsSchema, updateAdminUserBody, type AdminUser } from '../../shared/api/schemas';
import { endSessionsOf } from '../auth/session';
import { conflict, notFound } from '../lib/app-error';
import { currentUser } from '../middleware/require-user';
import { requireAdmin } from '../middleware/require-user';
import { validated } from '../middleware/validate';
import { getSetting, putSetting } from '../repositories/users';

export function adminRoutes(db: Knex): Router {
  const r = Router();
  r.use(requireAdmin);
  r.get('/settings', async (_req, res) => {
    res.json({ signupEnabled: await getSetting(db, 'signup_enabled', true) });
  });
  r.put(
    '/settings',
    validated({ body: siteSettingsSchema }, async ({ body }, _req, res) => {
      await putSetting(db, 'signup_enabled', body.signupEnabled);
      res.json(body);
    }),
  );

  const listUsers = async (): Promise<AdminUser[]> => {
    const rows = await db('users as u')
      .select('u.*', db.raw('(select count(*) from memberships m where m.user_id = u.id) as projects'))
      .orderByRaw('lower(u.name)');
    return rows.map((u) => ({
      id: Number(u.id),
      email: u.email,
      name: u.name,
      isAdmin: u.is_admin,
      disabled: u.disabled,
      createdAt: u.created_at.toISOString(),
      projects: Number(u.projects),
    }));
  };

  r.get('/users', async (_req, res) => {
    res.json(await listUsers());
  });

  r.patch(
    '/users/:userId',
    validated({ params: z.object({ userId: idParam }), body: updateAdminUserBody }, async ({ params, body }, req, res) => {
      if (params.userId === currentUser(req).id) throw conflict('self', 'you cannot disable yourself or remove your own admin role');
      const n = await db('users')
        .where({ id: params.userId })
        .update({ ...(body.disabled !== undefined ? { disabled: body.disabled } : {}), ...(body.isAdmin !== undefined ? { is_admin: body.isAdmin } : {}) });
      if (n === 0) throw notFound('user');
      if (body.disabled) await endSessionsOf(db, params.userId);
      res.json((await listUsers()).find((u) => u.id === params.userId));
    }),
  );
  return r;
}
