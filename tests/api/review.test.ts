// Review: comments threaded by revision, status changes with who and when, approvals pinning a
// revision, figure order and numbers, bulk actions, and "needs review" mail to reviewers.
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { commentSchema, reviewEventSchema } from '../../shared/api/schemas';
import { demo, signedIn, type ApiClient } from '../support/api-client';
import { startTestServer, type TestServer } from '../support/test-server';

let server: TestServer;
let owner: ApiClient, editor: ApiClient, reviewer: ApiClient, viewer: ApiClient;
let projectId: number;

const spec = { schemaVersion: 1, state: { terms: [{ n: 2, l: 1, m: 0 }] }, kind: { type: 'isosurface' } };

beforeAll(async () => {
  server = await startTestServer(inject('databaseUrl'), {}, { mail: true });
  [owner, editor, reviewer, viewer] = await Promise.all([demo.owner, demo.editor, demo.reviewer, demo.viewer].map((e) => signedIn(server.baseUrl, e)));
  projectId = (await owner.post('/api/projects', { name: 'Review test' })).body.id;
  for (const [email, role] of [[demo.editor, 'editor'], [demo.reviewer, 'reviewer'], [demo.viewer, 'viewer']]) {
    await owner.post(`/api/projects/${projectId}/members`, { email, role });
  }
});
afterAll(async () => server.stop());

async function newFigure(number: string) {
  return (await editor.post(`/api/projects/${projectId}/figures`, { number, title: `Figure ${number}`, spec })).body;
}

describe('review flow', () => {
  it('when an editor submits, a reviewer requests changes, the editor resubmits and the reviewer approves, then each step is kept', async () => {
    const f = await newFigure('1.1');
    server.mail!.messages.length = 0;
    expect((await editor.post(`/api/figures/${f.id}/review`, { action: 'submit' })).body.status).toBe('in_review');
    expect(server.mail!.messages.map((m) => [m.to, m.subject])).toEqual([[[demo.reviewer], 'Figure 1.1 needs your review']]);
    expect(server.mail!.messages[0].text).toContain(`http://lobewright.test/figures/${f.id}`);

    const noNote = await reviewer.post(`/api/figures/${f.id}/review`, { action: 'request_changes' });
    expect(noNote.status).toBe(400);
    expect(noNote.body.error.fields).toHaveProperty('note');
    expect((await reviewer.post(`/api/figures/${f.id}/review`, { action: 'request_changes', note: 'Use pm' })).body.status).toBe('changes_requested');

    await editor.put(`/api/figures/${f.id}`, { baseRevision: 1, spec: { ...spec, system: { lengthUnit: 'pm' } } });
    await editor.post(`/api/figures/${f.id}/review`, { action: 'submit' });
    const approved = await reviewer.post(`/api/figures/${f.id}/review`, { action: 'approve' });
    expect(approved.body).toMatchObject({ status: 'approved', approvedRevision: 2, revision: 2 });

    const events = (await viewer.get(`/api/figures/${f.id}/review`)).body.map((e: unknown) => reviewEventSchema.parse(e));
    expect(events.map((e: { actorName: string; fromStatus: string; toStatus: string; revision: number }) => [e.actorName, e.fromStatus, e.toStatus, e.revision])).toEqual([
      ['Ravi Mendes', 'draft', 'in_review', 1],
      ['Lena Brandt', 'in_review', 'changes_requested', 1],
      ['Ravi Mendes', 'changes_requested', 'in_review', 2],
      ['Lena Brandt', 'in_review', 'approved', 2],
    ]);
    expect(events[1].note).toBe('Use pm');
  });

  it('when a step does not fit the status, then 409 and the status is unchanged', async () => {
    const f = await newFigure('1.2');
    const r = await reviewer.post(`/api/figures/${f.id}/review`, { action: 'approve' });
    expect(r.status).toBe(409);
    expect(r.body.error.code).toBe('invalid_transition');
    expect((await server.db('figures').where({ id: f.id }).first()).status).toBe('draft');
  });

  it('when a reviewer submits or a viewer reviews, then 403 and nothing is recorded', async () => {
    const f = await newFigure('1.3');
    expect((await reviewer.post(`/api/figures/${f.id}/review`, { action: 'submit' })).status).toBe(403);
    await editor.post(`/api/figures/${f.id}/review`, { action: 'submit' });
    expect((await viewer.post(`/api/figures/${f.id}/review`, { action: 'approve' })).status).toBe(403);
    expect(await server.db('review_events').where({ figure_id: f.id })).toHaveLength(1);
  });
});

describe('comments', () => {
  it('when reviewers comment and reply across revisions, then replies stay in their thread and revision', async () => {
    const f = await newFigure('2.1');
    const c1 = commentSchema.parse((await reviewer.post(`/api/figures/${f.id}/comments`, { body: 'Label the nodal plane.' })).body);
    expect(c1).toMatchObject({ revision: 1, parentId: null, authorName: 'Lena Brandt' });
    await editor.put(`/api/figures/${f.id}`, { baseRevision: 1, title: 'Relabelled' });
    const reply = (await editor.post(`/api/figures/${f.id}/comments`, { body: 'Done in revision 2.', parentId: c1.id })).body;
    expect(reply).toMatchObject({ revision: 1, parentId: c1.id });
    const fresh = (await reviewer.post(`/api/figures/${f.id}/comments`, { body: 'Looks right now.' })).body;
    expect(fresh.revision).toBe(2);
    expect((await viewer.get(`/api/figures/${f.id}/comments`)).body).toHaveLength(3);
  });

  it('when a viewer comments, or the body is empty, or the parent is elsewhere, then refused and nothing stored', async () => {
    const f = await newFigure('2.2');
    const other = await newFigure('2.3');
    const c = (await reviewer.post(`/api/figures/${other.id}/comments`, { body: 'Elsewhere' })).body;
    expect((await viewer.post(`/api/figures/${f.id}/comments`, { body: 'Hi' })).status).toBe(403);
    expect((await reviewer.post(`/api/figures/${f.id}/comments`, { body: '  ' })).body.error.fields).toHaveProperty('body');
    expect((await reviewer.post(`/api/figures/${f.id}/comments`, { body: 'Reply', parentId: c.id })).status).toBe(422);
    expect(await server.db('comments').where({ figure_id: f.id })).toHaveLength(0);
  });
});

describe('figure order and bulk actions', () => {
  it('when an editor reorders and renumbers (swapping two numbers), then the list follows in one step', async () => {
    const p = (await owner.post('/api/projects', { name: 'Order test' })).body;
    await owner.post(`/api/projects/${p.id}/members`, { email: demo.editor, role: 'editor' });
    const a = (await editor.post(`/api/projects/${p.id}/figures`, { number: '5.1', title: 'A', spec })).body;
    const b = (await editor.post(`/api/projects/${p.id}/figures`, { number: '5.2', title: 'B', spec })).body;
    const r = await editor.put(`/api/projects/${p.id}/figures/order`, { figures: [{ id: b.id, number: '5.1' }, { id: a.id, number: '5.2a' }] });
    expect(r.status).toBe(200);
    expect(r.body.map((f: { title: string; number: string }) => [f.title, f.number])).toEqual([['B', '5.1'], ['A', '5.2a']]);
  });

  it('when the order leaves a figure out or repeats a number, then it is refused and nothing moves', async () => {
    const figs = (await editor.get(`/api/projects/${projectId}/figures`)).body;
    const before = await server.db('figures').where({ project_id: projectId }).orderBy('id').select('id', 'number', 'position');
    const partial = await editor.put(`/api/projects/${projectId}/figures/order`, { figures: [{ id: figs[0].id, number: '9.9' }] });
    expect(partial.status).toBe(422);
    const dup = await editor.put(`/api/projects/${projectId}/figures/order`, { figures: figs.map((f: { id: number }) => ({ id: f.id, number: '7.7' })) });
    expect(dup.status).toBe(400);
    expect(await viewer.put(`/api/projects/${projectId}/figures/order`, { figures: [{ id: figs[0].id, number: '1' }] }).then((x) => x.status)).toBe(403);
    expect(await server.db('figures').where({ project_id: projectId }).orderBy('id').select('id', 'number', 'position')).toEqual(before);
  });

  it('when an editor submits several figures at once, then drafts move to review and others are reported as skipped', async () => {
    const f1 = await newFigure('3.1');
    const f2 = await newFigure('3.2');
    await editor.post(`/api/figures/${f2.id}/review`, { action: 'submit' });
    const r = await editor.post(`/api/projects/${projectId}/figures/bulk`, { ids: [f1.id, f2.id], action: 'submit' });
    expect(r.body.done).toEqual([f1.id]);
    expect(r.body.skipped.map((s: { id: number }) => s.id)).toEqual([f2.id]);
  });
});
