// One export run: renders the chosen figures in the chosen formats, writes a manifest (JSON and CSV)
// and a proof sheet (PDF), zips them, and stores the bundle in the same transaction that marks the
// run succeeded — so a run either has its whole bundle or none. Progress is written per figure.
import { createHash } from 'node:crypto';
import archiver from 'archiver';
import sharp from 'sharp';
import type { Knex } from 'knex';
import PDFDocument from 'pdfkit';
import type { ExportRun } from '../../shared/api/schemas';
import { parseHouseStyle } from '../../shared/spec/house-style';
import { migrateFigureSpec } from '../../shared/spec/migrate-figure-spec';
import { resolveFigureSpec, type ResolvedFigureSpec } from '../../shared/spec/resolve-figure-spec';
import { draftAltText } from '../../shared/describe/draft-alt-text';
import { fontPath } from '../render/fonts';
import { RENDERER_VERSION } from '../render/render-figure';
import { specHash } from '../lib/spec-hash';
import { publicUrl, sendQuietly, type Mailer } from '../mail/mailer';
import { renderResolvedSpec } from '../services/render-service';
import type { Env } from '../config/env';

type Format = ExportRun['formats'][number];

interface RunRow {
  id: string;
  project_id: string;
  started_by: string;
  request: { selection: { mode: 'all' | 'approved' | 'selected'; ids?: number[] }; formats: Format[] };
}

export interface ManifestFile {
  name: string;
  format: Format;
  bytes: number;
  sha256: string;
}
export interface ManifestEntry {
  number: string;
  title: string;
  caption: string;
  altText: string;
  altTextDrafted: boolean;
  status: string;
  revision: number;
  specHash: string;
  files: ManifestFile[];
  facts: Record<string, unknown>;
  notes: string[];
}
export interface Manifest {
  lobewright: { renderer: string; manifestVersion: 1 };
  project: string;
  run: number;
  formats: Format[];
  selection: string;
  figures: ManifestEntry[];
}

const PROOF_DPI = 150;

/**
 * The proof sheet's picture of a figure: the run's own PNG scaled down when it made one (a 3D
 * figure is not drawn in the browser a second time), otherwise a render at the proof resolution.
 */
async function proofImage(db: Knex, spec: ResolvedFigureSpec, printPng: Buffer | null, projectId: number): Promise<Buffer> {
  if (printPng) {
    const width = Math.max(1, Math.round((spec.print.widthMm / 25.4) * PROOF_DPI));
    return sharp(printPng).flatten({ background: '#ffffff' }).resize({ width }).png().toBuffer();
  }
  const proofSpec = { ...spec, print: { ...spec.print, dpi: PROOF_DPI, background: 'white' as const } };
  return (await renderResolvedSpec(db, proofSpec, 'png', false, projectId)).bytes;
}

function fileStem(number: string, id: number): string {
  return number ? `fig-${number.replace(/[^0-9A-Za-z.-]/g, '_')}` : `fig-id${id}`;
}

async function chosenFigures(db: Knex, run: RunRow) {
  const q = db('figures').where({ project_id: run.project_id }).whereNull('deleted_at').orderBy([{ column: 'position' }, { column: 'id' }]);
  const sel = run.request.selection;
  if (sel.mode === 'approved') q.where({ status: 'approved' });
  if (sel.mode === 'selected') q.whereIn('id', sel.ids ?? []);
  return q.select('id', 'number', 'title', 'caption', 'alt_text', 'status', 'current_revision', 'approved_revision');
}

export function manifestCsv(m: Manifest): string {
  const cell = (v: unknown) => {
    const s = typeof v === 'string' ? v : JSON.stringify(v ?? '');
    return /[",\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
  };
  const header = ['number', 'title', 'caption', 'alt_text', 'status', 'revision', 'spec_hash', 'files', 'facts', 'notes'];
  const rows = m.figures.map((f) =>
    [
      f.number,
      f.title,
      f.caption,
      f.altText,
      f.status,
      f.revision,
      f.specHash,
      f.files.map((x) => `${x.name} (${x.bytes} bytes, sha256 ${x.sha256})`).join('; '),
      f.facts,
      f.notes.join(' '),
    ].map(cell).join(','),
  );
  return [header.join(','), ...rows].join('\r\n') + '\r\n';
}

async function proofSheet(projectName: string, items: { entry: ManifestEntry; png: Buffer; spec: ResolvedFigureSpec }[]): Promise<Buffer> {
  const doc = new PDFDocument({ size: 'A4', margin: 48, autoFirstPage: false, info: { Title: `Proof sheet — ${projectName}`, Producer: 'Lobewright', Creator: 'Lobewright' } });
  // Fixed dates keep the same run producing the same bytes.
  (doc as unknown as { info: Record<string, unknown> }).info.CreationDate = new Date(0);
  doc.registerFont('body', fontPath('regular'));
  doc.registerFont('bold', fontPath('semibold'));
  const chunks: Buffer[] = [];
  doc.on('data', (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve) => doc.on('end', () => resolve(Buffer.concat(chunks))));
  const perPage = 2;
  items.forEach((item, i) => {
    if (i % perPage === 0) {
      doc.addPage();
      doc.font('bold').fontSize(9).fillColor('#555555').text(`${projectName} — proof sheet`, 48, 24, { lineBreak: false });
    }
    const top = 60 + (i % perPage) * 380;
    const boxW = 499;
    const boxH = 260;
    const scale = Math.min(boxW / (item.spec.print.widthMm / 25.4 * 72), boxH / (item.spec.print.heightMm / 25.4 * 72), 1);
    const w = (item.spec.print.widthMm / 25.4) * 72 * scale;
    const h = (item.spec.print.heightMm / 25.4) * 72 * scale;
    doc.rect(48, top, boxW, boxH).lineWidth(0.5).strokeColor('#cccccc').stroke();
    doc.image(item.png, 48 + (boxW - w) / 2, top + (boxH - h) / 2, { width: w, height: h });
    const e = item.entry;
    doc.font('bold').fontSize(11).fillColor('#111111').text(`Figure ${e.number || '(unnumbered)'}  ${e.title}`, 48, top + boxH + 8, { width: boxW });
    doc.font('body').fontSize(9).fillColor('#222222').text(e.caption || '(no caption)', { width: boxW });
    doc.fontSize(7.5).fillColor('#666666').text(
      `Status: ${e.status.replace('_', ' ')} · revision ${e.revision} · spec ${e.specHash.slice(0, 12)} · ${e.files.map((f) => f.name).join(', ')}`,
      { width: boxW },
    );
    if (e.notes.length) doc.fillColor('#8a4b00').text(`Note: ${e.notes.join(' ')}`, { width: boxW });
  });
  doc.end();
  return done;
}

async function zip(entries: { name: string; data: Buffer }[]): Promise<Buffer> {
  const archive = archiver('zip', { zlib: { level: 6 } });
  const chunks: Buffer[] = [];
  archive.on('data', (c: Buffer) => chunks.push(c));
  const finished = new Promise<Buffer>((resolve, reject) => {
    archive.on('end', () => resolve(Buffer.concat(chunks)));
    archive.on('error', reject);
  });
  for (const e of entries) archive.append(e.data, { name: e.name, date: new Date('2000-01-01T00:00:00Z') });
  await archive.finalize();
  return finished;
}

const sha256 = (b: Buffer) => createHash('sha256').update(b).digest('hex');

export async function processExportRun(db: Knex, env: Env, mailer: Mailer, runId: number): Promise<void> {
  const run: RunRow | undefined = await db('export_runs').where({ id: runId }).first();
  if (!run) return;
  const project = await db('projects').where({ id: run.project_id }).first('name', 'house_style');
  const style = parseHouseStyle(project.house_style);
  const figures = await chosenFigures(db, run);
  await db('export_runs').where({ id: runId }).update({ status: 'running', started_at: db.fn.now(), done: 0, total: figures.length, errors: '[]', current_item: null });

  const files: { name: string; data: Buffer }[] = [];
  const proofs: { entry: ManifestEntry; png: Buffer; spec: ResolvedFigureSpec }[] = [];
  const entries: ManifestEntry[] = [];
  const errors: { figure: string; message: string }[] = [];
  for (const [i, f] of figures.entries()) {
    const label = f.number || f.title;
    await db('export_runs').where({ id: runId }).update({ current_item: label });
    try {
      const revision = f.status === 'approved' && f.approved_revision ? f.approved_revision : f.current_revision;
      const rev = await db('figure_revisions').where({ figure_id: f.id, revision }).first('spec');
      const stored = migrateFigureSpec(rev.spec);
      const spec = resolveFigureSpec(stored, style);
      const stem = fileStem(f.number, Number(f.id));
      const entryFiles: ManifestFile[] = [];
      let facts: Record<string, unknown> = {};
      let notes: string[] = [];
      let printPng: Buffer | null = null;
      for (const format of run.request.formats) {
        const r = await renderResolvedSpec(db, spec, format, false, Number(run.project_id));
        if (format === 'png') printPng = r.bytes;
        const name = `${stem}.${format === 'tiff' ? 'tif' : format}`;
        files.push({ name, data: r.bytes });
        entryFiles.push({ name, format, bytes: r.bytes.length, sha256: sha256(r.bytes) });
        facts = { ...r.facts, ...facts };
        notes = [...new Set([...notes, ...r.notes])];
      }
      const drafted = draftAltText(spec);
      const entry: ManifestEntry = {
        number: f.number,
        title: f.title,
        caption: f.caption,
        altText: f.alt_text || drafted,
        altTextDrafted: !f.alt_text,
        status: f.status,
        revision,
        specHash: specHash(stored),
        files: entryFiles,
        facts,
        notes,
      };
      entries.push(entry);
      proofs.push({ entry, spec, png: await proofImage(db, spec, printPng, Number(run.project_id)) });
    } catch (err) {
      errors.push({ figure: label, message: (err as Error).message });
    }
    await db('export_runs').where({ id: runId }).update({ done: i + 1, errors: JSON.stringify(errors) });
  }

  const starter = await db('users').where({ id: run.started_by }).first('email', 'name');
  const link = `${publicUrl(env)}/projects/${run.project_id}/exports`;
  if (errors.length > 0) {
    await db('export_runs').where({ id: runId }).update({ status: 'failed', current_item: null, finished_at: db.fn.now() });
    await sendQuietly(mailer, {
      to: starter.email,
      subject: `Export of "${project.name}" failed`,
      text: `${errors.length} of ${figures.length} figures could not be rendered, so no bundle was made:\n${errors.map((e) => `- ${e.figure}: ${e.message}`).join('\n')}\n\n${link}\n`,
    });
    return;
  }
  const manifest: Manifest = {
    lobewright: { renderer: RENDERER_VERSION, manifestVersion: 1 },
    project: project.name,
    run: runId,
    formats: run.request.formats,
    selection: run.request.selection.mode,
    figures: entries,
  };
  const bundle = await zip([
    ...files,
    { name: 'manifest.json', data: Buffer.from(JSON.stringify(manifest, null, 2) + '\n') },
    { name: 'manifest.csv', data: Buffer.from(manifestCsv(manifest)) },
    { name: 'proof-sheet.pdf', data: await proofSheet(project.name, proofs) },
  ]);
  const filename = `${project.name.replace(/[^0-9A-Za-z]+/g, '-').replace(/^-|-$/g, '').slice(0, 60) || 'figures'}-export-${runId}.zip`;
  await db.transaction(async (trx) => {
    await trx('export_files')
      .insert({ run_id: runId, filename, bytes: bundle, sha256: sha256(bundle), size: bundle.length, manifest: JSON.stringify(manifest) })
      .onConflict('run_id')
      .merge();
    await trx('export_runs').where({ id: runId }).update({ status: 'succeeded', current_item: null, finished_at: trx.fn.now() });
  });
  await sendQuietly(mailer, {
    to: starter.email,
    subject: `Your export of "${project.name}" is ready`,
    text: `The export you started (${figures.length} figures; ${run.request.formats.join(', ')}) has finished.\n\nDownload the bundle: ${link}\n`,
  });
}
