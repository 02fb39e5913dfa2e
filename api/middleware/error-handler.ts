// The single error middleware: every failure leaves as { error: { code, message, fields? } }.
import type { ErrorRequestHandler, RequestHandler } from 'express';
import { ZodError } from 'zod';
import { AppError } from '../lib/app-error';
import { fieldsFromZod } from '../lib/zod-fields';
import { FigureSpecError } from '../../shared/figures/figure-error';
import { OrbitalInputError } from '../../shared/physics/orbital-input-error';

export const notFoundHandler: RequestHandler = (req, res) => {
  res.status(404).json({ error: { code: 'not_found', message: `no route for ${req.method} ${req.path}` } });
};

export const errorHandler: ErrorRequestHandler = (err: unknown, req, res, _next) => {
  if (err instanceof AppError) {
    res.status(err.status).json({
      error: {
        code: err.code,
        message: err.message,
        ...(err.fields ? { fields: err.fields } : {}),
        ...(err.details ? { details: err.details } : {}),
      },
    });
    return;
  }
  // A spec that validates but cannot be drawn (a level the potential does not bind, a grid too
  // coarse for the state, …): the builders and the physics name the field at fault.
  if (err instanceof FigureSpecError || err instanceof OrbitalInputError) {
    const reason = err instanceof OrbitalInputError ? err.reason : err.message.replace(`${err.field}: `, '');
    res.status(422).json({ error: { code: 'cannot_draw', message: err.message, fields: { [err.field]: reason } } });
    return;
  }
  if (err instanceof ZodError) {
    const fields = fieldsFromZod(err);
    res.status(400).json({ error: { code: 'invalid_request', message: summarise(fields), fields } });
    return;
  }
  const e = err as { type?: string; status?: number; message?: string; code?: string; constraint?: string };
  if (e?.code === '23505') {
    const field = e.constraint === 'figures_number_unique' ? 'number' : e.constraint === 'users_email_lower' ? 'email' : 'value';
    const message =
      field === 'number'
        ? 'another figure in this project already has this number'
        : field === 'email'
          ? 'an account with this e-mail address already exists'
          : 'this value is already taken';
    res.status(409).json({ error: { code: `duplicate_${field}`, message, fields: { [field]: message } } });
    return;
  }
  if (e?.type === 'entity.too.large') {
    res.status(413).json({ error: { code: 'too_large', message: 'the request body is too large' } });
    return;
  }
  if (e?.type === 'entity.parse.failed') {
    res.status(400).json({ error: { code: 'malformed_json', message: 'the request body is not valid JSON' } });
    return;
  }
  console.error(`[lobewright] ${req.method} ${req.originalUrl} failed:`, err);
  res.status(500).json({ error: { code: 'internal', message: 'something went wrong on the server' } });
};

export function summarise(fields: Record<string, string>): string {
  const parts = Object.entries(fields).map(([k, v]) => `${k}: ${v}`);
  return parts.length ? `invalid request (${parts.join('; ')})` : 'invalid request';
}
