// Figures and their immutable revisions.
import type { Knex } from 'knex';
import type { Figure, FigureSummary, Revision, RevisionSummary } from '../../shared/api/schemas';
import { parseHouseStyle } from '../../shared/spec/house-style';
import { migrateFigureSpec } from '../../shared/spec/migrate-figure-spec';
import { resolveFigureSpec } from '../../shared/spec/resolve-figure-spec';
import { renderKey } from '../render/render-key';
import type { FigureDatasets } from '../../shared/figures/radial-datasets';
import { loadFigureDatasets } from '../services/figure-render-data';
import { changedPaths } from '../../shared/spec/changed-paths';

export interface FigureRow {
  id: string;
  project_id: string;
  number: string;
  position: number;
  title: string;
  caption: string;
  alt_text: string;
  status: Figure['status'];
  current_revision: number;
  approved_revision: number | null;
  updated_at: Date;
}

interface JoinedRow extends FigureRow {
  spec: unknown;
  author_name: string;
  house_style: unknown;
}

function withCurrentRevision(db: Knex) {
  return db('figures as f')
    .join('figure_revisions as r', function () {
      this.on('r.figure_id', 'f.id').andOn('r.revision', 'f.current_revision');
    })
    .join('users as u', 'u.id', 'r.author_id')
    .join('projects as p', 'p.id', 'f.project_id')
    .whereNull('f.deleted_at')
    .select('f.*', 'r.spec', 'u.name as author_name', 'p.house_style');
}

function toSummary(r: JoinedRow, printFilesCurrent: boolean): FigureSummary {
  const kind = (r.spec as { kind?: { type?: string } })?.kind?.type ?? 'unknown';
  return {
    id: Number(r.id),
    projectId: Number(r.project_id),
    number: r.number,
    title: r.title,
    caption: r.caption,
    altText: r.alt_text,
    status: r.status,
    kind,
    revision: r.current_revision,
    approvedRevision: r.approved_revision,
    updatedAt: r.updated_at.toISOString(),
    updatedBy: r.author_name,
    printFilesCurrent,
  };
}

/** The render-cache keys of every print format a figure's current spec asks for. */
function printKeys(r: JoinedRow, datasets: FigureDatasets | undefined): string[] {
  const spec = resolveFigureSpec(migrateFigureSpec(r.spec), parseHouseStyle(r.house_style));
  return spec.print.formats.map((format) => renderKey(spec, format, false, datasets));
}

async function withRenderState(db: Knex, rows: JoinedRow[]): Promise<FigureSummary[]> {
  const datasets = await Promise.all(rows.map((r) => loadFigureDatasets(db, Number(r.project_id), migrateFigureSpec(r.spec))));
  const keys = rows.map((r, i) => printKeys(r, datasets[i]));
  const cached = new Set<string>(await db('render_cache').whereIn('key', keys.flat()).pluck('key'));
  return rows.map((r, i) => toSummary(r, keys[i].every((k) => cached.has(k))));
}

export async function listFigures(db: Knex, projectId: number): Promise<FigureSummary[]> {
  const rows: JoinedRow[] = await withCurrentRevision(db)
    .where('f.project_id', projectId)
    .orderBy([{ column: 'f.position' }, { column: 'f.id' }]);
  return withRenderState(db, rows);
}

export async function findFigure(db: Knex, figureId: number): Promise<Figure | undefined> {
  const row: JoinedRow | undefined = await withCurrentRevision(db).where('f.id', figureId).first();
  if (!row) return undefined;
  const [summary] = await withRenderState(db, [row]);
  return { ...summary, spec: migrateFigureSpec(row.spec) };
}

/** Locks the figure row for the rest of the transaction (serialises concurrent saves). */
export function lockFigure(trx: Knex.Transaction, figureId: number): Promise<FigureRow | undefined> {
  return trx('figures').where({ id: figureId }).whereNull('deleted_at').forUpdate().first() as Promise<
    FigureRow | undefined
  >;
}

interface RevisionRow {
  revision: number;
  created_at: Date;
  message: string;
  spec_hash: string;
  author_name: string;
  number: string;
  title: string;
  caption: string;
  alt_text: string;
  spec: unknown;
}

const editable = (r: RevisionRow) => ({ number: r.number, title: r.title, caption: r.caption, altText: r.alt_text, spec: r.spec });

function toRevisionSummary(r: RevisionRow, previous: RevisionRow | undefined): RevisionSummary {
  return {
    revision: r.revision,
    authorName: r.author_name,
    createdAt: r.created_at.toISOString(),
    message: r.message,
    specHash: r.spec_hash,
    changedFields: previous ? changedPaths(editable(previous), editable(r)) : [],
  };
}

function revisionsOf(db: Knex, figureId: number) {
  return db('figure_revisions as r')
    .join('users as u', 'u.id', 'r.author_id')
    .where('r.figure_id', figureId)
    .select('r.*', 'u.name as author_name');
}

export async function listRevisions(db: Knex, figureId: number): Promise<RevisionSummary[]> {
  const rows: RevisionRow[] = await revisionsOf(db, figureId).orderBy('r.revision', 'asc');
  return rows.map((r, i) => toRevisionSummary(r, rows[i - 1])).reverse();
}

export async function findRevision(db: Knex, figureId: number, revision: number): Promise<Revision | undefined> {
  const rows: RevisionRow[] = await revisionsOf(db, figureId)
    .whereIn('r.revision', [revision - 1, revision])
    .orderBy('r.revision', 'asc');
  const r = rows.find((x) => x.revision === revision);
  if (!r) return undefined;
  return {
    ...toRevisionSummary(r, rows.find((x) => x.revision === revision - 1)),
    number: r.number,
    title: r.title,
    caption: r.caption,
    altText: r.alt_text,
    spec: migrateFigureSpec(r.spec),
  };
}
