// Sign-in, sessions, sign-up, CSRF and login rate limiting, against the real server and PostgreSQL.
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { sessionSchema } from '../../shared/api/schemas';
import { ApiClient, demo, signedIn } from '../support/api-client';
import { startTestServer, type TestServer } from '../support/test-server';

let server: TestServer;
beforeAll(async () => {
  server = await startTestServer(inject('databaseUrl'));
});
afterAll(async () => server.stop());

describe('sessions', () => {
  it('when nobody is signed in, then the session has no user and a CSRF token', async () => {
    const c = new ApiClient(server.baseUrl);
    const r = await c.get('/api/auth/session');
    expect(r.status).toBe(200);
    const s = sessionSchema.parse(r.body);
    expect(s.user).toBeNull();
    expect(s.csrfToken.length).toBeGreaterThan(20);
  });

  it('when a demo user signs in with the right password, then the session names them', async () => {
    const c = await signedIn(server.baseUrl, demo.editor);
    const r = await c.get('/api/auth/session');
    expect(r.body.user).toMatchObject({ email: demo.editor, name: 'Ravi Mendes', isAdmin: false });
  });

  it('when the password is wrong, then 401 and no user', async () => {
    const c = new ApiClient(server.baseUrl);
    await c.refreshSession();
    const r = await c.post('/api/auth/login', { email: demo.editor, password: 'not-the-password' });
    expect(r.status).toBe(401);
    expect(r.body.error.code).toBe('bad_credentials');
    expect((await c.get('/api/auth/session')).body.user).toBeNull();
  });

  it('when the e-mail is malformed, then 400 names the field', async () => {
    const c = new ApiClient(server.baseUrl);
    const r = await c.post('/api/auth/login', { email: 'nobody', password: 'x' });
    expect(r.status).toBe(400);
    expect(Object.keys(r.body.error.fields)).toEqual(['email']);
  });

  it('when signing in, then the cookie is httpOnly and SameSite=Strict', async () => {
    const c = new ApiClient(server.baseUrl);
    await c.refreshSession();
    const r = await c.post('/api/auth/login', { email: demo.viewer, password: 'lobewright-demo' });
    const cookie = r.headers.getSetCookie().find((h) => h.startsWith('lobewright.sid='));
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Strict/i);
  });

  it('when signing out, then the session is anonymous again and protected routes answer 401', async () => {
    const c = await signedIn(server.baseUrl, demo.viewer);
    expect((await c.post('/api/auth/logout')).body.user).toBeNull();
    const r = await c.get('/api/projects');
    expect(r.status).toBe(401);
    expect(r.body.error.code).toBe('unauthenticated');
  });

  it('when a state-changing request lacks the CSRF token, then 403 and nothing happens', async () => {
    const c = await signedIn(server.baseUrl, demo.owner);
    const r = await c.request('POST', '/api/projects', { name: 'Forged' }, { csrf: false });
    expect(r.status).toBe(403);
    expect(r.body.error.code).toBe('csrf');
    const list = await c.get('/api/projects');
    expect(list.body.map((p: { name: string }) => p.name)).not.toContain('Forged');
  });

  it('when a response is an error, then it carries no stack trace', async () => {
    const c = await signedIn(server.baseUrl, demo.owner);
    const r = await c.request('POST', '/api/projects', '{"name": ', {});
    expect(r.status).toBe(400);
    expect(r.body.error.code).toBe('malformed_json');
    expect(JSON.stringify(r.body)).not.toMatch(/at .*\.ts:\d+/);
  });
});

describe('sign-up', () => {
  it('when sign-up is on, then a new account can be made and is signed in', async () => {
    const c = new ApiClient(server.baseUrl);
    const r = await c.post('/api/auth/signup', {
      email: 'iris.vale@harrowgate.example',
      name: 'Iris Vale',
      password: 'a long enough password',
    });
    expect(r.status).toBe(201);
    expect(r.body.user.email).toBe('iris.vale@harrowgate.example');
  });

  it('when the e-mail is taken, then 409 names the field', async () => {
    const c = new ApiClient(server.baseUrl);
    const r = await c.post('/api/auth/signup', { email: demo.editor.toUpperCase(), name: 'X', password: 'a long enough password' });
    expect(r.status).toBe(409);
    expect(r.body.error.fields).toHaveProperty('email');
  });

  it('when the password is short, then 400 names the field', async () => {
    const c = new ApiClient(server.baseUrl);
    const r = await c.post('/api/auth/signup', { email: 'x@y.example', name: 'X', password: 'short' });
    expect(r.status).toBe(400);
    expect(r.body.error.fields.password).toMatch(/at least 10/);
  });

  it('when an admin switches sign-up off, then sign-up answers 403; only admins may switch it', async () => {
    const editor = await signedIn(server.baseUrl, demo.editor);
    expect((await editor.put('/api/admin/settings', { signupEnabled: false })).status).toBe(403);

    const admin = await signedIn(server.baseUrl, demo.admin);
    expect((await admin.put('/api/admin/settings', { signupEnabled: false })).status).toBe(200);
    const c = new ApiClient(server.baseUrl);
    expect((await c.get('/api/auth/session')).body.signupEnabled).toBe(false);
    const r = await c.post('/api/auth/signup', { email: 'new@x.example', name: 'New', password: 'a long enough password' });
    expect(r.status).toBe(403);
    expect(r.body.error.code).toBe('signup_disabled');
    await admin.put('/api/admin/settings', { signupEnabled: true });
  });
});

describe('login rate limit', () => {
  it('when too many sign-in attempts come from one address, then 429', async () => {
    const limited = await startTestServer(inject('databaseUrl'), { LOGIN_RATE_LIMIT: '3' });
    try {
      const c = new ApiClient(limited.baseUrl);
      await c.refreshSession();
      const statuses: number[] = [];
      for (let i = 0; i < 4; i++) statuses.push((await c.post('/api/auth/login', { email: demo.viewer, password: 'wrong' })).status);
      expect(statuses).toEqual([401, 401, 401, 429]);
    } finally {
      await limited.stop();
    }
  });
});
