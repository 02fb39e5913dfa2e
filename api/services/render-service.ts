// Renders a stored figure revision to a print file, resolving the project's house style, with
// limits checked first and results kept in PostgreSQL by content hash (spec, format, renderer).
import type { Knex } from 'knex';
import { parseHouseStyle } from '../../shared/spec/house-style';
import { migrateFigureSpec } from '../../shared/spec/migrate-figure-spec';
import { resolveFigureSpec, type ResolvedFigureSpec } from '../../shared/spec/resolve-figure-spec';
import { AppError, notFound } from '../lib/app-error';
import { renderFigure, is3dKind, type RenderFormat } from '../render/render-figure';
import { renderKey } from '../render/render-key';
import { loadFigureDatasets } from './figure-render-data';

/** Largest side in pixels of any rendered raster (500 mm at 600 dpi); 3D is limited further by the browser. */
export const MAX_RASTER_SIDE_PX = 12_000;
export const MAX_3D_RASTER_SIDE_PX = 6_000;
/** Renders allowed at once in this process; further requests wait their turn. */
const MAX_CONCURRENT_RENDERS = 2;
const MAX_WAITING_RENDERS = 16;

export interface RenderedFigure {
  bytes: Buffer;
  contentType: string;
  filename: string;
  key: string;
  notes: string[];
  facts: Record<string, unknown>;
  fromCache: boolean;
}

let running = 0;
const waiting: (() => void)[] = [];

async function withRenderSlot<T>(work: () => Promise<T>): Promise<T> {
  if (running >= MAX_CONCURRENT_RENDERS) {
    if (waiting.length >= MAX_WAITING_RENDERS) {
      throw new AppError(503, 'busy', 'the server is rendering many figures; try again in a minute');
    }
    await new Promise<void>((resolve) => waiting.push(resolve));
  }
  running += 1;
  try {
    return await work();
  } finally {
    running -= 1;
    waiting.shift()?.();
  }
}

/** Refuses sizes the renderers would choke on, naming the print field at fault. */
export function checkRenderLimits(spec: ResolvedFigureSpec, format: RenderFormat): void {
  const rasterised = format === 'png' || format === 'tiff' || is3dKind(spec);
  if (!rasterised) return;
  const limit = is3dKind(spec) ? MAX_3D_RASTER_SIDE_PX : MAX_RASTER_SIDE_PX;
  const fields: Record<string, string> = {};
  for (const side of ['widthMm', 'heightMm'] as const) {
    const px = Math.round((spec.print[side] / 25.4) * spec.print.dpi);
    if (px > limit) {
      fields[`print.${side}`] = `${spec.print[side]} mm at ${spec.print.dpi} dpi is ${px} px; the limit is ${limit} px per side`;
    }
  }
  if (Object.keys(fields).length) {
    throw new AppError(413, 'too_large', Object.values(fields).join('; '), fields);
  }
}


export async function renderResolvedSpec(
  db: Knex,
  spec: ResolvedFigureSpec,
  format: RenderFormat,
  cmyk: boolean,
  /** The figure's project, whose uploaded data sets the spec may draw. */
  projectId?: number,
): Promise<Omit<RenderedFigure, 'filename'>> {
  checkRenderLimits(spec, format);
  const datasets = projectId === undefined ? undefined : await loadFigureDatasets(db, projectId, spec);
  const key = renderKey(spec, format, cmyk, datasets);
  const cached = await db('render_cache').where({ key }).first();
  if (cached) {
    await db('render_cache').where({ key }).update({ used_at: db.fn.now() });
    return {
      bytes: cached.bytes,
      contentType: cached.content_type,
      key,
      notes: cached.facts.notes ?? [],
      facts: cached.facts.facts ?? {},
      fromCache: true,
    };
  }
  const file = await withRenderSlot(() => renderFigure(spec, format, { cmyk, datasets }));
  await db('render_cache')
    .insert({
      key,
      format,
      content_type: file.contentType,
      bytes: file.bytes,
      facts: JSON.stringify({ facts: file.facts, notes: file.notes }),
    })
    .onConflict('key')
    .ignore();
  return { bytes: file.bytes, contentType: file.contentType, key, notes: file.notes, facts: file.facts, fromCache: false };
}

export async function renderStoredFigure(
  db: Knex,
  figureId: number,
  revision: number | undefined,
  format: RenderFormat,
  cmyk: boolean,
): Promise<RenderedFigure> {
  const figure = await db('figures as f')
    .join('projects as p', 'p.id', 'f.project_id')
    .where('f.id', figureId)
    .whereNull('f.deleted_at')
    .first('f.id', 'f.project_id', 'f.number', 'f.current_revision', 'p.house_style');
  if (!figure) throw notFound('figure');
  const rev = revision ?? figure.current_revision;
  const row = await db('figure_revisions').where({ figure_id: figureId, revision: rev }).first('spec');
  if (!row) throw notFound('revision');
  const spec = resolveFigureSpec(migrateFigureSpec(row.spec), parseHouseStyle(figure.house_style));
  const rendered = await renderResolvedSpec(db, spec, format, cmyk, Number(figure.project_id));
  const ext = format === 'tiff' ? 'tif' : format;
  const base = figure.number ? `figure-${figure.number}` : `figure-${figure.id}`;
  return { ...rendered, filename: `${base.replace(/[^0-9A-Za-z.-]/g, '_')}-r${rev}.${ext}` };
}
