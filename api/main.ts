// Starts the Lobewright server: one process serving the API and the built client.
import { parseEnv } from './config/env';
import { createDb } from './db/knex';
import { createApp } from './app';
import { demoSignIns } from '../db/demo-data';

const env = parseEnv();
const db = createDb(env.DATABASE_URL);
const { app, close } = createApp({ env, db });

const server = app.listen(env.PORT, env.HOST, () => {
  const url = `http://${env.HOST}:${env.PORT}`;
  console.log(`\nLobewright is running at ${url}\n`);
  console.log('Demo sign-ins (password for all: ' + demoSignIns.password + '):');
  for (const u of demoSignIns.users) console.log(`  ${u.email.padEnd(34)} ${u.what}`);
  console.log('\nPress Ctrl-C to stop.');
});

async function shutdown(): Promise<void> {
  server.close();
  await close();
  await db.destroy();
  process.exit(0);
}
process.on('SIGINT', () => void shutdown());
process.on('SIGTERM', () => void shutdown());
