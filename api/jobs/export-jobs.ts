// Export runs as jobs: the API enqueues, a worker (in the server process, or `api/worker.ts` on its
// own) processes one run at a time. pg-boss retries a run whose worker died (expiry), and the run
// starts over cleanly: its bundle is only ever written whole.
import type { Knex } from 'knex';
import type { Env } from '../config/env';
import type { Mailer } from '../mail/mailer';
import { processExportRun } from './export-run';
import { EXPORT_QUEUE, startQueue } from './queue';

export interface ExportJobs {
  enqueue(runId: number): Promise<string | null>;
  stop(): Promise<void>;
}

export async function startExportJobs(opts: { db: Knex; env: Env; mailer: Mailer; work: boolean }): Promise<ExportJobs> {
  const boss = await startQueue(opts.env.DATABASE_URL);
  if (opts.work) {
    await boss.work<{ runId: number }>(EXPORT_QUEUE, { batchSize: 1, pollingIntervalSeconds: 0.5 }, async ([job]) => {
      try {
        await processExportRun(opts.db, opts.env, opts.mailer, job.data.runId);
      } catch (err) {
        await opts.db('export_runs')
          .where({ id: job.data.runId })
          .update({ status: 'failed', current_item: null, finished_at: opts.db.fn.now(), errors: JSON.stringify([{ figure: '(run)', message: (err as Error).message }]) });
        throw err;
      }
    });
  }
  return {
    enqueue: (runId) => boss.send(EXPORT_QUEUE, { runId }, { retryLimit: 2, retryDelay: 5, expireInSeconds: 3600 }),
    stop: () => boss.stop({ graceful: true, wait: true, timeout: 10_000 }),
  };
}
