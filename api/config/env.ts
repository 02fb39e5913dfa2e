// Server configuration from the environment, parsed once at start-up; every missing or bad key is listed.
import { z } from 'zod';

const envSchema = z.object({
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
  DATABASE_URL: z.string().url(),
  SESSION_SECRET: z.string().min(16, 'must be at least 16 characters'),
  PORT: z.coerce.number().int().min(0).max(65535).default(4650),
  HOST: z.string().default('127.0.0.1'),
  /** bcrypt cost factor; 12 is the production default (slow on purpose). */
  BCRYPT_COST: z.coerce.number().int().min(4).max(15).default(12),
  /** Login attempts allowed per address per 15 minutes. */
  LOGIN_RATE_LIMIT: z.coerce.number().int().min(1).default(20),
  /** Serve the built client from this folder when set. */
  CLIENT_DIST: z.string().optional(),
  PUBLIC_URL: z.string().url().optional(),
  /** SMTP server for outgoing mail, e.g. smtp://127.0.0.1:2525 (scripts/start runs a local fake). */
  SMTP_URL: z.string().url().optional(),
  MAIL_FROM: z.string().default('Lobewright <no-reply@lobewright.example>'),
  /** "inline" runs export jobs in the server process; "off" leaves them to `api/worker.ts`. */
  EXPORT_WORKER: z.enum(['inline', 'off']).default('inline'),
});
export type Env = z.infer<typeof envSchema>;

export function parseEnv(source: NodeJS.ProcessEnv = process.env): Env {
  const parsed = envSchema.safeParse(source);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`);
    throw new Error(`Lobewright cannot start; fix these environment variables:\n${lines.join('\n')}`);
  }
  return parsed.data;
}
