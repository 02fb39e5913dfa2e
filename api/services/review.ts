// Review of figures: comments threaded by revision, and status changes kept with who and when.
// Editors submit a figure for review; reviewers and editors request changes or approve; an approval
// pins the revision it saw.
import type { Knex } from 'knex';
import type { z } from 'zod';
import type { Comment, FigureStatus, ReviewEvent, User, createCommentBody, reviewActionBody } from '../../shared/api/schemas';
import { roleAllows, type ProjectRole } from '../../shared/api/roles';
import { AppError, conflict, forbidden, notFound } from '../lib/app-error';
import { lockFigure } from '../repositories/figures';

type ReviewAction = z.output<typeof reviewActionBody>['action'];

/** Which status each action may start from, where it leads, and the role it needs. */
const transitions: Record<ReviewAction, { from: FigureStatus[]; to: FigureStatus; needs: 'edit' | 'review' }> = {
  submit: { from: ['draft', 'changes_requested'], to: 'in_review', needs: 'edit' },
  request_changes: { from: ['in_review', 'approved'], to: 'changes_requested', needs: 'review' },
  approve: { from: ['in_review', 'changes_requested'], to: 'approved', needs: 'review' },
};

export async function applyReviewAction(
  db: Knex,
  user: User,
  role: ProjectRole,
  figureId: number,
  input: z.output<typeof reviewActionBody>,
): Promise<{ from: FigureStatus; to: FigureStatus; revision: number }> {
  const t = transitions[input.action];
  if (!roleAllows(role, t.needs)) {
    throw forbidden(t.needs === 'edit' ? 'only editors and owners may submit figures for review' : 'only reviewers, editors and owners may review figures');
  }
  return db.transaction(async (trx) => {
    const row = await lockFigure(trx, figureId);
    if (!row) throw notFound('figure');
    if (!t.from.includes(row.status)) {
      throw conflict(
        'invalid_transition',
        `a figure that is ${row.status.replace('_', ' ')} cannot be ${input.action === 'submit' ? 'submitted' : input.action === 'approve' ? 'approved' : 'sent back'}; it must be ${t.from.map((s) => s.replace('_', ' ')).join(' or ')}`,
      );
    }
    await trx('figures')
      .where({ id: figureId })
      .update({
        status: t.to,
        approved_revision: t.to === 'approved' ? row.current_revision : row.approved_revision,
        updated_at: trx.fn.now(),
      });
    await trx('review_events').insert({
      figure_id: figureId,
      revision: row.current_revision,
      actor_id: user.id,
      from_status: row.status,
      to_status: t.to,
      note: input.note,
    });
    return { from: row.status, to: t.to, revision: row.current_revision };
  });
}

export async function listReviewEvents(db: Knex, figureId: number): Promise<ReviewEvent[]> {
  const rows = await db('review_events as e')
    .join('users as u', 'u.id', 'e.actor_id')
    .where('e.figure_id', figureId)
    .orderBy('e.id')
    .select('e.*', 'u.name as actor_name');
  return rows.map((r) => ({
    id: Number(r.id),
    revision: r.revision,
    actorName: r.actor_name,
    fromStatus: r.from_status,
    toStatus: r.to_status,
    note: r.note,
    createdAt: r.created_at.toISOString(),
  }));
}

export async function listComments(db: Knex, figureId: number): Promise<Comment[]> {
  const rows = await db('comments as c')
    .join('users as u', 'u.id', 'c.author_id')
    .where('c.figure_id', figureId)
    .orderBy('c.id')
    .select('c.*', 'u.name as author_name');
  return rows.map((r) => ({
    id: Number(r.id),
    figureId: Number(r.figure_id),
    revision: r.revision,
    parentId: r.parent_id === null ? null : Number(r.parent_id),
    authorName: r.author_name,
    body: r.body,
    createdAt: r.created_at.toISOString(),
  }));
}

export async function addComment(
  db: Knex,
  user: User,
  figureId: number,
  input: z.output<typeof createCommentBody>,
): Promise<Comment> {
  const figure = await db('figures').where({ id: figureId }).whereNull('deleted_at').first('current_revision');
  if (!figure) throw notFound('figure');
  let revision = figure.current_revision;
  if (input.parentId !== undefined) {
    const parent = await db('comments').where({ id: input.parentId, figure_id: figureId }).first('revision');
    if (!parent) {
      throw new AppError(422, 'unknown_parent', 'the comment you reply to is not on this figure', {
        parentId: 'no such comment on this figure',
      });
    }
    revision = parent.revision; // a reply stays in its thread's revision
  }
  const [row] = await db('comments')
    .insert({ figure_id: figureId, revision, parent_id: input.parentId ?? null, author_id: user.id, body: input.body })
    .returning('id');
  return (await listComments(db, figureId)).find((c) => c.id === Number(row.id))!;
}

/** E-mail addresses of the project's reviewers (for "needs review" messages). */
export async function reviewerEmails(db: Knex, projectId: number): Promise<string[]> {
  const rows = await db('memberships as m')
    .join('users as u', 'u.id', 'm.user_id')
    .where({ 'm.project_id': projectId, 'm.role': 'reviewer', 'u.disabled': false })
    .select('u.email');
  return rows.map((r) => r.email);
}
