// The list of migrations, imported statically so they run the same under tsx, vitest and bundlers.
// Add each new migration file here, in order.
import type { Knex } from 'knex';
import * as initial from './migrations/20261202000001_initial';
import * as renderCache from './migrations/20261202000002_render_cache';
import * as reviewAndExports from './migrations/20261202000003_review_and_exports';
import * as peopleAndAudit from './migrations/20261202000004_people_and_audit';
import * as datasets from './migrations/20261202000005_datasets';

const migrations: Record<string, Knex.Migration> = {
  '20261202000001_initial': initial,
  '20261202000002_render_cache': renderCache,
  '20261202000003_review_and_exports': reviewAndExports,
  '20261202000004_people_and_audit': peopleAndAudit,
  '20261202000005_datasets': datasets,
};

export const migrationSource: Knex.MigrationSource<string> = {
  getMigrations: async () => Object.keys(migrations),
  getMigrationName: (name) => name,
  getMigration: async (name) => migrations[name],
};
