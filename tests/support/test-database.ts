// Throwaway databases for tests, on the PostgreSQL cluster that scripts/test starts
// (its address comes in LOBEWRIGHT_TEST_PG_URL, e.g. postgres://lobewright@127.0.0.1:PORT).
import type { Knex } from 'knex';
import { createDb } from '../../api/db/knex';

export function testClusterUrl(): string {
  const url = process.env.LOBEWRIGHT_TEST_PG_URL;
  if (!url) {
    throw new Error(
      'LOBEWRIGHT_TEST_PG_URL is not set: run the tests through scripts/test, which starts a throwaway PostgreSQL',
    );
  }
  return url.replace(/\/$/, '');
}

/** Creates (or re-creates) an empty database, migrated to the latest schema; returns its URL. */
export async function createTestDatabase(name: string): Promise<string> {
  const admin = createDb(`${testClusterUrl()}/postgres`);
  try {
    await admin.raw(`drop database if exists "${name}" with (force)`);
    await admin.raw(`create database "${name}"`);
  } finally {
    await admin.destroy();
  }
  const url = `${testClusterUrl()}/${name}`;
  const db = createDb(url);
  try {
    await db.migrate.latest();
  } finally {
    await db.destroy();
  }
  return url;
}

export async function withDb<T>(url: string, fn: (db: Knex) => Promise<T>): Promise<T> {
  const db = createDb(url);
  try {
    return await fn(db);
  } finally {
    await db.destroy();
  }
}
