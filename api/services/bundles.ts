// Lobewright bundles: export a project or one figure as a bundle, and import a bundle as a new
// project or into an existing one. An import checks the whole file first and writes in one
// transaction, so a bad file changes nothing.
import type { Knex } from 'knex';
import { ZodError } from 'zod';
import { createFigureBody, type User } from '../../shared/api/schemas';
import {
  bundleSchema,
  LOBEWRIGHT_BUNDLE_FORMAT,
  type BundleDataset,
  type ImportReport,
  type LobewrightBundle,
} from '../../shared/api/bundle';
import { FIGURE_SPEC_VERSION, type FigureSpec } from '../../shared/spec/figure-spec';
import { houseStyleInputSchema } from '../../shared/spec/house-style';
import { migrateFigureSpec, SpecVersionError } from '../../shared/spec/migrate-figure-spec';
import { AppError, notFound } from '../lib/app-error';
import { specHash } from '../lib/spec-hash';
import { fieldsFromZod } from '../lib/zod-fields';
import { listDatasetsWithData } from '../repositories/datasets';
import { insertProject } from '../repositories/projects';
import { recordAudit } from './audit';
import { createFigure } from './figures';
import { datasetIdsOf, insertDatasetCopies, withDatasetIds } from './figure-datasets';
import { freeFigureNumber } from './figure-numbers';

interface CurrentFigureRow {
  id: string;
  number: string;
  title: string;
  caption: string;
  alt_text: string;
  spec: unknown;
  spec_hash: string;
}

function currentFigures(db: Knex, projectId: number) {
  return db('figures as f')
    .join('figure_revisions as r', function () {
      this.on('r.figure_id', 'f.id').andOn('r.revision', 'f.current_revision');
    })
    .where('f.project_id', projectId)
    .whereNull('f.deleted_at')
    .orderBy([{ column: 'f.position' }, { column: 'f.id' }])
    .select('f.id', 'f.number', 'f.title', 'f.caption', 'f.alt_text', 'r.spec', 'r.spec_hash');
}

type StoredDataset = Awaited<ReturnType<typeof listDatasetsWithData>>[number];
const toBundleDataset = ({
  id,
  name,
  quantity,
  rUnit,
  valueUnit,
  r,
  values,
}: StoredDataset): BundleDataset => ({ id, name, quantity, rUnit, valueUnit, r, values });

async function bundleOf(
  db: Knex,
  projectId: number,
  rows: CurrentFigureRow[],
  datasetIds?: number[],
): Promise<LobewrightBundle> {
  const project = await db('projects')
    .where({ id: projectId })
    .first('name', 'description', 'house_style');
  if (!project) throw notFound('project');
  const datasets = await listDatasetsWithData(db, projectId, datasetIds);
  return {
    lobewrightBundle: LOBEWRIGHT_BUNDLE_FORMAT,
    schemaVersion: FIGURE_SPEC_VERSION,
    project: {
      name: project.name,
      description: project.description,
      houseStyle: houseStyleInputSchema.parse(project.house_style ?? {}),
    },
    figures: rows.map((r) => ({
      number: r.number,
      title: r.title,
      caption: r.caption,
      altText: r.alt_text,
      spec: migrateFigureSpec(r.spec),
    })),
    ...(datasets.length ? { datasets: datasets.map(toBundleDataset) } : {}),
  };
}

/** The whole project: every current figure in list order, and every data set. */
export async function exportProjectBundle(db: Knex, projectId: number): Promise<LobewrightBundle> {
  return bundleOf(db, projectId, await currentFigures(db, projectId));
}

/** One figure with its project's name and house style, and the data sets it draws. */
export async function exportFigureBundle(
  db: Knex,
  projectId: number,
  figureId: number,
): Promise<LobewrightBundle> {
  const rows: CurrentFigureRow[] = await currentFigures(db, projectId).where('f.id', figureId);
  if (rows.length === 0) throw notFound('figure');
  return bundleOf(db, projectId, rows, datasetIdsOf(migrateFigureSpec(rows[0].spec)));
}

function invalidBundle(fields: Record<string, string>): AppError {
  const list = Object.entries(fields);
  const shown = list
    .slice(0, 8)
    .map(([k, v]) => `${k}: ${v}`)
    .join('; ');
  const more = list.length > 8 ? `; and ${list.length - 8} more` : '';
  return new AppError(
    422,
    'invalid_bundle',
    `the bundle was not imported, nothing was changed (${shown}${more})`,
    fields,
  );
}

/** Reads the uploaded bytes as a bundle, refusing with the field at fault. */
export function readBundle(bytes: Buffer): LobewrightBundle {
  let raw: unknown;
  try {
    raw = JSON.parse(bytes.toString('utf8'));
  } catch (err) {
    const message = `the file is not valid JSON (${(err as Error).message}); nothing was changed`;
    throw new AppError(400, 'malformed_bundle', message, { bundle: message });
  }
  if (typeof raw !== 'object' || raw === null || !('lobewrightBundle' in raw)) {
    throw invalidBundle({
      lobewrightBundle: 'this is not a Lobewright bundle (no "lobewrightBundle" field)',
    });
  }
  const parsed = bundleSchema.safeParse(raw);
  if (!parsed.success) throw invalidBundle(fieldsFromZod(parsed.error));
  if (parsed.data.schemaVersion > FIGURE_SPEC_VERSION) {
    throw invalidBundle({
      schemaVersion: `figure spec version ${parsed.data.schemaVersion} is newer than this Lobewright understands (${FIGURE_SPEC_VERSION}); update Lobewright first`,
    });
  }
  return parsed.data;
}

type CheckedFigure = ReturnType<typeof createFigureBody.parse>;

/** Migrates and validates every figure; any problem refuses the whole bundle (422, field paths per figure). */
function checkFigures(bundle: LobewrightBundle): CheckedFigure[] {
  const fields: Record<string, string> = {};
  const datasetIds = new Set((bundle.datasets ?? []).map((d) => d.id));
  if (datasetIds.size !== (bundle.datasets ?? []).length)
    fields.datasets = 'each data set id may appear once';
  const checked = bundle.figures.map((f, i) => {
    const at = `figures.${i}`;
    let spec: FigureSpec;
    try {
      spec = migrateFigureSpec({ schemaVersion: bundle.schemaVersion, ...f.spec });
    } catch (err) {
      if (err instanceof SpecVersionError) fields[`${at}.spec.schemaVersion`] = err.message;
      else if (err instanceof ZodError) Object.assign(fields, fieldsFromZod(err, `${at}.spec`));
      else throw err;
      return null;
    }
    datasetIdsOf(spec).forEach((id, j) => {
      if (!datasetIds.has(id))
        fields[`${at}.spec.kind.datasets.${j}.id`] = `data set ${id} is not in this bundle`;
    });
    const r = createFigureBody.safeParse({ ...f, spec });
    if (!r.success) {
      Object.assign(fields, fieldsFromZod(r.error, at));
      return null;
    }
    return r.data;
  });
  if (Object.keys(fields).length) throw invalidBundle(fields);
  return checked as CheckedFigure[];
}

const sameFigure = (f: CheckedFigure, row: CurrentFigureRow) =>
  f.title === row.title &&
  f.caption === row.caption &&
  f.altText === row.alt_text &&
  specHash(f.spec) === row.spec_hash;

export async function importBundle(
  db: Knex,
  user: User,
  bytes: Buffer,
  into: { projectId: number } | 'new project',
): Promise<ImportReport> {
  const bundle = readBundle(bytes);
  const figures = checkFigures(bundle);
  return db.transaction(async (trx) => {
    let projectId: number;
    if (into === 'new project') {
      projectId = await insertProject(trx, {
        name: bundle.project.name,
        description: bundle.project.description,
        ownerId: user.id,
      });
      await trx('projects')
        .where({ id: projectId })
        .update({ house_style: JSON.stringify(bundle.project.houseStyle) });
    } else {
      projectId = into.projectId;
      // Serialises imports and copies into one project, so number checks stay true until commit.
      await trx('projects').where({ id: projectId }).forUpdate().first('id');
    }
    const existing: CurrentFigureRow[] =
      into === 'new project' ? [] : await currentFigures(trx, projectId);
    const used = new Set(existing.map((r) => r.number).filter(Boolean));
    const { map: datasetMap, inserted } = await insertDatasetCopies(
      trx,
      projectId,
      user.id,
      bundle.datasets ?? [],
    );
    const report: ImportReport = {
      projectId,
      imported: [],
      renamed: [],
      skipped: [],
      datasets: inserted,
    };
    for (const f of figures) {
      const spec = withDatasetIds(f.spec, datasetMap);
      const twin = f.number ? existing.find((r) => r.number === f.number) : undefined;
      if (twin && sameFigure({ ...f, spec }, twin)) {
        report.skipped.push({
          number: f.number,
          title: f.title,
          reason:
            'the project already has this figure (same number, title, caption, alt text and spec)',
        });
        continue;
      }
      const number = freeFigureNumber(f.number, used);
      if (number !== f.number) report.renamed.push({ from: f.number, to: number, title: f.title });
      if (number) used.add(number);
      const created = await createFigure(trx, user, projectId, { ...f, number, spec });
      report.imported.push({ id: created.id, number, title: created.title });
    }
    const parts = [
      `${report.imported.length} figure(s)`,
      report.renamed.length && `${report.renamed.length} renumbered`,
      report.skipped.length && `${report.skipped.length} already present`,
      report.datasets && `${report.datasets} data set(s)`,
    ];
    await recordAudit(trx, {
      projectId,
      actorId: user.id,
      action: 'bundle.imported',
      summary: `imported a bundle of "${bundle.project.name}": ${parts.filter(Boolean).join(', ')}`,
    });
    return report;
  });
}
