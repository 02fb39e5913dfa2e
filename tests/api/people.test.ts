// Invitations, password reset, the account, admin users and the audit trail, with the local SMTP
// fake catching the messages: links work once, expire, and every route checks the caller's role.
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { accountSchema, adminUserSchema, auditEntrySchema, invitationSchema } from '../../shared/api/schemas';
import { ApiClient, demo, signedIn } from '../support/api-client';
import { startTestServer, type TestServer } from '../support/test-server';

let server: TestServer;
let owner: ApiClient, editor: ApiClient, admin: ApiClient;
let projectId: number;

function lastLink(to: string, path: string): string {
  const mail = [...server.mail!.messages].reverse().find((m) => m.to.includes(to));
  if (!mail) throw new Error(`no mail to ${to}`);
  const m = new RegExp(`http://lobewright\\.test${path}\\?token=([A-Za-z0-9_-]+)`).exec(mail.text);
  if (!m) throw new Error(`no ${path} link in: ${mail.text}`);
  return m[1];
}

beforeAll(async () => {
  server = await startTestServer(inject('databaseUrl'), {}, { mail: true });
  [owner, editor, admin] = await Promise.all([demo.owner, demo.editor, demo.admin].map((e) => signedIn(server.baseUrl, e)));
  projectId = (await owner.post('/api/projects', { name: 'People test' })).body.id;
  await owner.post(`/api/projects/${projectId}/members`, { email: demo.editor, role: 'editor' });
});
afterAll(async () => server.stop());

describe('invitations', () => {
  it('when an owner invites a new address, then the link creates the account, adds the membership, and works once', async () => {
    const r = await owner.post(`/api/projects/${projectId}/invitations`, { email: 'nadia.fell@harrowgate.example', role: 'reviewer' });
    expect(r.status).toBe(201);
    expect(invitationSchema.parse(r.body)).toMatchObject({ status: 'pending', role: 'reviewer', invitedBy: 'Ada Okafor' });
    const token = lastLink('nadia.fell@harrowgate.example', '/invitations/accept');

    const guest = new ApiClient(server.baseUrl);
    const look = await guest.get(`/api/invitations/lookup?token=${token}`);
    expect(look.body).toEqual({ projectName: 'People test', email: 'nadia.fell@harrowgate.example', role: 'reviewer', invitedBy: 'Ada Okafor', accountExists: false });
    const missing = await guest.post('/api/invitations/accept', { token });
    expect(missing.status).toBe(400);
    expect(Object.keys(missing.body.error.fields).sort()).toEqual(['name', 'password']);
    const ok = await guest.post('/api/invitations/accept', { token, name: 'Nadia Fell', password: 'a good long password' });
    expect(ok.status).toBe(200);
    expect(ok.body.projectId).toBe(projectId);
    expect(ok.body.session.user.email).toBe('nadia.fell@harrowgate.example');
    expect((await guest.get(`/api/projects/${projectId}`)).body.role).toBe('reviewer');

    const again = await new ApiClient(server.baseUrl).post('/api/invitations/accept', { token, name: 'X', password: 'another long password' });
    expect(again.status).toBe(409);
    expect(again.body.error.code).toBe('already_used');
  });

  it('when the invited address has an account, then it must be signed in as that account to accept', async () => {
    await owner.post(`/api/projects/${projectId}/invitations`, { email: demo.viewer, role: 'viewer' });
    const token = lastLink(demo.viewer, '/invitations/accept');
    expect((await new ApiClient(server.baseUrl).post('/api/invitations/accept', { token })).body.error.code).toBe('sign_in_first');
    expect((await editor.post('/api/invitations/accept', { token })).body.error.code).toBe('wrong_account');
    const viewer = await signedIn(server.baseUrl, demo.viewer);
    expect((await viewer.post('/api/invitations/accept', { token })).status).toBe(200);
    expect((await viewer.get(`/api/projects/${projectId}`)).body.role).toBe('viewer');
  });

  it('when an invitation expires, is withdrawn or is resent, then old links are refused', async () => {
    const inv = (await owner.post(`/api/projects/${projectId}/invitations`, { email: 'late@fennwick.example', role: 'viewer' })).body;
    const first = lastLink('late@fennwick.example', '/invitations/accept');
    await owner.post(`/api/invitations/${inv.id}/resend`);
    const second = lastLink('late@fennwick.example', '/invitations/accept');
    expect(second).not.toBe(first);
    expect((await new ApiClient(server.baseUrl).get(`/api/invitations/lookup?token=${first}`)).status).toBe(404);
    await server.db('invitations').where({ id: inv.id }).update({ expires_at: new Date(Date.now() - 1000) });
    expect((await new ApiClient(server.baseUrl).get(`/api/invitations/lookup?token=${second}`)).status).toBe(410);
    const listed = (await owner.get(`/api/projects/${projectId}/invitations`)).body.find((i: { id: number }) => i.id === inv.id);
    expect(listed.status).toBe('expired');
    expect((await owner.delete(`/api/invitations/${inv.id}`)).status).toBe(204);
    expect((await new ApiClient(server.baseUrl).get(`/api/invitations/lookup?token=${second}`)).body.error.code).toBe('withdrawn');
  });

  it('when an editor invites or lists invitations, or a member is invited again, then it is refused', async () => {
    expect((await editor.post(`/api/projects/${projectId}/invitations`, { email: 'x@y.example', role: 'viewer' })).status).toBe(403);
    expect((await editor.get(`/api/projects/${projectId}/invitations`)).status).toBe(403);
    expect((await admin.get(`/api/projects/${projectId}/invitations`)).status).toBe(404);
    const again = await owner.post(`/api/projects/${projectId}/invitations`, { email: demo.editor, role: 'viewer' });
    expect(again.status).toBe(409);
    expect(again.body.error.code).toBe('already_member');
    expect((await owner.post(`/api/projects/${projectId}/invitations`, { email: 'bad', role: 'viewer' })).body.error.fields).toHaveProperty('email');
  });
});

describe('password reset', () => {
  it('when a user resets their password by e-mail, then the new one works, the link works once and other sessions end', async () => {
    const other = await signedIn(server.baseUrl, demo.reviewer);
    const guest = new ApiClient(server.baseUrl);
    expect((await guest.post('/api/auth/password-reset', { email: demo.reviewer })).status).toBe(202);
    expect((await guest.post('/api/auth/password-reset', { email: 'nobody@nowhere.example' })).status).toBe(202);
    const token = lastLink(demo.reviewer, '/reset-password');
    const short = await guest.post('/api/auth/password-reset/confirm', { token, password: 'short' });
    expect(short.body.error.fields).toHaveProperty('password');
    const r = await guest.post('/api/auth/password-reset/confirm', { token, password: 'a brand new password' });
    expect(r.status).toBe(200);
    expect(r.body.user.email).toBe(demo.reviewer);
    expect((await other.get('/api/projects')).status).toBe(401);
    expect((await new ApiClient(server.baseUrl).post('/api/auth/password-reset/confirm', { token, password: 'yet another password' })).status).toBe(400);
    await new ApiClient(server.baseUrl).signIn(demo.reviewer, 'a brand new password');
    // restore the demo password for the other test files
    await server.db('users').where({ email: demo.reviewer }).update({ password_hash: (await server.db('users').where({ email: demo.viewer }).first()).password_hash });
  });

  it('when a reset link has expired, then 410 and the password is unchanged', async () => {
    await new ApiClient(server.baseUrl).post('/api/auth/password-reset', { email: demo.viewer });
    const token = lastLink(demo.viewer, '/reset-password');
    await server.db('user_tokens').where({ purpose: 'password_reset' }).update({ expires_at: new Date(Date.now() - 1000) });
    const before = (await server.db('users').where({ email: demo.viewer }).first()).password_hash;
    expect((await new ApiClient(server.baseUrl).post('/api/auth/password-reset/confirm', { token, password: 'a brand new password' })).status).toBe(410);
    expect((await server.db('users').where({ email: demo.viewer }).first()).password_hash).toBe(before);
  });
});

describe('account', () => {
  it('when a user renames themselves and changes their password, then both stick; a wrong current password is refused', async () => {
    const me = await signedIn(server.baseUrl, 'nadia.fell@harrowgate.example').catch(async () => {
      const c = new ApiClient(server.baseUrl);
      await c.signIn('nadia.fell@harrowgate.example', 'a good long password');
      return c;
    });
    expect(accountSchema.parse((await me.patch('/api/account', { name: 'Nadia Fell-Rowe' })).body).user.name).toBe('Nadia Fell-Rowe');
    const wrong = await me.post('/api/account/password', { currentPassword: 'nope', newPassword: 'a newer long password' });
    expect(wrong.status).toBe(400);
    expect(wrong.body.error.fields).toHaveProperty('currentPassword');
    expect((await me.post('/api/account/password', { currentPassword: 'a good long password', newPassword: 'a newer long password' })).status).toBe(204);
    await new ApiClient(server.baseUrl).signIn('nadia.fell@harrowgate.example', 'a newer long password');
  });

  it('when a user changes their e-mail, then it changes only after the new address confirms', async () => {
    const me = new ApiClient(server.baseUrl);
    await me.signIn('nadia.fell@harrowgate.example', 'a newer long password');
    expect((await me.post('/api/account/email', { newEmail: 'nadia@fell.example', password: 'a newer long password' })).status).toBe(202);
    expect((await me.get('/api/account')).body.user.email).toBe('nadia.fell@harrowgate.example');
    const token = lastLink('nadia@fell.example', '/confirm-email');
    expect((await me.post('/api/account/email/confirm', { token })).body.user.email).toBe('nadia@fell.example');
    expect((await me.post('/api/account/email/confirm', { token })).status).toBe(400);
  });

  it('when a user signs out their other sessions, then those sessions end and this one stays', async () => {
    const a = new ApiClient(server.baseUrl);
    await a.signIn('nadia@fell.example', 'a newer long password');
    const b = new ApiClient(server.baseUrl);
    await b.signIn('nadia@fell.example', 'a newer long password');
    expect((await a.get('/api/account')).body.otherSessions).toBeGreaterThanOrEqual(1);
    expect((await a.post('/api/account/sign-out-others')).body.signedOut).toBeGreaterThanOrEqual(1);
    expect((await b.get('/api/account')).status).toBe(401);
    expect((await a.get('/api/account')).status).toBe(200);
  });
});

describe('admin users', () => {
  it('when an admin disables an account, then it cannot sign in and its sessions end; admins cannot disable themselves', async () => {
    const users = (await admin.get('/api/admin/users')).body.map((u: unknown) => adminUserSchema.parse(u));
    const nadia = users.find((u: { email: string }) => u.email === 'nadia@fell.example');
    const session = new ApiClient(server.baseUrl);
    await session.signIn('nadia@fell.example', 'a newer long password');
    expect((await admin.patch(`/api/admin/users/${nadia.id}`, { disabled: true })).body.disabled).toBe(true);
    expect((await session.get('/api/projects')).status).toBe(401);
    const c = new ApiClient(server.baseUrl);
    await c.refreshSession();
    expect((await c.post('/api/auth/login', { email: 'nadia@fell.example', password: 'a newer long password' })).status).toBe(401);
    const me = users.find((u: { email: string }) => u.email === demo.admin);
    expect((await admin.patch(`/api/admin/users/${me.id}`, { disabled: true })).status).toBe(409);
    expect((await editor.get('/api/admin/users')).status).toBe(403);
  });
});

describe('audit trail', () => {
  it('when the owner reads the audit trail, then role changes, invitations and figure saves are there with who', async () => {
    const f = (await editor.post(`/api/projects/${projectId}/figures`, { number: '1', title: 'Audited', spec: { schemaVersion: 1, state: { terms: [{ n: 1, l: 0, m: 0 }] }, kind: { type: 'levels' } } })).body;
    await editor.put(`/api/figures/${f.id}`, { baseRevision: 1, title: 'Audited again' });
    const members = (await owner.get(`/api/projects/${projectId}/members`)).body;
    const ravi = members.find((m: { email: string }) => m.email === demo.editor);
    await owner.patch(`/api/projects/${projectId}/members/${ravi.userId}`, { role: 'reviewer' });
    await owner.put(`/api/projects/${projectId}/house-style`, { look: { fontSizePt: 9 } });
    const entries = (await owner.get(`/api/projects/${projectId}/audit`)).body.map((e: unknown) => auditEntrySchema.parse(e));
    const lines = entries.map((e: { actorName: string; action: string; summary: string }) => `${e.actorName} | ${e.action} | ${e.summary}`);
    expect(lines).toContain('Ada Okafor | house_style.changed | changed the house style (fontSizePt)');
    expect(lines).toContain('Ada Okafor | member.role_changed | made Ravi Mendes reviewer');
    expect(lines).toContain('Ravi Mendes | figure.saved | saved figure 1 as revision 2');
    expect(lines).toContain('Ravi Mendes | figure.created | created figure 1 "Audited"');
    expect(lines).toContain('Ada Okafor | invitation.sent | invited nadia.fell@harrowgate.example as reviewer');
    // the actor is named as they are called now (renamed above); the summary keeps the name at the time
    expect(lines).toContain('Nadia Fell-Rowe | invitation.accepted | Nadia Fell joined as reviewer');
    expect((await editor.get(`/api/projects/${projectId}/audit`)).status).toBe(403);
  });
});
