// The whole product for browser tests: a fresh database with the demo data, and the server serving
// the built client (scripts/test builds it into dist/app first); with { mail: true } outgoing mail
// goes to a local SMTP fake whose messages the test can read. LOBEWRIGHT_CLIENT_DIST names another
// build folder, so a test run is not disturbed by a rebuild of dist/app in the same checkout.
import { existsSync } from 'node:fs';
import path from 'node:path';
import { loadDemoData } from '../../db/demo-data';
import type { MailFake } from '../../api/mail/mail-fake';
import { createTestDatabase, withDb } from './test-database';
import { startTestServer } from './test-server';

export interface Stack {
  baseUrl: string;
  /** Present when started with { mail: true }. */
  mail: MailFake | null;
  stop(): Promise<void>;
}

export async function startStack(options: { mail?: boolean } = {}): Promise<Stack> {
  const dist = path.resolve(process.env.LOBEWRIGHT_CLIENT_DIST ?? 'dist/app');
  if (!existsSync(path.join(dist, 'index.html'))) {
    throw new Error(`${dist}/index.html is missing: build the client first (npx vite build; scripts/test does it)`);
  }
  const url = await createTestDatabase(`lw_e2e_${process.pid}`);
  await withDb(url, (db) => loadDemoData(db, 4));
  const server = await startTestServer(url, { CLIENT_DIST: dist }, { mail: options.mail ?? false });
  return { baseUrl: server.baseUrl, mail: server.mail, stop: server.stop };
}
