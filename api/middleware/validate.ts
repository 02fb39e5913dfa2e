// Validates params, query and body with zod and hands the parsed values to the handler,
// so nothing is parsed twice. Errors name each field ("body.title", "params.figureId").
import type { NextFunction, Request, Response } from 'express';
import { z, type ZodType } from 'zod';
import { AppError } from '../lib/app-error';
import { fieldsFromZod } from '../lib/zod-fields';
import { summarise } from './error-handler';

type Parts = { params?: ZodType; query?: ZodType; body?: ZodType };
type Out<T> = T extends ZodType ? z.output<T> : undefined;
export type Parsed<P extends Parts> = { params: Out<P['params']>; query: Out<P['query']>; body: Out<P['body']> };

export function validated<P extends Parts>(
  parts: P,
  handler: (input: Parsed<P>, req: Request, res: Response) => Promise<void> | void,
) {
  return async (req: Request, res: Response, next: NextFunction) => {
    const fields: Record<string, string> = {};
    const out: Record<string, unknown> = {};
    for (const key of ['params', 'query', 'body'] as const) {
      const schema = parts[key];
      if (!schema) continue;
      const r = schema.safeParse(key === 'body' ? (req.body ?? {}) : req[key]);
      if (r.success) out[key] = r.data;
      else Object.assign(fields, fieldsFromZod(r.error, key === 'body' ? '' : key));
    }
    if (Object.keys(fields).length) {
      const status = Object.keys(fields).some((f) => f.startsWith('params.')) ? 404 : 400;
      if (status === 404) return next(new AppError(404, 'not_found', 'not found'));
      return next(new AppError(400, 'invalid_request', summarise(fields), fields));
    }
    try {
      await handler(out as Parsed<P>, req, res);
    } catch (err) {
      next(err);
    }
  };
}
