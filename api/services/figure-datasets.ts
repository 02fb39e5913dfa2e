// Figures that draw uploaded data sets: which data sets a spec refers to, copying data sets into
// another project, and rewriting a spec's references to the copies.
import type { Knex } from 'knex';
import type { BundleDataset } from '../../shared/api/bundle';
import type { FigureSpec } from '../../shared/spec/figure-spec';
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

/** Inserts the data sets into the project; returns old id → new id. */
export async function insertDatasetCopies(
  trx: Knex.Transaction,
  projectId: number,
  userId: number,
  datasets: readonly BundleDataset[],
): Promise<Map<number, number>> {
  const map = new Map<number, number>();
  for (const d of datasets) {
    const id = await insertDataset(trx, { ...d, projectId, createdBy: userId });
    map.set(d.id, id);
  }
  return map;
}
