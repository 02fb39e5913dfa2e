// A separate export worker process: `node --import tsx api/worker.ts` with the same environment as
// the server (run the server with EXPORT_WORKER=off to leave all export runs to workers like this).
import { parseEnv } from './config/env';
import { createDb } from './db/knex';
import { startJobs } from './jobs/jobs';
import { createMailer } from './mail/mailer';
import { closeRender3d } from './render/render-3d';

const env = parseEnv();
const db = createDb(env.DATABASE_URL);
const jobs = await startJobs({ db, env, mailer: createMailer(env), work: true });
console.log('[lobewright] export worker waiting for runs');

let stopping = false;
async function shutdown(): Promise<void> {
  // Ctrl-C reaches this process both directly and through scripts/start's trap: stop once.
  if (stopping) return;
  stopping = true;
  await jobs.stop();
  await closeRender3d();
  await db.destroy();
  process.exit(0);
}
process.on('SIGINT', () => void shutdown());
process.on('SIGTERM', () => void shutdown());
