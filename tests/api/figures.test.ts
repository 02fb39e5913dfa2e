// Figures and revisions: role checks, revision-number conflicts, validation, and immutability.
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { figureSchema, figureSummarySchema, revisionSchema } from '../../shared/api/schemas';
import { demo, signedIn, type ApiClient } from '../support/api-client';
import { startTestServer, type TestServer } from '../support/test-server';

let server: TestServer;
let owner: ApiClient, editor: ApiClient, reviewer: ApiClient, viewer: ApiClient, admin: ApiClient;
let chapter4: number;

const spec2pz = {
  schemaVersion: 1,
  state: { terms: [{ n: 2, l: 1, m: 0 }] },
  kind: { type: 'isosurface', enclosed: 0.9 },
};

beforeAll(async () => {
  server = await startTestServer(inject('databaseUrl'));
  [owner, editor, reviewer, viewer, admin] = await Promise.all(
    [demo.owner, demo.editor, demo.reviewer, demo.viewer, demo.admin].map((e) => signedIn(server.baseUrl, e)),
  );
  chapter4 = (await owner.get('/api/projects')).body.find((p: { name: string }) => p.name.startsWith('Atoms & Bonds')).id;
});
afterAll(async () => server.stop());

async function newFigure(title = 'Test figure') {
  const r = await editor.post(`/api/projects/${chapter4}/figures`, { title, spec: spec2pz });
  expect(r.status).toBe(201);
  return figureSchema.parse(r.body);
}

const snapshot = async (figureId: number) => ({
  figure: await server.db('figures').where({ id: figureId }).first(),
  revisions: await server.db('figure_revisions').where({ figure_id: figureId }).orderBy('revision'),
});

describe('figure list', () => {
  it('when a viewer lists the chapter figures, then all eight demo figures come in order with their status', async () => {
    const r = await viewer.get(`/api/projects/${chapter4}/figures`);
    expect(r.status).toBe(200);
    const figs = r.body.map((f: unknown) => figureSummarySchema.parse(f));
    const demoFigs = figs.filter((f: { number: string }) => /^4\.\d$/.test(f.number));
    expect(demoFigs.map((f: { number: string }) => f.number)).toEqual(['4.1', '4.2', '4.3', '4.4', '4.5', '4.6', '4.7', '4.8']);
    expect(demoFigs[0]).toMatchObject({ status: 'approved', approvedRevision: 1, kind: 'isosurface' });
    expect(demoFigs[2]).toMatchObject({ status: 'in_review', revision: 2 });
  });
});

describe('creating figures', () => {
  it('when an editor creates a figure, then it is revision 1 with the spec as sent (defaults filled)', async () => {
    const f = await newFigure();
    expect(f.revision).toBe(1);
    expect(f.status).toBe('draft');
    expect(f.spec.state.terms[0]).toEqual({ n: 2, l: 1, m: 0, basis: 'real', weight: { re: 1, im: 0 } });
    expect(f.spec.kind).toMatchObject({ type: 'isosurface', enclosed: 0.9, grid: 96 });
  });

  it('when a reviewer or viewer creates a figure, then 403 and nothing is stored', async () => {
    const before = await server.db('figures').count('* as n').first();
    for (const c of [reviewer, viewer]) {
      const r = await c.post(`/api/projects/${chapter4}/figures`, { title: 'Nope', spec: spec2pz });
      expect(r.status).toBe(403);
    }
    expect((await admin.post(`/api/projects/${chapter4}/figures`, { title: 'Nope', spec: spec2pz })).status).toBe(404);
    expect(await server.db('figures').count('* as n').first()).toEqual(before);
  });

  it('when the state is impossible, then 400 names each bad field and nothing is stored', async () => {
    const before = await server.db('figure_revisions').count('* as n').first();
    const r = await editor.post(`/api/projects/${chapter4}/figures`, {
      title: 'Bad',
      spec: { ...spec2pz, state: { terms: [{ n: 2, l: 2, m: -3 }] }, print: { dpi: 5000 } },
    });
    expect(r.status).toBe(400);
    expect(r.body.error.fields).toMatchObject({
      'spec.state.terms.0.l': 'l must be less than n (2)',
      'spec.state.terms.0.m': '|m| must not exceed l (2)',
    });
    expect(r.body.error.fields).toHaveProperty('spec.print.dpi');
    expect(await server.db('figure_revisions').count('* as n').first()).toEqual(before);
  });

  it('when a figure number is already used in the project, then 409 names "number"', async () => {
    const r = await editor.post(`/api/projects/${chapter4}/figures`, { number: '4.1', title: 'Clash', spec: spec2pz });
    expect(r.status).toBe(409);
    expect(r.body.error.fields).toHaveProperty('number');
  });

  it('when the spec has an unknown schema version, then 400 names schemaVersion', async () => {
    const r = await editor.post(`/api/projects/${chapter4}/figures`, { title: 'Future', spec: { ...spec2pz, schemaVersion: 7 } });
    expect(r.status).toBe(400);
    expect(r.body.error.fields).toHaveProperty('spec.schemaVersion');
  });
});

describe('saving revisions', () => {
  it('when an editor saves on the latest revision, then a new immutable revision is added', async () => {
    const f = await newFigure('Revisions');
    const r = await editor.put(`/api/figures/${f.id}`, {
      baseRevision: 1,
      spec: { ...spec2pz, kind: { type: 'isosurface', enclosed: 0.95 } },
      message: 'Tighter surface',
    });
    expect(r.status).toBe(200);
    expect(r.body.revision).toBe(2);
    const revs = await editor.get(`/api/figures/${f.id}/revisions`);
    expect(revs.body.map((x: { revision: number; message: string }) => [x.revision, x.message])).toEqual([
      [2, 'Tighter surface'],
      [1, 'created'],
    ]);
    expect(revs.body.map((x: { changedFields: string[] }) => x.changedFields)).toEqual([['spec.kind.enclosed'], []]);
    const r1 = revisionSchema.parse((await viewer.get(`/api/figures/${f.id}/revisions/1`)).body);
    expect(r1.spec.kind).toMatchObject({ enclosed: 0.9 });
    expect(r1.specHash).toMatch(/^[0-9a-f]{64}$/);
  });

  it('when two people save on the same revision, then the second gets 409 and the first save stands', async () => {
    const f = await newFigure('Race');
    const first = await editor.put(`/api/figures/${f.id}`, { baseRevision: 1, title: 'First' });
    expect(first.status).toBe(200);
    const before = await snapshot(f.id);
    const second = await owner.put(`/api/figures/${f.id}`, { baseRevision: 1, title: 'Second' });
    expect(second.status).toBe(409);
    expect(second.body.error.code).toBe('stale_revision');
    expect(second.body.error.message).toMatch(/revision 2/);
    expect(await snapshot(f.id)).toEqual(before);
  });

  it('when saves race in parallel on one revision, then exactly one succeeds', async () => {
    const f = await newFigure('Parallel');
    const replies = await Promise.all(
      [editor, owner, editor, owner].map((c, i) => c.put(`/api/figures/${f.id}`, { baseRevision: 1, title: `T${i}` })),
    );
    expect(replies.map((r) => r.status).sort()).toEqual([200, 409, 409, 409]);
    expect((await server.db('figure_revisions').where({ figure_id: f.id })).length).toBe(2);
  });

  it('when a reviewer or viewer saves, then 403 and nothing changes', async () => {
    const f = await newFigure('Guarded');
    const before = await snapshot(f.id);
    for (const c of [reviewer, viewer]) expect((await c.put(`/api/figures/${f.id}`, { baseRevision: 1, title: 'X' })).status).toBe(403);
    expect(await snapshot(f.id)).toEqual(before);
  });

  it('when an invalid save is sent, then 400 names the field and nothing changes', async () => {
    const f = await newFigure('Invalid save');
    const before = await snapshot(f.id);
    const r = await editor.put(`/api/figures/${f.id}`, { baseRevision: 1, title: '', spec: { ...spec2pz, system: { Z: 93 } } });
    expect(r.status).toBe(400);
    expect(r.body.error.fields).toHaveProperty('title');
    expect(r.body.error.fields).toHaveProperty('spec.system.Z');
    expect((await editor.put(`/api/figures/${f.id}`, { title: 'No base' })).body.error.fields).toHaveProperty('baseRevision');
    expect(await snapshot(f.id)).toEqual(before);
  });

  it('when an approved figure gets a new revision, then it goes back to review', async () => {
    const f = await newFigure('Approved then changed');
    await server.db('figures').where({ id: f.id }).update({ status: 'approved', approved_revision: 1 });
    const r = await editor.put(`/api/figures/${f.id}`, { baseRevision: 1, caption: 'New caption' });
    expect(r.body).toMatchObject({ status: 'in_review', approvedRevision: 1, revision: 2 });
  });

  it('when anyone tries to change a stored revision in the database, then PostgreSQL refuses', async () => {
    const f = await newFigure('Immutable');
    await expect(server.db('figure_revisions').where({ figure_id: f.id }).update({ title: 'tampered' })).rejects.toThrow(
      /immutable/,
    );
  });
});

describe('duplicate and delete', () => {
  it('when an editor duplicates a figure, then the copy has the same spec and its own revision 1', async () => {
    const f = await newFigure('Original');
    const r = await editor.post(`/api/figures/${f.id}/duplicate`);
    expect(r.status).toBe(201);
    expect(r.body).toMatchObject({ title: 'Original (copy)', revision: 1, number: '' });
    expect(r.body.spec).toEqual(f.spec);
    expect(r.body.id).not.toBe(f.id);
  });

  it('when an editor deletes a figure, then it is gone from the list and its revisions are kept', async () => {
    const f = await newFigure('Doomed');
    expect((await viewer.delete(`/api/figures/${f.id}`)).status).toBe(403);
    expect((await editor.delete(`/api/figures/${f.id}`)).status).toBe(204);
    expect((await editor.get(`/api/figures/${f.id}`)).status).toBe(404);
    const list = await editor.get(`/api/projects/${chapter4}/figures`);
    expect(list.body.map((x: { id: number }) => x.id)).not.toContain(f.id);
    expect((await server.db('figure_revisions').where({ figure_id: f.id })).length).toBe(1);
  });

  it('when someone outside the project asks for a figure or its revisions, then 404', async () => {
    const f = await newFigure('Private');
    expect((await admin.get(`/api/figures/${f.id}`)).status).toBe(404);
    expect((await admin.get(`/api/figures/${f.id}/revisions`)).status).toBe(404);
    expect((await admin.put(`/api/figures/${f.id}`, { baseRevision: 1, title: 'X' })).status).toBe(404);
  });
});

describe('archived projects', () => {
  it('when a project is archived, then its figures can be read but not changed until it is restored', async () => {
    const p = (await owner.post('/api/projects', { name: 'Archive me' })).body;
    await owner.post(`/api/projects/${p.id}/members`, { email: demo.editor, role: 'editor' });
    const f = (await editor.post(`/api/projects/${p.id}/figures`, { title: 'Kept', spec: spec2pz })).body;
    await owner.patch(`/api/projects/${p.id}`, { archived: true });
    const r = await editor.put(`/api/figures/${f.id}`, { baseRevision: 1, title: 'Changed' });
    expect(r.status).toBe(409);
    expect(r.body.error.code).toBe('project_archived');
    expect((await editor.post(`/api/projects/${p.id}/figures`, { title: 'New', spec: spec2pz })).status).toBe(409);
    expect((await editor.get(`/api/figures/${f.id}`)).body.title).toBe('Kept');
    await owner.patch(`/api/projects/${p.id}`, { archived: false });
    expect((await editor.put(`/api/figures/${f.id}`, { baseRevision: 1, title: 'Changed' })).status).toBe(200);
  });

  it('when a save is stale, then the 409 names the current revision in its details', async () => {
    const f = await newFigure('Details');
    await editor.put(`/api/figures/${f.id}`, { baseRevision: 1, title: 'One' });
    const r = await owner.put(`/api/figures/${f.id}`, { baseRevision: 1, title: 'Two' });
    expect(r.body.error.details).toEqual({ currentRevision: 2 });
  });

  it('when a figure is created with an empty number, then it is unnumbered', async () => {
    const r = await editor.post(`/api/projects/${chapter4}/figures`, { number: '', title: 'Unnumbered', spec: spec2pz });
    expect(r.status).toBe(201);
    expect(r.body.number).toBe('');
  });
});
