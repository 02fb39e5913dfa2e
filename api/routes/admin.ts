// /api/admin: site settings (site admins only).
import { Router } from 'express';
import type { Knex } from 'knex';
import { siteSettingsSchema } from '../../shared/api/schemas';
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
  return r;
}
