// Projects and members: what each role may do, and that refused requests change nothing.
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { projectSchema } from '../../shared/api/schemas';
import { demo, signedIn, type ApiClient } from '../support/api-client';
import { startTestServer, type TestServer } from '../support/test-server';

let server: TestServer;
let owner: ApiClient, editor: ApiClient, reviewer: ApiClient, viewer: ApiClient, admin: ApiClient;
let chapter4: number;

beforeAll(async () => {
  server = await startTestServer(inject('databaseUrl'));
  [owner, editor, reviewer, viewer, admin] = await Promise.all(
    [demo.owner, demo.editor, demo.reviewer, demo.viewer, demo.admin].map((e) => signedIn(server.baseUrl, e)),
  );
  const list = await owner.get('/api/projects');
  chapter4 = list.body.find((p: { name: string }) => p.name.startsWith('Atoms & Bonds')).id;
});
afterAll(async () => server.stop());

async function projectRow(id: number) {
  return server.db('projects').where({ id }).first();
}

describe('projects', () => {
  it('when each demo user lists projects, then they see both demo projects with their own role', async () => {
    for (const [client, role] of [
      [owner, 'owner'],
      [editor, 'editor'],
      [reviewer, 'reviewer'],
      [viewer, 'viewer'],
    ] as const) {
      const r = await client.get('/api/projects');
      expect(r.status).toBe(200);
      const projects = r.body.map((p: unknown) => projectSchema.parse(p));
      expect(projects.filter((p: { name: string }) => /Atoms & Bonds|CHEM 1020/.test(p.name))).toHaveLength(2);
      expect(projects.find((p: { id: number }) => p.id === chapter4)?.role).toBe(role);
    }
  });

  it('when someone outside the project asks for it, then 404', async () => {
    expect((await admin.get(`/api/projects/${chapter4}`)).status).toBe(404);
    expect((await admin.get(`/api/projects/${chapter4}/figures`)).status).toBe(404);
  });

  it('when a user creates a project, then they own it', async () => {
    const r = await viewer.post('/api/projects', { name: 'Tomás’s notes' });
    expect(r.status).toBe(201);
    expect(r.body).toMatchObject({ name: 'Tomás’s notes', role: 'owner', figureCount: 0, archived: false });
  });

  it('when the name is empty, then 400 names "name" and nothing is stored', async () => {
    const before = await server.db('projects').count('* as n').first();
    const r = await owner.post('/api/projects', { name: '   ' });
    expect(r.status).toBe(400);
    expect(Object.keys(r.body.error.fields)).toEqual(['name']);
    expect(await server.db('projects').count('* as n').first()).toEqual(before);
  });

  it('when an editor tries to rename the project, then 403 and the name is unchanged', async () => {
    const before = await projectRow(chapter4);
    const r = await editor.patch(`/api/projects/${chapter4}`, { name: 'Renamed by editor' });
    expect(r.status).toBe(403);
    expect((await projectRow(chapter4)).name).toBe(before.name);
  });

  it('when the owner renames, archives and restores a project, then the list follows', async () => {
    const p = (await owner.post('/api/projects', { name: 'Spare' })).body;
    expect((await owner.patch(`/api/projects/${p.id}`, { name: 'Spare (2nd ed.)' })).body.name).toBe('Spare (2nd ed.)');
    expect((await owner.patch(`/api/projects/${p.id}`, { archived: true })).body.archived).toBe(true);
    expect((await owner.get('/api/projects')).body.map((x: { id: number }) => x.id)).not.toContain(p.id);
    expect((await owner.get('/api/projects?archived=true')).body.map((x: { id: number }) => x.id)).toContain(p.id);
    expect((await owner.patch(`/api/projects/${p.id}`, { archived: false })).body.archived).toBe(false);
  });

  it('when a project id is not a number, then 404', async () => {
    expect((await owner.get('/api/projects/abc')).status).toBe(404);
  });
});

describe('members', () => {
  it('when any member lists members, then all four roles are there', async () => {
    const r = await viewer.get(`/api/projects/${chapter4}/members`);
    expect(r.status).toBe(200);
    expect(r.body.map((m: { role: string }) => m.role)).toEqual(['owner', 'editor', 'reviewer', 'viewer']);
  });

  it('when the owner adds, promotes and removes a member, then each step is stored', async () => {
    const p = (await owner.post('/api/projects', { name: 'Members test' })).body;
    const add = await owner.post(`/api/projects/${p.id}/members`, { email: demo.reviewer, role: 'viewer' });
    expect(add.status).toBe(201);
    expect(add.body).toMatchObject({ email: demo.reviewer, role: 'viewer' });
    const uid = add.body.userId;
    expect((await owner.patch(`/api/projects/${p.id}/members/${uid}`, { role: 'editor' })).body.role).toBe('editor');
    expect((await owner.post(`/api/projects/${p.id}/members`, { email: demo.reviewer, role: 'viewer' })).status).toBe(409);
    expect((await owner.delete(`/api/projects/${p.id}/members/${uid}`)).status).toBe(204);
    expect((await owner.get(`/api/projects/${p.id}/members`)).body).toHaveLength(1);
  });

  it('when the owner adds an unknown e-mail, then 422 names "email"', async () => {
    const r = await owner.post(`/api/projects/${chapter4}/members`, { email: 'nobody@nowhere.example', role: 'viewer' });
    expect(r.status).toBe(422);
    expect(r.body.error.fields).toHaveProperty('email');
  });

  it('when the role is not one of ours, then 400 names "role"', async () => {
    const r = await owner.post(`/api/projects/${chapter4}/members`, { email: demo.admin, role: 'superuser' });
    expect(r.status).toBe(400);
    expect(r.body.error.fields).toHaveProperty('role');
  });

  it('when the last owner is removed or demoted, then 409 and they stay owner', async () => {
    const p = (await owner.post('/api/projects', { name: 'Last owner test' })).body;
    const me = (await owner.get('/api/auth/session')).body.user.id;
    const del = await owner.delete(`/api/projects/${p.id}/members/${me}`);
    expect(del.status).toBe(409);
    expect(del.body.error.code).toBe('last_owner');
    expect((await owner.patch(`/api/projects/${p.id}/members/${me}`, { role: 'editor' })).status).toBe(409);
    expect((await server.db('memberships').where({ project_id: p.id, user_id: me }).first()).role).toBe('owner');
  });

  it('when an editor, reviewer or viewer tries to manage members, then 403 and nothing changes', async () => {
    const before = await server.db('memberships').where({ project_id: chapter4 }).orderBy('user_id');
    const viewerId = before.find((m) => m.role === 'viewer').user_id;
    for (const c of [editor, reviewer, viewer]) {
      expect((await c.post(`/api/projects/${chapter4}/members`, { email: demo.admin, role: 'viewer' })).status).toBe(403);
      expect((await c.patch(`/api/projects/${chapter4}/members/${viewerId}`, { role: 'owner' })).status).toBe(403);
      expect((await c.delete(`/api/projects/${chapter4}/members/${viewerId}`)).status).toBe(403);
    }
    expect(await server.db('memberships').where({ project_id: chapter4 }).orderBy('user_id')).toEqual(before);
  });
});

describe('house style', () => {
  it('when the owner sets a house style, then members read it with product defaults filling the rest', async () => {
    const p = (await owner.post('/api/projects', { name: 'Styled' })).body;
    const put = await owner.put(`/api/projects/${p.id}/house-style`, { look: { positiveColour: '#224488' }, print: { dpi: 600 } });
    expect(put.status).toBe(200);
    const got = await owner.get(`/api/projects/${p.id}/house-style`);
    expect(got.body.look.positiveColour).toBe('#224488');
    expect(got.body.print).toMatchObject({ dpi: 600, widthMm: 84 });
  });

  it('when an editor changes the house style or sends a bad colour, then it is refused and unchanged', async () => {
    const before = await server.db('projects').where({ id: chapter4 }).first('house_style');
    expect((await editor.put(`/api/projects/${chapter4}/house-style`, { look: {} })).status).toBe(403);
    const bad = await owner.put(`/api/projects/${chapter4}/house-style`, { look: { positiveColour: 'red' } });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toHaveProperty('look.positiveColour');
    expect(await server.db('projects').where({ id: chapter4 }).first('house_style')).toEqual(before);
  });
});

describe('print files after a house-style change', () => {
  it('when the owner changes the house style, then figures show as not current until the re-render job has run', async () => {
    const { startTestServer: start } = await import('../support/test-server');
    const withJobs = await start(inject('databaseUrl'), {}, { jobs: true });
    try {
      const { signedIn: signIn, demo: d } = await import('../support/api-client');
      const o = await signIn(withJobs.baseUrl, d.owner);
      const p = (await o.post('/api/projects', { name: 'Restyle' })).body;
      await o.post(`/api/projects/${p.id}/figures`, {
        number: '1',
        title: 'Levels',
        spec: { schemaVersion: 1, state: { terms: [{ n: 1, l: 0, m: 0 }] }, kind: { type: 'levels' } },
      });
      expect((await o.get(`/api/projects/${p.id}/figures`)).body[0].printFilesCurrent).toBe(false);
      await o.put(`/api/projects/${p.id}/house-style`, { print: { dpi: 150, formats: ['svg', 'pdf'] } });
      let current = false;
      for (let i = 0; i < 100 && !current; i++) {
        await new Promise((r) => setTimeout(r, 100));
        current = (await o.get(`/api/projects/${p.id}/figures`)).body[0].printFilesCurrent;
      }
      expect(current).toBe(true);
      await o.put(`/api/projects/${p.id}/house-style`, { print: { dpi: 300, formats: ['svg', 'pdf'] }, look: { fontSizePt: 9 } });
      // Right after the change nothing is rendered for the new style yet.
      expect((await o.get(`/api/projects/${p.id}/figures`)).body[0].printFilesCurrent).toBe(false);
    } finally {
      await withJobs.stop();
    }
  });
});
