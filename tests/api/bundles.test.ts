// Lobewright bundles and figure copies: round trip (same specs, same rendered bytes), migration from
// the bundle's schema version, refusals that change nothing, renumbering, role checks.
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { bundleSchema, importReportSchema, MAX_BUNDLE_BYTES } from '../../shared/api/bundle';
import { figureSchema } from '../../shared/api/schemas';
import { canonicalJson } from '../../shared/spec/canonical-json';
import { demo, signedIn, type ApiClient, type Json } from '../support/api-client';
import { startTestServer, type TestServer } from '../support/test-server';

let server: TestServer;
let seeded: number[];
let owner: ApiClient, editor: ApiClient, reviewer: ApiClient, viewer: ApiClient, admin: ApiClient;
let chapter4: number;
let course: number;
/** The project the round trip makes; later tests import and copy into it, so the demo projects stay as they were. */
let imported: number;

beforeAll(async () => {
  server = await startTestServer(inject('databaseUrl'));
  seeded = await server.db('projects').pluck('id');
  [owner, editor, reviewer, viewer, admin] = await Promise.all(
    [demo.owner, demo.editor, demo.reviewer, demo.viewer, demo.admin].map((e) =>
      signedIn(server.baseUrl, e),
    ),
  );
  const projects = (await owner.get('/api/projects')).body;
  chapter4 = projects.find((p: { name: string }) => p.name.startsWith('Atoms & Bonds')).id;
  course = projects.find((p: { id: number }) => p.id !== chapter4).id;
});
afterAll(async () => {
  // Projects made here are archived, so other test files see the demo users' project lists as seeded.
  await server.db('projects').whereNotIn('id', seeded).update({ archived_at: server.db.fn.now() });
  await server.stop();
});

const upload = (c: ApiClient, path: string, content: string | Buffer) =>
  c.upload(path, {
    field: 'bundle',
    name: 'project.lobewright.json',
    content,
    type: 'application/json',
  });

/** Row counts of every table an import or copy writes. */
async function counts() {
  const out: Record<string, number> = {};
  for (const t of [
    'projects',
    'memberships',
    'figures',
    'figure_revisions',
    'datasets',
    'audit_entries',
  ]) {
    const row = await server.db(t).count('* as n').first();
    out[t] = Number(row?.n);
  }
  return out;
}

async function figuresOf(c: ApiClient, projectId: number) {
  const list = (await c.get(`/api/projects/${projectId}/figures`)).body as { id: number }[];
  return Promise.all(
    list.map(async (f) => figureSchema.parse((await c.get(`/api/figures/${f.id}`)).body)),
  );
}

const smallBundle = (figures: Json[], schemaVersion = 1) =>
  JSON.stringify({
    lobewrightBundle: 1,
    schemaVersion,
    project: { name: 'Imported notes', description: '', houseStyle: {} },
    figures,
  });
const radial1s = {
  state: { terms: [{ n: 1, l: 0, m: 0 }] },
  kind: { type: 'radial', curves: [{ n: 1, l: 0, quantity: 'R' }] },
};

describe('export', () => {
  it('when a viewer downloads the project bundle, then it is an attachment with every figure, the house style, no user data, and the same bytes each time', async () => {
    const a = await viewer.getBytes(`/api/projects/${chapter4}/bundle`);
    expect(a.status).toBe(200);
    expect(a.headers.get('content-disposition')).toMatch(
      /^attachment; filename=".+\.lobewright\.json"$/,
    );
    const bundle = bundleSchema.parse(JSON.parse(a.bytes.toString('utf8')));
    expect(bundle.figures.map((f) => f.number).slice(0, 8)).toEqual([
      '4.1',
      '4.2',
      '4.3',
      '4.4',
      '4.5',
      '4.6',
      '4.7',
      '4.8',
    ]);
    const text = a.bytes.toString('utf8');
    for (const person of ['Ada', 'Okafor', 'ravi.mendes', '@harrowgate', 'createdAt', 'exportedAt'])
      expect(text).not.toContain(person);
    const b = await viewer.getBytes(`/api/projects/${chapter4}/bundle`);
    expect(b.bytes.equals(a.bytes)).toBe(true);
  });

  it('when someone outside the project asks for a bundle, then 404', async () => {
    const figureId = (await owner.get(`/api/projects/${chapter4}/figures`)).body[0].id;
    expect((await admin.getBytes(`/api/projects/${chapter4}/bundle`)).status).toBe(404);
    expect((await admin.getBytes(`/api/figures/${figureId}/bundle`)).status).toBe(404);
  });
});

describe('round trip', () => {
  it('when a project bundle is imported as a new project, then specs, texts, house style and rendered SVG bytes are identical', async () => {
    const stored = await server.db('projects').where({ id: chapter4 }).first('house_style');
    await owner.put(`/api/projects/${chapter4}/house-style`, {
      look: { lineWidthPt: 0.7 },
      print: { widthMm: 120 },
    });
    const exported = await owner.getBytes(`/api/projects/${chapter4}/bundle`);
    const r = await upload(editor, '/api/projects/import', exported.bytes);
    expect(r.status).toBe(201);
    const report = importReportSchema.parse(r.body);
    imported = report.projectId;
    expect(report.renamed).toEqual([]);
    expect(report.skipped).toEqual([]);

    const original = (await owner.get(`/api/projects/${chapter4}`)).body;
    const project = (await editor.get(`/api/projects/${report.projectId}`)).body;
    expect(project).toMatchObject({
      name: original.name,
      description: original.description,
      role: 'owner',
    });
    expect((await editor.get(`/api/projects/${report.projectId}/house-style`)).body).toEqual(
      (await owner.get(`/api/projects/${chapter4}/house-style`)).body,
    );
    const before = await figuresOf(owner, chapter4);
    const after = await figuresOf(editor, report.projectId);
    expect(after.length).toBe(before.length);
    after.forEach((f, i) => {
      expect(canonicalJson(f.spec)).toBe(canonicalJson(before[i].spec));
      expect([f.number, f.title, f.caption, f.altText]).toEqual([
        before[i].number,
        before[i].title,
        before[i].caption,
        before[i].altText,
      ]);
      expect(f.status).toBe('draft');
    });

    const radial = before.find((f) => f.number === '4.2')!;
    const copy = after.find((f) => f.number === '4.2')!;
    const svgA = await owner.getBytes(`/api/figures/${radial.id}/render?format=svg`);
    const svgB = await editor.getBytes(`/api/figures/${copy.id}/render?format=svg`);
    expect(svgA.status).toBe(200);
    expect(svgB.bytes.equals(svgA.bytes)).toBe(true);

    const reexported = await editor.getBytes(`/api/projects/${report.projectId}/bundle`);
    expect(reexported.bytes.equals(exported.bytes)).toBe(true);
    await server
      .db('projects')
      .where({ id: chapter4 })
      .update({ house_style: JSON.stringify(stored.house_style) });
    const audit = await server
      .db('audit_entries')
      .where({ project_id: report.projectId, action: 'bundle.imported' });
    expect(audit).toHaveLength(1);
  });
});

describe('schema versions', () => {
  it('when a version-1 bundle carries specs without their own version, then they are read as version 1', async () => {
    const r = await upload(
      viewer,
      '/api/projects/import',
      smallBundle([{ number: '1', title: 'R of 1s', spec: radial1s }]),
    );
    expect(r.status).toBe(201);
    const [fig] = await figuresOf(viewer, r.body.projectId);
    expect(fig.spec).toMatchObject({ schemaVersion: 1, kind: { type: 'radial', showNodes: true } });
  });

  it('when the bundle is of a future schema version, then 422 names schemaVersion and nothing is written', async () => {
    const before = await counts();
    const r = await upload(
      editor,
      '/api/projects/import',
      smallBundle([{ number: '1', title: 'x', spec: radial1s }], 2),
    );
    expect(r.status).toBe(422);
    expect(r.body.error.fields.schemaVersion).toMatch(
      /version 2 is newer than this Lobewright understands \(1\)/,
    );
    const own = await upload(
      editor,
      '/api/projects/import',
      smallBundle([{ number: '1', title: 'x', spec: { ...radial1s, schemaVersion: 7 } }]),
    );
    expect(own.status).toBe(422);
    expect(own.body.error.fields['figures.0.spec.schemaVersion']).toMatch(
      /schemaVersion 7 is newer/,
    );
    expect(await counts()).toEqual(before);
  });
});

describe('refused uploads change nothing', () => {
  it('when the file is not JSON, then 400 says so', async () => {
    const before = await counts();
    const r = await upload(
      editor,
      `/api/projects/${chapter4}/import`,
      '{"lobewrightBundle": 1, "figures": [',
    );
    expect(r.status).toBe(400);
    expect(r.body.error).toMatchObject({ code: 'malformed_bundle' });
    expect(r.body.error.message).toMatch(/not valid JSON/);
    expect(await counts()).toEqual(before);
  });

  it('when the JSON is not a bundle, then 422 names lobewrightBundle', async () => {
    const r = await upload(editor, '/api/projects/import', JSON.stringify({ figures: [] }));
    expect(r.status).toBe(422);
    expect(r.body.error.fields.lobewrightBundle).toMatch(/not a Lobewright bundle/);
  });

  it('when the file is larger than the limit, then 413 with the limit in the message', async () => {
    const before = await counts();
    const big = Buffer.alloc(MAX_BUNDLE_BYTES + 1024, 0x20);
    const r = await upload(editor, '/api/projects/import', big);
    expect(r.status).toBe(413);
    expect(r.body.error.message).toBe('the bundle file is larger than 5 MB; nothing was changed');
    expect(await counts()).toEqual(before);
  });

  it('when one figure of three is invalid, then 422 names the figure and field, and no figure is imported', async () => {
    const before = await counts();
    const figures = [
      { number: 'A1', title: 'Good', spec: radial1s },
      {
        number: 'A2',
        title: 'Bad',
        spec: { ...radial1s, state: { terms: [{ n: 2, l: 2, m: 0 }] } },
      },
      { number: 'A 3', title: '', spec: radial1s },
    ];
    for (const path of ['/api/projects/import', `/api/projects/${chapter4}/import`]) {
      const r = await upload(editor, path, smallBundle(figures));
      expect(r.status).toBe(422);
      expect(r.body.error.code).toBe('invalid_bundle');
      expect(r.body.error.fields).toMatchObject({
        'figures.1.spec.state.terms.0.l': 'l must be less than n (2)',
        'figures.2.number': 'use digits, letters, dots and dashes, e.g. 4.2a',
      });
      expect(r.body.error.fields).toHaveProperty('figures.2.title');
      expect(r.body.error.message).toMatch(/^the bundle was not imported, nothing was changed/);
    }
    expect(await counts()).toEqual(before);
  });

  it('when no file is sent, then 400 names the form field', async () => {
    const r = await editor.post('/api/projects/import', {});
    expect(r.status).toBe(400);
    expect(r.body.error.fields.bundle).toMatch(/form field "bundle"/);
  });
});

describe('import into a project', () => {
  it('when numbers clash, then the figures are renumbered and reported, and identical figures are skipped', async () => {
    const fig = (await editor.get(`/api/projects/${imported}/figures`)).body.find(
      (f: { number: string }) => f.number === '4.2',
    );
    const one = JSON.parse(
      (await editor.getBytes(`/api/figures/${fig.id}/bundle`)).bytes.toString('utf8'),
    );
    expect(one.figures).toHaveLength(1);

    const same = await upload(editor, `/api/projects/${imported}/import`, JSON.stringify(one));
    expect(same.status).toBe(200);
    expect(same.body).toMatchObject({
      imported: [],
      renamed: [],
      skipped: [{ number: '4.2', title: fig.title }],
    });

    one.figures[0].title = 'Radial distributions, second take';
    const first = await upload(editor, `/api/projects/${imported}/import`, JSON.stringify(one));
    expect(first.body).toMatchObject({
      imported: [{ number: '4.2-2' }],
      renamed: [{ from: '4.2', to: '4.2-2' }],
      skipped: [],
    });
    one.figures[0].title = 'Radial distributions, third take';
    const second = await upload(editor, `/api/projects/${imported}/import`, JSON.stringify(one));
    expect(second.body).toMatchObject({ renamed: [{ from: '4.2', to: '4.2-3' }] });
  });

  it('when a reviewer or viewer imports into the project, then 403; outsiders get 404; nothing is written', async () => {
    const before = await counts();
    const body = smallBundle([{ number: '', title: 'x', spec: radial1s }]);
    expect((await upload(reviewer, `/api/projects/${chapter4}/import`, body)).status).toBe(403);
    expect((await upload(viewer, `/api/projects/${chapter4}/import`, body)).status).toBe(403);
    expect((await upload(admin, `/api/projects/${chapter4}/import`, body)).status).toBe(404);
    expect(await counts()).toEqual(before);
  });
});

describe('copy between projects', () => {
  it('when an editor of both projects copies a figure, then the copy has the same spec and texts, a free number, and both projects record it', async () => {
    const src = (await figuresOf(editor, chapter4)).find((f) => f.number === '4.6')!;
    // The imported project starts with its own 4.6, so the copies are numbered 4.6-2 and 4.6-3.
    const a = await editor.post(`/api/figures/${src.id}/copy`, { projectId: imported });
    expect(a.status).toBe(201);
    const copy = figureSchema.parse(a.body);
    expect(copy).toMatchObject({
      projectId: imported,
      number: '4.6-2',
      title: src.title,
      caption: src.caption,
      revision: 1,
      status: 'draft',
    });
    expect(canonicalJson(copy.spec)).toBe(canonicalJson(src.spec));
    const again = await editor.post(`/api/figures/${src.id}/copy`, { projectId: imported });
    expect(again.body.number).toBe('4.6-3');
    const entries = await server
      .db('audit_entries')
      .where({ action: 'figure.copied' })
      .whereIn('project_id', [chapter4, imported]);
    expect(entries.length).toBe(4);
  });

  it('when the user may not edit the source or the target, then 403; when either is not theirs, then 404', async () => {
    const before = await counts();
    const src = (await owner.get(`/api/projects/${chapter4}/figures`)).body[0].id;
    const own = (await viewer.post('/api/projects', { name: 'Viewer’s own' })).body.id;
    expect((await viewer.post(`/api/figures/${src}/copy`, { projectId: own })).status).toBe(403);
    expect((await reviewer.post(`/api/figures/${src}/copy`, { projectId: course })).status).toBe(
      403,
    );
    expect((await editor.post(`/api/figures/${src}/copy`, { projectId: own })).status).toBe(404);
    expect((await admin.post(`/api/figures/${src}/copy`, { projectId: course })).status).toBe(404);
    expect((await editor.post(`/api/figures/${src}/copy`, { projectId: 'x' })).status).toBe(400);
    const after = await counts();
    expect({ ...after, projects: before.projects, memberships: before.memberships }).toEqual(
      before,
    );
  });
});
