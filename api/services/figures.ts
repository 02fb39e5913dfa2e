// Figure use cases: every save is a new immutable revision; a save based on an old revision is refused.
import type { Knex } from 'knex';
import type { z } from 'zod';
import type { createFigureBody, Figure, updateFigureBody, User } from '../../shared/api/schemas';
import type { FigureSpec } from '../../shared/spec/figure-spec';
import { conflict, notFound } from '../lib/app-error';
import { specHash } from '../lib/spec-hash';
import { findFigure, lockFigure } from '../repositories/figures';
import { checkDatasetRefs } from './figure-datasets';

type CreateInput = z.output<typeof createFigureBody>;
type UpdateInput = z.output<typeof updateFigureBody>;

async function insertRevision(
  trx: Knex.Transaction,
  figureId: number,
  revision: number,
  f: { number: string; title: string; caption: string; altText: string; spec: FigureSpec; message: string },
  authorId: number,
): Promise<void> {
  await trx('figure_revisions').insert({
    figure_id: figureId,
    revision,
    spec: JSON.stringify(f.spec),
    spec_hash: specHash(f.spec),
    number: f.number,
    title: f.title,
    caption: f.caption,
    alt_text: f.altText,
    message: f.message,
    author_id: authorId,
  });
}

export async function createFigure(db: Knex, user: User, projectId: number, input: CreateInput): Promise<Figure> {
  await checkDatasetRefs(db, projectId, input.spec);
  const id = await db.transaction(async (trx) => {
    const { max } = (await trx('figures').where({ project_id: projectId }).max('position as max').first()) ?? {};
    const [row] = await trx('figures')
      .insert({
        project_id: projectId,
        number: input.number,
        position: Number(max ?? 0) + 1,
        title: input.title,
        caption: input.caption,
        alt_text: input.altText,
        current_revision: 1,
      })
      .returning('id');
    const figureId = Number(row.id);
    await insertRevision(trx, figureId, 1, { ...input, message: 'created' }, user.id);
    await trx('projects').where({ id: projectId }).update({ updated_at: trx.fn.now() });
    return figureId;
  });
  return (await findFigure(db, id))!;
}

export async function updateFigure(db: Knex, user: User, figureId: number, input: UpdateInput): Promise<Figure> {
  await db.transaction(async (trx) => {
    const row = await lockFigure(trx, figureId);
    if (!row) throw notFound('figure');
    if (input.spec) await checkDatasetRefs(trx, Number(row.project_id), input.spec);
    if (input.baseRevision !== row.current_revision) {
      throw conflict(
        'stale_revision',
        `this figure was saved as revision ${row.current_revision} since you loaded revision ${input.baseRevision}; load the newer revision or save on top of it`,
        { currentRevision: row.current_revision },
      );
    }
    const current = (await findFigure(trx, figureId))!;
    const next = row.current_revision + 1;
    const merged = {
      number: input.number ?? current.number,
      title: input.title ?? current.title,
      caption: input.caption ?? current.caption,
      altText: input.altText ?? current.altText,
      spec: input.spec ?? current.spec,
      message: input.message,
    };
    await insertRevision(trx, figureId, next, merged, user.id);
    // A new revision of an approved figure goes back to review.
    const status = row.status === 'approved' ? 'in_review' : row.status;
    await trx('figures').where({ id: figureId }).update({
      number: merged.number,
      title: merged.title,
      caption: merged.caption,
      alt_text: merged.altText,
      current_revision: next,
      status,
      updated_at: trx.fn.now(),
    });
    await trx('projects').where({ id: row.project_id }).update({ updated_at: trx.fn.now() });
  });
  return (await findFigure(db, figureId))!;
}

export async function duplicateFigure(db: Knex, user: User, figureId: number): Promise<Figure> {
  const source = await findFigure(db, figureId);
  if (!source) throw notFound('figure');
  return createFigure(db, user, source.projectId, {
    number: '',
    title: `${source.title} (copy)`.slice(0, 200),
    caption: source.caption,
    altText: source.altText,
    spec: source.spec,
  });
}

export async function deleteFigure(db: Knex, figureId: number): Promise<void> {
  const n = await db('figures')
    .where({ id: figureId })
    .whereNull('deleted_at')
    .update({ deleted_at: db.fn.now(), updated_at: db.fn.now() });
  if (n === 0) throw notFound('figure');
}
