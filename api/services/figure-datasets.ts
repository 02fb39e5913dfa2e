// Figures that draw uploaded data sets: which data sets a spec refers to, copying data sets into
// another project, and rewriting a spec's references to the copies.
import type { Knex } from 'knex';
import type { BundleDataset } from '../../shared/api/bundle';
import type { FigureSpec } from '../../shared/spec/figure-spec';
import { AppError } from '../lib/app-error';
import { insertDataset } from '../repositories/datasets';

export function datasetIdsOf(spec: Pick<FigureSpec, 'kind'>): number[] {
  return spec.kind.type === 'radial' ? (spec.kind.datasets ?? []).map((d) => d.id) : [];
}

/** The spec with each data set id replaced through the map (ids not in it are kept). */
export function withDatasetIds(spec: FigureSpec, map: ReadonlyMap<number, number>): FigureSpec {
  if (spec.kind.type !== 'radial' || !spec.kind.datasets) return spec;
  return {
    ...spec,
    kind: {
      ...spec.kind,
      datasets: spec.kind.datasets.map((d) => ({ ...d, id: map.get(d.id) ?? d.id })),
    },
  };
}

/** A PostgreSQL array literal; String(x) is the shortest text that reads back as the same double. */
const pgArray = (xs: readonly number[]) => `{${xs.join(',')}}`;

/**
 * Gives the project each data set: one it already holds with the same name, quantity, units and
 * points is reused (so importing a bundle twice adds no data), any other is inserted.
 * Returns old id → id in the project, and how many were inserted.
 */
export async function insertDatasetCopies(
  trx: Knex.Transaction,
  projectId: number,
  userId: number,
  datasets: readonly BundleDataset[],
): Promise<{ map: Map<number, number>; inserted: number }> {
  const map = new Map<number, number>();
  let inserted = 0;
  for (const d of datasets) {
    const same = await trx('datasets')
      .where({
        project_id: projectId,
        name: d.name,
        quantity: d.quantity,
        r_unit: d.rUnit,
        value_unit: d.valueUnit,
      })
      .whereRaw('r = ?::double precision[] and "values" = ?::double precision[]', [
        pgArray(d.r),
        pgArray(d.values),
      ])
      .first('id');
    if (same) {
      map.set(d.id, Number(same.id));
      continue;
    }
    map.set(d.id, await insertDataset(trx, { ...d, projectId, createdBy: userId }));
    inserted += 1;
  }
  return { map, inserted };
}

/** Refuses a spec that names data sets its project does not hold (422, the field at fault). */
export async function checkDatasetRefs(
  db: Knex,
  projectId: number,
  spec: Pick<FigureSpec, 'kind'>,
): Promise<void> {
  const ids = datasetIdsOf(spec);
  if (ids.length === 0) return;
  const held = new Set(
    (await db('datasets').where({ project_id: projectId }).whereIn('id', ids).pluck('id')).map(
      Number,
    ),
  );
  const fields: Record<string, string> = {};
  ids.forEach((id, j) => {
    if (!held.has(id))
      fields[`spec.kind.datasets.${j}.id`] = `data set ${id} is not in this project`;
  });
  if (Object.keys(fields).length)
    throw new AppError(
      422,
      'unknown_dataset',
      Object.entries(fields)
        .map(([k, v]) => `${k}: ${v}`)
        .join('; '),
      fields,
    );
}
