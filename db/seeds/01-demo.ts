// Knex seed: replaces all data with the demo scenario (see db/demo-data.ts).
import type { Knex } from 'knex';
import { loadDemoData } from '../demo-data';

export async function seed(knex: Knex): Promise<void> {
  await knex.raw('truncate users, projects, memberships, figures, figure_revisions, comments, export_runs, session cascade');
  await loadDemoData(knex, Number(process.env.BCRYPT_COST ?? 10));
}
