// The whole product for browser tests: a fresh database with the demo data, and the server serving
// the built client (scripts/test builds it into dist/app first).
import { existsSync } from 'node:fs';
import path from 'node:path';
import { loadDemoData } from '../../db/demo-data';
import { createTestDatabase, withDb } from './test-database';
import { startTestServer } from './test-server';

export async function startStack(): Promise<{ baseUrl: string; stop(): Promise<void> }> {
  const dist = path.resolve('dist/app');
  if (!existsSync(path.join(dist, 'index.html'))) {
    throw new Error('dist/app/index.html is missing: build the client first (npx vite build; scripts/test does it)');
  }
  const url = await createTestDatabase(`lw_e2e_${process.pid}`);
  await withDb(url, (db) => loadDemoData(db, 4));
  const server = await startTestServer(url, { CLIENT_DIST: dist });
  return { baseUrl: server.baseUrl, stop: server.stop };
}
