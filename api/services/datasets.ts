// Data set use cases: upload a CSV (parsed and converted to atomic units by the shared parser),
// authorise by the data set's project, and delete one no current figure draws.
import type { Knex } from 'knex';
import type { z } from 'zod';
import type { Dataset, uploadDatasetFields } from '../../shared/api/datasets';
import type { User } from '../../shared/api/schemas';
import { parseRadialCsv, RadialCsvError } from '../../shared/data/parse-radial-csv';
import type { ProjectAction } from '../../shared/api/roles';
import { AppError, conflict, notFound } from '../lib/app-error';
import { deleteDataset, findDataset, insertDataset } from '../repositories/datasets';
import { recordAudit } from './audit';
import { authoriseProject } from './project-access';

type UploadFields = z.output<typeof uploadDatasetFields>;

function csvRefusal(err: RadialCsvError): AppError {
  const fields: Record<string, string> = {};
  for (const p of err.problems)
    fields[p.field] ??= p.line === null ? p.message : `line ${p.line}: ${p.message}`;
  return new AppError(422, 'invalid_csv', `the data were not stored: ${err.message}`, fields, {
    details: { problems: err.problems },
  });
}

export async function uploadDataset(
  db: Knex,
  user: User,
  projectId: number,
  fields: UploadFields,
  bytes: Buffer,
): Promise<Dataset> {
  let data;
  try {
    data = parseRadialCsv(bytes.toString('utf8'), {
      rUnit: fields.rUnit,
      valueUnit: fields.valueUnit,
    });
  } catch (err) {
    throw err instanceof RadialCsvError ? csvRefusal(err) : err;
  }
  const id = await db.transaction(async (trx) => {
    const newId = await insertDataset(trx, {
      ...data,
      projectId,
      name: fields.name,
      createdBy: user.id,
    });
    await recordAudit(trx, {
      projectId,
      actorId: user.id,
      action: 'dataset.uploaded',
      summary: `uploaded data set "${fields.name}" (${data.quantity}, ${data.r.length} points, ${data.rUnit} / ${data.valueUnit})`,
    });
    return newId;
  });
  return (await findDataset(db, id))!;
}

/** The data set, once the caller may act on its project (404 for data sets of other projects). */
export async function authoriseDataset(
  db: Knex,
  user: User,
  datasetId: number,
  action: ProjectAction,
): Promise<Dataset> {
  const dataset = await findDataset(db, datasetId);
  if (!dataset) throw notFound('data set');
  try {
    await authoriseProject(db, user, dataset.projectId, action);
  } catch (err) {
    if (err instanceof AppError && err.status === 404) throw notFound('data set');
    throw err;
  }
  return dataset;
}

export async function removeDataset(db: Knex, user: User, dataset: Dataset): Promise<void> {
  const users: { number: string; title: string }[] = await db('figures as f')
    .join('figure_revisions as r', function () {
      this.on('r.figure_id', 'f.id').andOn('r.revision', 'f.current_revision');
    })
    .where('f.project_id', dataset.projectId)
    .whereNull('f.deleted_at')
    .whereRaw(`r.spec->'kind'->'datasets' @> ?::jsonb`, [JSON.stringify([{ id: dataset.id }])])
    .select('f.number', 'f.title');
  if (users.length) {
    const names = users.map((f) => (f.number ? `figure ${f.number}` : `"${f.title}"`)).join(', ');
    throw conflict(
      'dataset_in_use',
      `${names} draw${users.length === 1 ? 's' : ''} this data set; remove it from ${users.length === 1 ? 'that figure' : 'those figures'} first`,
      { figures: users },
    );
  }
  await db.transaction(async (trx) => {
    await deleteDataset(trx, dataset.id);
    await recordAudit(trx, {
      projectId: dataset.projectId,
      actorId: user.id,
      action: 'dataset.deleted',
      summary: `deleted data set "${dataset.name}"`,
    });
  });
}
