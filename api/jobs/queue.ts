// The job queue: pg-boss on the same PostgreSQL database (schema "pgboss"), so queued work survives
// a restart of the server or the worker.
import PgBoss from 'pg-boss';

export const EXPORT_QUEUE = 'export-run';
export const RERENDER_QUEUE = 'rerender-project';

export async function startQueue(databaseUrl: string): Promise<PgBoss> {
  const boss = new PgBoss({ connectionString: databaseUrl, schema: 'pgboss', max: 4 });
  boss.on('error', (err) => console.error('[lobewright] job queue error:', err.message));
  await boss.start();
  await boss.createQueue(EXPORT_QUEUE);
  await boss.createQueue(RERENDER_QUEUE);
  return boss;
}
