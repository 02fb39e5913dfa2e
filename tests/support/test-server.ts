// Starts the real Express application in-process on a free loopback port, against a given database.
import type { AddressInfo } from 'node:net';
import type { Server } from 'node:http';
import type { Knex } from 'knex';
import { parseEnv } from '../../api/config/env';
import { createDb } from '../../api/db/knex';
import { createApp } from '../../api/app';

export interface TestServer {
  baseUrl: string;
  db: Knex;
  stop(): Promise<void>;
}

export async function startTestServer(
  databaseUrl: string,
  extraEnv: Record<string, string> = {},
): Promise<TestServer> {
  const env = parseEnv({
    NODE_ENV: 'test',
    DATABASE_URL: databaseUrl,
    SESSION_SECRET: 'test-session-secret-0123456789',
    BCRYPT_COST: '4',
    LOGIN_RATE_LIMIT: '1000',
    PORT: '0',
    ...extraEnv,
  });
  const db = createDb(databaseUrl);
  const { app, close } = createApp({ env, db });
  const server: Server = await new Promise((resolve) => {
    const s = app.listen(0, '127.0.0.1', () => resolve(s));
  });
  const { port } = server.address() as AddressInfo;
  return {
    baseUrl: `http://127.0.0.1:${port}`,
    db,
    stop: async () => {
      await new Promise<void>((resolve) => server.close(() => resolve()));
      await close();
      await db.destroy();
    },
  };
}
