// Starts the Lobewright server: one process serving the API and the built client, with the export
// job queue (and, unless EXPORT_WORKER=off, its worker) running beside it.
import { parseEnv } from './config/env';
import { createDb } from './db/knex';
import { createApp } from './app';
import { startJobs } from './jobs/jobs';
import { createMailer } from './mail/mailer';
import { closeRender3d } from './render/render-3d';
import { demoSignIns } from '../db/demo-data';

const env = parseEnv();
const db = createDb(env.DATABASE_URL);
const mailer = createMailer(env);
const jobs = await startJobs({ db, env, mailer, work: env.EXPORT_WORKER === 'inline' });
const { app, close } = createApp({ env, db, mailer, jobs });

const server = app.listen(env.PORT, env.HOST, () => {
  const url = `http://${env.HOST}:${env.PORT}`;
  console.log(`\nLobewright is running at ${url}\n`);
  console.log('Demo sign-ins (password for all: ' + demoSignIns.password + '):');
  for (const u of demoSignIns.users) console.log(`  ${u.email.padEnd(34)} ${u.what}`);
  if (env.SMTP_URL) console.log(`\nOutgoing mail goes to ${env.SMTP_URL}`);
  console.log('\nPress Ctrl-C to stop.');
});

let stopping = false;
async function shutdown(): Promise<void> {
  // Ctrl-C reaches this process both directly and through scripts/start's trap: stop once.
  if (stopping) return;
  stopping = true;
  server.close();
  await jobs.stop();
  await closeRender3d();
  await close();
  await db.destroy();
  process.exit(0);
}
process.on('SIGINT', () => void shutdown());
process.on('SIGTERM', () => void shutdown());
