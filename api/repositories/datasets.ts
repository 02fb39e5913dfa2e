// Uploaded radial data sets of a project; values are stored in atomic units (see shared/data/radial-data-units.ts).
import type { Knex } from 'knex';
import type { Dataset, DatasetSummary } from '../../shared/api/datasets';
import type { RadialDataQuantity } from '../../shared/data/radial-data-units';

interface DatasetRow {
  id: string;
  project_id: string;
  name: string;
  quantity: RadialDataQuantity;
  r_unit: string;
  value_unit: string;
  points: number;
  r_min: number;
  r_max: number;
  created_by_name: string;
  created_at: Date;
  r?: number[];
  values?: number[];
}

export interface NewDataset {
  projectId: number;
  name: string;
  quantity: RadialDataQuantity;
  rUnit: string;
  valueUnit: string;
  r: number[];
  values: number[];
  createdBy: number;
}

const toSummary = (r: DatasetRow): DatasetSummary => ({
  id: Number(r.id),
  projectId: Number(r.project_id),
  name: r.name,
  quantity: r.quantity,
  rUnit: r.r_unit,
  valueUnit: r.value_unit,
  points: Number(r.points),
  rMinBohr: r.r_min,
  rMaxBohr: r.r_max,
  createdBy: r.created_by_name,
  createdAt: r.created_at.toISOString(),
});

function datasetsQuery(db: Knex, withData: boolean) {
  return db('datasets as d')
    .join('users as u', 'u.id', 'd.created_by')
    .select(
      'd.id',
      'd.project_id',
      'd.name',
      'd.quantity',
      'd.r_unit',
      'd.value_unit',
      'd.created_at',
      'u.name as created_by_name',
      db.raw('cardinality(d.r) as points'),
      db.raw('d.r[1] as r_min'),
      db.raw('d.r[cardinality(d.r)] as r_max'),
      ...(withData ? ['d.r', 'd.values'] : []),
    );
}

export async function listDatasets(db: Knex, projectId: number): Promise<DatasetSummary[]> {
  const rows: DatasetRow[] = await datasetsQuery(db, false)
    .where('d.project_id', projectId)
    .orderBy('d.id');
  return rows.map(toSummary);
}

/** Data sets of a project with their points; all of them, or those with the given ids. */
export async function listDatasetsWithData(
  db: Knex,
  projectId: number,
  ids?: number[],
): Promise<Dataset[]> {
  const q = datasetsQuery(db, true).where('d.project_id', projectId).orderBy('d.id');
  if (ids) q.whereIn('d.id', ids);
  const rows: DatasetRow[] = await q;
  return rows.map((r) => ({ ...toSummary(r), r: r.r ?? [], values: r.values ?? [] }));
}

export async function findDataset(db: Knex, datasetId: number): Promise<Dataset | undefined> {
  const row: DatasetRow | undefined = await datasetsQuery(db, true)
    .where('d.id', datasetId)
    .first();
  return row && { ...toSummary(row), r: row.r ?? [], values: row.values ?? [] };
}

export async function insertDataset(db: Knex, d: NewDataset): Promise<number> {
  const [row] = await db('datasets')
    .insert({
      project_id: d.projectId,
      name: d.name,
      quantity: d.quantity,
      r_unit: d.rUnit,
      value_unit: d.valueUnit,
      r: d.r,
      values: d.values,
      created_by: d.createdBy,
    })
    .returning('id');
  return Number(row.id);
}

export async function deleteDataset(db: Knex, datasetId: number): Promise<void> {
  await db('datasets').where({ id: datasetId }).delete();
}
