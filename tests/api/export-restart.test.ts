// A queued export run survives a restart: the job waits in PostgreSQL (pg-boss) until a worker runs.
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { demo, signedIn } from '../support/api-client';
import { startTestServer, type TestServer } from '../support/test-server';

let worker: TestServer | null = null;
afterAll(async () => worker?.stop());

describe('export runs across a restart', () => {
  let projectId: number;
  beforeAll(async () => {
    // No worker runs anywhere while the run is queued.
    const paused = await startTestServer(inject('databaseUrl'), {}, { jobs: 'enqueue-only' });
    const owner = await signedIn(paused.baseUrl, demo.owner);
    projectId = (await owner.post('/api/projects', { name: 'Restart test' })).body.id;
    await owner.post(`/api/projects/${projectId}/figures`, {
      number: '8.1',
      title: 'Levels',
      spec: { schemaVersion: 1, state: { terms: [{ n: 1, l: 0, m: 0 }] }, kind: { type: 'levels' }, print: { dpi: 150 } },
    });
    const start = await owner.post(`/api/projects/${projectId}/exports`, { selection: { mode: 'all' }, formats: ['pdf'] });
    expect(start.body.status).toBe('queued');
    await new Promise((r) => setTimeout(r, 1500));
    expect((await owner.get(`/api/exports/${start.body.id}`)).body.status).toBe('queued');
    await paused.stop();
  });

  it('when a server with a worker starts later, then it finishes the queued run', async () => {
    worker = await startTestServer(inject('databaseUrl'), {}, { jobs: true });
    const owner = await signedIn(worker.baseUrl, demo.owner);
    const [queued] = (await owner.get(`/api/projects/${projectId}/exports`)).body;
    let status = queued.status;
    for (let i = 0; i < 300 && (status === 'queued' || status === 'running'); i++) {
      await new Promise((r) => setTimeout(r, 100));
      status = (await owner.get(`/api/exports/${queued.id}`)).body.status;
    }
    expect(status).toBe('succeeded');
    expect((await owner.getBytes(`/api/exports/${queued.id}/bundle`)).status).toBe(200);
  });
});
