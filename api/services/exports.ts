// Export runs of a project: start one (validated, then queued), follow its progress, fetch its bundle.
import type { Knex } from 'knex';
import type { z } from 'zod';
import { MAX_EXPORT_FIGURES, type createExportBody, type ExportRun, type User } from '../../shared/api/schemas';
import { AppError, notFound } from '../lib/app-error';

type CreateInput = z.output<typeof createExportBody>;

export async function createExportRun(
  db: Knex,
  user: User,
  projectId: number,
  input: CreateInput,
  enqueue: (runId: number) => Promise<string | null>,
): Promise<ExportRun> {
  const q = db('figures').where({ project_id: projectId }).whereNull('deleted_at');
  if (input.selection.mode === 'approved') q.where({ status: 'approved' });
  if (input.selection.mode === 'selected') {
    const ids = input.selection.ids;
    const found = await db('figures').where({ project_id: projectId }).whereNull('deleted_at').whereIn('id', ids).pluck('id');
    const missing = ids.filter((id) => !found.map(Number).includes(id));
    if (missing.length) {
      throw new AppError(422, 'unknown_figures', `these figures are not in this project: ${missing.join(', ')}`, {
        'selection.ids': `not figures of this project: ${missing.join(', ')}`,
      });
    }
    q.whereIn('id', ids);
  }
  const { n } = (await q.count('* as n').first()) as { n: string };
  const total = Number(n);
  if (total === 0) {
    throw new AppError(422, 'nothing_to_export', 'no figures match this selection', { selection: 'no figures match' });
  }
  if (total > MAX_EXPORT_FIGURES) {
    throw new AppError(413, 'too_many_figures', `an export run takes at most ${MAX_EXPORT_FIGURES} figures; this selection has ${total}`, {
      selection: `at most ${MAX_EXPORT_FIGURES} figures`,
    });
  }
  const [row] = await db('export_runs')
    .insert({ project_id: projectId, started_by: user.id, request: JSON.stringify(input), total })
    .returning('id');
  const runId = Number(row.id);
  const jobId = await enqueue(runId);
  await db('export_runs').where({ id: runId }).update({ job_id: jobId });
  return (await findExportRun(db, runId))!;
}

function runsQuery(db: Knex) {
  return db('export_runs as r')
    .join('users as u', 'u.id', 'r.started_by')
    .leftJoin('export_files as f', 'f.run_id', 'r.id')
    .select('r.*', 'u.name as started_by_name', 'f.filename', 'f.size', 'f.sha256');
}

function toRun(r: Record<string, any>): ExportRun { // eslint-disable-line @typescript-eslint/no-explicit-any -- a joined row
  return {
    id: Number(r.id),
    projectId: Number(r.project_id),
    status: r.status,
    startedBy: r.started_by_name,
    formats: r.request.formats,
    selection: r.request.selection.mode,
    done: r.done,
    total: r.total,
    currentItem: r.current_item,
    errors: r.errors,
    createdAt: r.created_at.toISOString(),
    finishedAt: r.finished_at ? r.finished_at.toISOString() : null,
    bundle: r.filename ? { filename: r.filename, size: r.size, sha256: r.sha256 } : null,
  };
}

export async function listExportRuns(db: Knex, projectId: number): Promise<ExportRun[]> {
  const rows = await runsQuery(db).where('r.project_id', projectId).orderBy('r.id', 'desc').limit(50);
  return rows.map(toRun);
}

export async function findExportRun(db: Knex, runId: number): Promise<ExportRun | undefined> {
  const row = await runsQuery(db).where('r.id', runId).first();
  return row && toRun(row);
}

export async function exportRunProject(db: Knex, runId: number): Promise<number> {
  const row = await db('export_runs').where({ id: runId }).first('project_id');
  if (!row) throw notFound('export run');
  return Number(row.project_id);
}

export async function findBundle(db: Knex, runId: number): Promise<{ filename: string; bytes: Buffer } | undefined> {
  return db('export_files').where({ run_id: runId }).first('filename', 'bytes');
}
