// Starts the real Express application in-process on a free loopback port, against a given database;
// optionally with the export job queue and worker, and outgoing mail to a local SMTP fake.
import type { AddressInfo } from 'node:net';
import type { Server } from 'node:http';
import type { Knex } from 'knex';
import { parseEnv } from '../../api/config/env';
import { createDb } from '../../api/db/knex';
import { createApp } from '../../api/app';
import { startJobs, type Jobs } from '../../api/jobs/jobs';
import { createMailer } from '../../api/mail/mailer';
import { startMailFake, type MailFake } from '../../api/mail/mail-fake';

export interface TestServer {
  baseUrl: string;
  db: Knex;
  /** Present when started with { mail: true }. */
  mail: MailFake | null;
  stop(): Promise<void>;
}

export async function startTestServer(
  databaseUrl: string,
  extraEnv: Record<string, string> = {},
  options: { jobs?: boolean | 'enqueue-only'; mail?: boolean } = {},
): Promise<TestServer> {
  const mail = options.mail ? await startMailFake() : null;
  const env = parseEnv({
    NODE_ENV: 'test',
    DATABASE_URL: databaseUrl,
    SESSION_SECRET: 'test-session-secret-0123456789',
    BCRYPT_COST: '4',
    LOGIN_RATE_LIMIT: '1000',
    PORT: '0',
    PUBLIC_URL: 'http://lobewright.test',
    ...(mail ? { SMTP_URL: mail.url } : {}),
    ...extraEnv,
  });
  const db = createDb(databaseUrl);
  const mailer = createMailer(env);
  const jobs: Jobs | null = options.jobs
    ? await startJobs({ db, env, mailer, work: options.jobs === true })
    : null;
  const { app, close } = createApp({ env, db, mailer, jobs: jobs ?? undefined });
  const server: Server = await new Promise((resolve) => {
    const s = app.listen(0, '127.0.0.1', () => resolve(s));
  });
  const { port } = server.address() as AddressInfo;
  return {
    baseUrl: `http://127.0.0.1:${port}`,
    db,
    mail,
    stop: async () => {
      await new Promise<void>((resolve) => server.close(() => resolve()));
      await jobs?.stop();
      await close();
      await db.destroy();
      await mail?.stop();
    },
  };
}
