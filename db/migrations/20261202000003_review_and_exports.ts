// Review history and export bundles: every status change is kept with who and when; a finished
// export run's ZIP is stored whole, in the same transaction that marks the run succeeded.
import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('review_events', (t) => {
    t.bigIncrements('id');
    t.bigInteger('figure_id').notNullable().references('figures.id').onDelete('CASCADE');
    t.integer('revision').notNullable();
    t.bigInteger('actor_id').notNullable().references('users.id');
    t.text('from_status').notNullable();
    t.text('to_status').notNullable();
    t.text('note').notNullable().defaultTo('');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['figure_id']);
  });
  const statuses = "('draft','in_review','changes_requested','approved')";
  await knex.raw(`alter table review_events add constraint review_events_from check (from_status in ${statuses})`);
  await knex.raw(`alter table review_events add constraint review_events_to check (to_status in ${statuses})`);

  await knex.schema.alterTable('export_runs', (t) => {
    t.text('job_id');
    t.timestamp('started_at', { useTz: true });
  });
  await knex.schema.createTable('export_files', (t) => {
    t.bigInteger('run_id').primary().references('export_runs.id').onDelete('CASCADE');
    t.text('filename').notNullable();
    t.binary('bytes').notNullable();
    t.text('sha256').notNullable();
    t.integer('size').notNullable();
    t.jsonb('manifest').notNullable();
  });
  await knex.raw('alter table export_files add constraint export_files_size check (size > 0)');
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('export_files');
  await knex.schema.alterTable('export_runs', (t) => {
    t.dropColumn('job_id');
    t.dropColumn('started_at');
  });
  await knex.schema.dropTable('review_events');
}
