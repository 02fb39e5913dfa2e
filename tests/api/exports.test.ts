// Batch export runs: queued in PostgreSQL (pg-boss), processed by the worker with progress, a ZIP
// with files named by figure number, manifests (JSON, CSV) whose checksums match the files, a proof
// sheet, mail to the one who started it; failures leave no bundle; a queued run survives a restart.
import { execFileSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { exportRunSchema } from '../../shared/api/schemas';
import { canonicalJson } from '../../shared/spec/canonical-json';
import { demo, signedIn, type ApiClient } from '../support/api-client';
import { startTestServer, type TestServer } from '../support/test-server';

let server: TestServer;
let owner: ApiClient, editor: ApiClient, viewer: ApiClient, admin: ApiClient;
let projectId: number;

const radial = (n: number) => ({
  schemaVersion: 1,
  state: { terms: [{ n, l: 0, m: 0 }] },
  kind: { type: 'radial', curves: [{ n, l: 0, quantity: 'r2R2' }] },
  print: { widthMm: 84, heightMm: 50, dpi: 150 },
});

async function waitForRun(c: ApiClient, runId: number) {
  for (let i = 0; i < 600; i++) {
    const run = exportRunSchema.parse((await c.get(`/api/exports/${runId}`)).body);
    if (run.status === 'succeeded' || run.status === 'failed') return run;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`export run ${runId} did not finish in 60 s`);
}

beforeAll(async () => {
  server = await startTestServer(inject('databaseUrl'), {}, { jobs: true, mail: true });
  [owner, editor, viewer, admin] = await Promise.all([demo.owner, demo.editor, demo.viewer, demo.admin].map((e) => signedIn(server.baseUrl, e)));
  projectId = (await owner.post('/api/projects', { name: 'Export test' })).body.id;
  await owner.post(`/api/projects/${projectId}/members`, { email: demo.editor, role: 'editor' });
  await owner.post(`/api/projects/${projectId}/members`, { email: demo.viewer, role: 'viewer' });
  for (const [number, n] of [['6.1', 1], ['6.2', 2], ['6.3', 3]] as const) {
    await editor.post(`/api/projects/${projectId}/figures`, { number, title: `Radial ${n}s`, caption: `The ${n}s radial distribution.`, spec: radial(n) });
  }
});
afterAll(async () => server.stop());

describe('export runs', () => {
  it('when a viewer exports all figures as PNG and PDF, then the bundle holds them, manifests that match, a proof sheet, and mail goes out', async () => {
    server.mail!.messages.length = 0;
    const start = await viewer.post(`/api/projects/${projectId}/exports`, { selection: { mode: 'all' }, formats: ['png', 'pdf'] });
    expect(start.status).toBe(202);
    expect(start.body).toMatchObject({ status: 'queued', total: 3, done: 0 });
    const run = await waitForRun(viewer, start.body.id);
    expect(run).toMatchObject({ status: 'succeeded', done: 3, total: 3, errors: [], currentItem: null });

    const zip = await viewer.getBytes(`/api/exports/${run.id}/bundle`);
    expect(zip.headers.get('content-type')).toBe('application/zip');
    const dir = mkdtempSync(path.join(tmpdir(), 'lw-export-'));
    writeFileSync(path.join(dir, 'bundle.zip'), zip.bytes);
    execFileSync('unzip', ['-q', 'bundle.zip'], { cwd: dir });
    const names = execFileSync('zipinfo', ['-1', 'bundle.zip'], { cwd: dir }).toString().trim().split('\n').sort();
    expect(names).toEqual(['fig-6.1.pdf', 'fig-6.1.png', 'fig-6.2.pdf', 'fig-6.2.png', 'fig-6.3.pdf', 'fig-6.3.png', 'manifest.csv', 'manifest.json', 'proof-sheet.pdf']);

    const manifest = JSON.parse(readFileSync(path.join(dir, 'manifest.json'), 'utf8'));
    expect(manifest.figures.map((f: { number: string }) => f.number)).toEqual(['6.1', '6.2', '6.3']);
    for (const f of manifest.figures) {
      for (const file of f.files) {
        const bytes = readFileSync(path.join(dir, file.name));
        expect(file.bytes).toBe(bytes.length);
        expect(file.sha256).toBe(createHash('sha256').update(bytes).digest('hex'));
      }
      const rev = await server.db('figure_revisions as r').join('figures as g', 'g.id', 'r.figure_id').where({ 'g.number': f.number, 'g.project_id': projectId, 'r.revision': f.revision }).first('r.spec');
      expect(f.specHash).toBe(createHash('sha256').update(canonicalJson(rev.spec)).digest('hex'));
      expect(f.altTextDrafted).toBe(true);
      expect(f.altText).toMatch(/^Radial plot/);
    }
    // REFERENCE.md §8: the 2s node is at 2 bohr; the manifest carries the figure's computed facts
    expect(JSON.stringify(manifest.figures[1].facts)).toMatch(/node/i);
    const csv = readFileSync(path.join(dir, 'manifest.csv'), 'utf8').split('\r\n');
    expect(csv[0]).toBe('number,title,caption,alt_text,status,revision,spec_hash,files,facts,notes');
    expect(csv[1].startsWith('6.1,Radial 1s,The 1s radial distribution.,')).toBe(true);
    const proof = execFileSync('pdfinfo', [path.join(dir, 'proof-sheet.pdf')]).toString();
    expect(proof).toMatch(/Pages:\s+2/);
    expect(execFileSync('pdftotext', [path.join(dir, 'proof-sheet.pdf'), '-']).toString()).toMatch(/Figure 6\.2\s+Radial 2s/);

    for (let i = 0; i < 50 && server.mail!.messages.length === 0; i++) await new Promise((r) => setTimeout(r, 100));
    expect(server.mail!.messages).toHaveLength(1);
    expect(server.mail!.messages[0]).toMatchObject({ to: [demo.viewer], subject: 'Your export of "Export test" is ready' });
    expect(server.mail!.messages[0].text).toContain(`http://lobewright.test/projects/${projectId}/exports`);
  });

  it('when only approved figures are asked for, then only they are exported, at their approved revision', async () => {
    const figs = (await editor.get(`/api/projects/${projectId}/figures`)).body;
    const f = figs.find((x: { number: string }) => x.number === '6.2');
    await server.db('figures').where({ id: f.id }).update({ status: 'approved', approved_revision: 1 });
    const start = await viewer.post(`/api/projects/${projectId}/exports`, { selection: { mode: 'approved' }, formats: ['svg'] });
    const run = await waitForRun(viewer, start.body.id);
    expect(run).toMatchObject({ status: 'succeeded', total: 1, formats: ['svg'], selection: 'approved' });
    const manifest = (await server.db('export_files').where({ run_id: run.id }).first()).manifest;
    expect(manifest.figures.map((x: { number: string; revision: number }) => [x.number, x.revision])).toEqual([['6.2', 1]]);
  });

  it('when a figure cannot be rendered, then the run fails with its error and no bundle is stored', async () => {
    const bad = { ...radial(2), kind: { type: 'isosurface' }, print: { widthMm: 500, heightMm: 500, dpi: 1200 } };
    const f = (await editor.post(`/api/projects/${projectId}/figures`, { number: '6.9', title: 'Too big', spec: bad })).body;
    const start = await editor.post(`/api/projects/${projectId}/exports`, { selection: { mode: 'selected', ids: [f.id] }, formats: ['png'] });
    const run = await waitForRun(editor, start.body.id);
    expect(run.status).toBe('failed');
    expect(run.errors[0]).toMatchObject({ figure: '6.9' });
    expect(run.errors[0].message).toMatch(/limit is 6000 px/);
    expect(await server.db('export_files').where({ run_id: run.id })).toHaveLength(0);
    expect((await editor.get(`/api/exports/${run.id}/bundle`)).status).toBe(404);
  });

  it('when the request is bad or from outside the project, then it is refused and no run is made', async () => {
    const before = await server.db('export_runs').count('* as n').first();
    const noFormat = await viewer.post(`/api/projects/${projectId}/exports`, { selection: { mode: 'all' }, formats: [] });
    expect(noFormat.status).toBe(400);
    expect(noFormat.body.error.fields).toHaveProperty('formats');
    const foreign = await viewer.post(`/api/projects/${projectId}/exports`, { selection: { mode: 'selected', ids: [1] }, formats: ['png'] });
    expect(foreign.status).toBe(422);
    expect(foreign.body.error.fields).toHaveProperty('selection.ids');
    expect((await admin.post(`/api/projects/${projectId}/exports`, { selection: { mode: 'all' }, formats: ['png'] })).status).toBe(404);
    expect(await server.db('export_runs').count('* as n').first()).toEqual(before);
  });
});
