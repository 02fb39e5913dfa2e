// Background jobs on the pg-boss queue: export runs, and re-rendering a project's figures after its
// house style changed. The API enqueues; a worker (in the server process, or `api/worker.ts` on its
// own) processes. pg-boss retries a job whose worker died (expiry); an export run starts over
// cleanly because its bundle is only ever written whole.
import type { Knex } from 'knex';
import type { Env } from '../config/env';
import type { Mailer } from '../mail/mailer';
import { processExportRun } from './export-run';
import { EXPORT_QUEUE, RERENDER_QUEUE, startQueue } from './queue';
import { rerenderProject } from './rerender-project';

export interface Jobs {
  enqueueExport(runId: number): Promise<string | null>;
  enqueueRerender(projectId: number): Promise<string | null>;
  stop(): Promise<void>;
}

export async function startJobs(opts: { db: Knex; env: Env; mailer: Mailer; work: boolean }): Promise<Jobs> {
  const boss = await startQueue(opts.env.DATABASE_URL);
  if (opts.work) {
    await boss.work<{ runId: number }>(EXPORT_QUEUE, { batchSize: 1, pollingIntervalSeconds: 0.5 }, async ([job]) => {
      try {
        await processExportRun(opts.db, opts.env, opts.mailer, job.data.runId);
      } catch (err) {
        await opts.db('export_runs')
          .where({ id: job.data.runId })
          .update({
            status: 'failed',
            current_item: null,
            finished_at: opts.db.fn.now(),
            errors: JSON.stringify([{ figure: '(run)', message: (err as Error).message }]),
          });
        throw err;
      }
    });
    await boss.work<{ projectId: number }>(RERENDER_QUEUE, { batchSize: 1, pollingIntervalSeconds: 1 }, async ([job]) => {
      await rerenderProject(opts.db, job.data.projectId);
    });
  }
  return {
    enqueueExport: (runId) => boss.send(EXPORT_QUEUE, { runId }, { retryLimit: 2, retryDelay: 5, expireInSeconds: 3600 }),
    // One pending re-render per project is enough: later style changes are picked up when it runs.
    enqueueRerender: (projectId) =>
      boss.send(RERENDER_QUEUE, { projectId }, { singletonKey: `project-${projectId}`, retryLimit: 1, expireInSeconds: 3600 }),
    stop: () => boss.stop({ graceful: true, wait: true, timeout: 10_000 }),
  };
}
