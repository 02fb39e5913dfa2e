// The uploaded data a figure draws, loaded from its own project only (a spec naming another
// project's data set gets nothing for it, and the builder notes the gap).
import type { Knex } from 'knex';
import type { FigureDatasets } from '../../shared/figures/radial-datasets';
import type { FigureSpec } from '../../shared/spec/figure-spec';
import { listDatasetsWithData } from '../repositories/datasets';
import { datasetIdsOf } from './figure-datasets';

/** Undefined when the spec draws no data sets, so render keys of other figures stay as they were. */
export async function loadFigureDatasets(
  db: Knex,
  projectId: number,
  spec: Pick<FigureSpec, 'kind'>,
): Promise<FigureDatasets | undefined> {
  const ids = datasetIdsOf(spec);
  if (ids.length === 0) return undefined;
  const rows = await listDatasetsWithData(db, projectId, ids);
  return Object.fromEntries(
    rows.map((d) => [d.id, { quantity: d.quantity, r: d.r, values: d.values, label: d.name }]),
  );
}
