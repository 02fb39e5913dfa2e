// The figure list of a project: order and numbers in the author's scheme, and bulk actions.
import type { Knex } from 'knex';
import type { z } from 'zod';
import type { bulkFigureBody, figureOrderBody, User } from '../../shared/api/schemas';
import type { ProjectRole } from '../../shared/api/roles';
import { AppError } from '../lib/app-error';
import { applyReviewAction } from './review';

/** Puts the project's figures in the given order with the given numbers, all or nothing. */
export async function reorderFigures(db: Knex, projectId: number, input: z.output<typeof figureOrderBody>): Promise<void> {
  await db.transaction(async (trx) => {
    const rows = await trx('figures').where({ project_id: projectId }).whereNull('deleted_at').forUpdate().select('id');
    const have = new Set(rows.map((r) => Number(r.id)));
    const given = new Set(input.figures.map((f) => f.id));
    if (have.size !== given.size || [...have].some((id) => !given.has(id))) {
      throw new AppError(422, 'incomplete_order', 'list every figure of the project exactly once', {
        figures: 'must list every figure of the project exactly once',
      });
    }
    // Clear numbers first so that swapping two numbers does not trip the uniqueness rule midway.
    await trx('figures').where({ project_id: projectId }).whereNull('deleted_at').update({ number: '' });
    for (const [position, f] of input.figures.entries()) {
      await trx('figures').where({ id: f.id }).update({ position: position + 1, number: f.number, updated_at: trx.fn.now() });
    }
  });
}

export interface BulkResult {
  done: number[];
  skipped: { id: number; reason: string }[];
}

export async function bulkFigureAction(
  db: Knex,
  user: User,
  role: ProjectRole,
  projectId: number,
  input: z.output<typeof bulkFigureBody>,
): Promise<BulkResult> {
  const rows = await db('figures').where({ project_id: projectId }).whereNull('deleted_at').whereIn('id', input.ids).select('id');
  const found = new Set(rows.map((r) => Number(r.id)));
  const result: BulkResult = { done: [], skipped: input.ids.filter((id) => !found.has(id)).map((id) => ({ id, reason: 'not a figure of this project' })) };
  for (const id of input.ids.filter((i) => found.has(i))) {
    if (input.action === 'delete') {
      await db('figures').where({ id }).update({ deleted_at: db.fn.now(), updated_at: db.fn.now() });
      result.done.push(id);
      continue;
    }
    try {
      await applyReviewAction(db, user, role, id, { action: 'submit', note: '' });
      result.done.push(id);
    } catch (err) {
      if (err instanceof AppError && err.status === 409) result.skipped.push({ id, reason: err.message });
      else throw err;
    }
  }
  return result;
}
