// Cross-site request protection (synchroniser token): each session holds a random token that the
// client reads from GET /api/auth/session and echoes in the x-csrf-token header on every request
// that changes state. Together with SameSite=Strict cookies this refuses forged cross-site requests.
import { randomBytes, timingSafeEqual } from 'node:crypto';
import type { Request, RequestHandler } from 'express';
import { AppError } from '../lib/app-error';

declare module 'express-session' {
  interface SessionData {
    csrfToken?: string;
  }
}

const SAFE = new Set(['GET', 'HEAD', 'OPTIONS']);

export function csrfToken(req: Request): string {
  req.session.csrfToken ??= randomBytes(24).toString('base64url');
  return req.session.csrfToken;
}

export const csrfProtection: RequestHandler = (req, _res, next) => {
  if (SAFE.has(req.method)) return next();
  const expected = req.session?.csrfToken;
  const given = req.get('x-csrf-token');
  const ok =
    !!expected && !!given && expected.length === given.length && timingSafeEqual(Buffer.from(expected), Buffer.from(given));
  if (!ok) return next(new AppError(403, 'csrf', 'missing or wrong x-csrf-token header; reload the page and try again'));
  next();
};
