// Copies a figure's current revision into another project the user may edit, with the data sets
// it draws; the number is kept when free there, otherwise given the first free suffix.
import type { Knex } from 'knex';
import type { Figure, User } from '../../shared/api/schemas';
import { notFound } from '../lib/app-error';
import { findFigure } from '../repositories/figures';
import { listDatasetsWithData } from '../repositories/datasets';
import { recordAudit } from './audit';
import { createFigure } from './figures';
import { datasetIdsOf, insertDatasetCopies, withDatasetIds } from './figure-datasets';
import { freeFigureNumber } from './figure-numbers';

export async function copyFigure(
  db: Knex,
  user: User,
  figureId: number,
  targetProjectId: number,
): Promise<Figure> {
  const source = await findFigure(db, figureId);
  if (!source) throw notFound('figure');
  return db.transaction(async (trx) => {
    const target = await trx('projects').where({ id: targetProjectId }).forUpdate().first('name');
    const from = await trx('projects').where({ id: source.projectId }).first('name');
    const numbers: string[] = await trx('figures')
      .where({ project_id: targetProjectId })
      .whereNull('deleted_at')
      .pluck('number');
    const ids = datasetIdsOf(source.spec);
    const sameProject = source.projectId === targetProjectId;
    const map =
      sameProject || ids.length === 0
        ? new Map<number, number>()
        : await insertDatasetCopies(
            trx,
            targetProjectId,
            user.id,
            await listDatasetsWithData(trx, source.projectId, ids),
          ).then((r) => r.map);
    const copy = await createFigure(trx, user, targetProjectId, {
      number: freeFigureNumber(source.number, new Set(numbers.filter(Boolean))),
      title: source.title,
      caption: source.caption,
      altText: source.altText,
      spec: withDatasetIds(source.spec, map),
    });
    const what = `figure ${source.number || `#${source.id}`} "${source.title}"`;
    await recordAudit(trx, {
      projectId: targetProjectId,
      actorId: user.id,
      action: 'figure.copied',
      summary: `copied ${what} from "${from.name}" as ${copy.number || 'an unnumbered figure'}`,
    });
    if (!sameProject) {
      await recordAudit(trx, {
        projectId: source.projectId,
        actorId: user.id,
        action: 'figure.copied',
        summary: `copied ${what} to "${target.name}"`,
      });
    }
    return copy;
  });
}
