// The client's one door to the API: CSRF header on changes, answers parsed by the shared schemas,
// errors carried as ApiError with the server's code, message and field errors.
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { z } from 'zod';
import { api, ApiError, setCsrfTokenSource } from '../../../app/lib/api-client';
import { sessionSchema } from '../../../shared/api/schemas';

interface Call {
  url: string;
  method: string;
  headers: Record<string, string>;
  body: string | undefined;
}

const json = (status: number, body: unknown) =>
  new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } });

let calls: Call[];
let answers: Response[];
let tokens: string[];

beforeEach(() => {
  calls = [];
  answers = [];
  tokens = ['token-1', 'token-2'];
  vi.stubGlobal('fetch', async (url: string, init: RequestInit) => {
    calls.push({
      url,
      method: String(init.method),
      headers: init.headers as Record<string, string>,
      body: init.body as string | undefined,
    });
    const answer = answers.shift();
    if (!answer) throw new Error('no answer queued');
    return answer;
  });
  let current = 0;
  setCsrfTokenSource({
    current: async () => tokens[current],
    refresh: async () => tokens[++current],
  });
});

afterEach(() => vi.unstubAllGlobals());

describe('api client', () => {
  it('when reading, then no CSRF token is sent and the answer is parsed', async () => {
    answers.push(json(200, { user: null, csrfToken: 'abc', signupEnabled: true }));
    const session = await api.get('/auth/session', sessionSchema);
    expect(session).toEqual({ user: null, csrfToken: 'abc', signupEnabled: true });
    expect(calls[0]).toMatchObject({ url: '/api/auth/session', method: 'GET' });
    expect(calls[0].headers['x-csrf-token']).toBeUndefined();
  });

  it('when changing something, then the session token goes in x-csrf-token and the body as JSON', async () => {
    answers.push(json(200, { signupEnabled: false }));
    await api.put(
      '/admin/settings',
      { signupEnabled: false },
      z.object({ signupEnabled: z.boolean() }),
    );
    expect(calls[0].headers).toMatchObject({
      'x-csrf-token': 'token-1',
      'content-type': 'application/json',
    });
    expect(JSON.parse(calls[0].body!)).toEqual({ signupEnabled: false });
  });

  it('when query values are given, then they go in the address and undefined ones are left out', async () => {
    answers.push(json(200, []));
    await api.get('/projects', z.array(z.unknown()), {
      query: { archived: 'true', other: undefined },
    });
    expect(calls[0].url).toBe('/api/projects?archived=true');
  });

  it('when the server refuses the token (403 csrf), then a fresh token is fetched and the request sent once more', async () => {
    answers.push(
      json(403, { error: { code: 'csrf', message: 'missing or wrong x-csrf-token header' } }),
    );
    answers.push(json(200, { ok: true }));
    await expect(
      api.post('/projects', { name: 'x' }, z.object({ ok: z.boolean() })),
    ).resolves.toEqual({ ok: true });
    expect(calls.map((c) => c.headers['x-csrf-token'])).toEqual(['token-1', 'token-2']);
  });

  it('when the server answers with an error body, then ApiError carries status, code, message and fields', async () => {
    answers.push(
      json(422, {
        error: {
          code: 'validation',
          message: 'invalid request',
          fields: { 'spec.state.terms.0.l': 'l must be less than n (2)' },
        },
      }),
    );
    const error = await api.post('/projects/1/figures', {}, z.unknown()).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ApiError);
    expect(error).toMatchObject({
      status: 422,
      code: 'validation',
      message: 'invalid request',
      fields: { 'spec.state.terms.0.l': 'l must be less than n (2)' },
    });
  });

  it('when an error answer is not in the API error form, then the status is reported plainly', async () => {
    answers.push(
      new Response('<html>Bad gateway</html>', { status: 502, statusText: 'Bad Gateway' }),
    );
    await expect(api.get('/projects', z.unknown())).rejects.toMatchObject({
      status: 502,
      code: 'http_502',
      message: 'The server answered 502 (Bad Gateway).',
    });
  });

  it('when an answer does not match its schema, then ApiError names where it differs', async () => {
    answers.push(json(200, { user: null, csrfToken: 42, signupEnabled: true }));
    await expect(api.get('/auth/session', sessionSchema)).rejects.toMatchObject({
      code: 'unexpected_response',
      message: expect.stringContaining('at csrfToken'),
    });
  });

  it('when deleting, then a 204 answer resolves with nothing', async () => {
    answers.push(new Response(null, { status: 204 }));
    await expect(api.delete('/figures/3')).resolves.toBeUndefined();
    expect(calls[0]).toMatchObject({ url: '/api/figures/3', method: 'DELETE' });
  });
});
