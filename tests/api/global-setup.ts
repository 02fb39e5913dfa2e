// API tests: one migrated database with the demo data, shared by the API test files (run one at a time).
import type { TestProject } from 'vitest/node';
import { loadDemoData } from '../../db/demo-data';
import { createTestDatabase, withDb } from '../support/test-database';

declare module 'vitest' {
  export interface ProvidedContext {
    databaseUrl: string;
  }
}

export default async function setup(project: TestProject): Promise<void> {
  const url = await createTestDatabase(`lw_api_${process.pid}`);
  await withDb(url, (db) => loadDemoData(db, 4));
  project.provide('databaseUrl', url);
}
