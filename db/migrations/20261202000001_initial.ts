// Initial schema: users, site settings, projects, memberships, figures, immutable revisions, comments,
// export runs and sessions. Constraints live here, not only in code.
import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('users', (t) => {
    t.bigIncrements('id');
    t.text('email').notNullable();
    t.text('name').notNullable();
    t.text('password_hash').notNullable();
    t.boolean('is_admin').notNullable().defaultTo(false);
    t.boolean('disabled').notNullable().defaultTo(false);
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
  await knex.raw('create unique index users_email_lower on users (lower(email))');
  await knex.raw("alter table users add constraint users_email_shape check (email ~ '^[^@\\s]+@[^@\\s]+$')");
  await knex.raw("alter table users add constraint users_name_present check (length(trim(name)) > 0)");

  await knex.schema.createTable('site_settings', (t) => {
    t.text('key').primary();
    t.jsonb('value').notNullable();
  });
  await knex('site_settings').insert({ key: 'signup_enabled', value: JSON.stringify(true) });

  await knex.schema.createTable('projects', (t) => {
    t.bigIncrements('id');
    t.text('name').notNullable();
    t.text('description').notNullable().defaultTo('');
    t.jsonb('house_style').notNullable().defaultTo('{}');
    t.timestamp('archived_at', { useTz: true });
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
  await knex.raw("alter table projects add constraint projects_name_present check (length(trim(name)) > 0)");

  await knex.schema.createTable('memberships', (t) => {
    t.bigInteger('project_id').notNullable().references('projects.id').onDelete('CASCADE');
    t.bigInteger('user_id').notNullable().references('users.id').onDelete('CASCADE');
    t.text('role').notNullable();
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.primary(['project_id', 'user_id']);
  });
  await knex.raw(
    "alter table memberships add constraint memberships_role check (role in ('owner','editor','reviewer','viewer'))",
  );

  await knex.schema.createTable('figures', (t) => {
    t.bigIncrements('id');
    t.bigInteger('project_id').notNullable().references('projects.id').onDelete('CASCADE');
    t.text('number').notNullable().defaultTo('');
    t.integer('position').notNullable().defaultTo(0);
    t.text('title').notNullable();
    t.text('caption').notNullable().defaultTo('');
    t.text('alt_text').notNullable().defaultTo('');
    t.text('status').notNullable().defaultTo('draft');
    t.integer('current_revision').notNullable().defaultTo(0);
    t.integer('approved_revision');
    t.timestamp('deleted_at', { useTz: true });
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['project_id']);
  });
  await knex.raw(
    "alter table figures add constraint figures_status check (status in ('draft','in_review','changes_requested','approved'))",
  );
  await knex.raw("alter table figures add constraint figures_title_present check (length(trim(title)) > 0)");
  await knex.raw(
    'alter table figures add constraint figures_approved_le_current check (approved_revision is null or approved_revision between 1 and current_revision)',
  );
  await knex.raw(
    "create unique index figures_number_unique on figures (project_id, number) where deleted_at is null and number <> ''",
  );

  await knex.schema.createTable('figure_revisions', (t) => {
    t.bigInteger('figure_id').notNullable().references('figures.id').onDelete('RESTRICT');
    t.integer('revision').notNullable();
    t.jsonb('spec').notNullable();
    t.text('spec_hash').notNullable();
    t.text('number').notNullable();
    t.text('title').notNullable();
    t.text('caption').notNullable();
    t.text('alt_text').notNullable();
    t.text('message').notNullable().defaultTo('');
    t.bigInteger('author_id').notNullable().references('users.id');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.primary(['figure_id', 'revision']);
  });
  await knex.raw('alter table figure_revisions add constraint figure_revisions_positive check (revision >= 1)');
  // Revisions are immutable: refuse updates and deletes at the database itself.
  await knex.raw(`
    create function figure_revisions_immutable() returns trigger language plpgsql as $$
    begin
      raise exception 'figure revisions are immutable';
    end $$;
    create trigger figure_revisions_no_change before update or delete on figure_revisions
      for each row execute function figure_revisions_immutable();
  `);

  await knex.schema.createTable('comments', (t) => {
    t.bigIncrements('id');
    t.bigInteger('figure_id').notNullable().references('figures.id').onDelete('CASCADE');
    t.integer('revision').notNullable();
    t.bigInteger('parent_id').references('comments.id').onDelete('CASCADE');
    t.bigInteger('author_id').notNullable().references('users.id');
    t.text('body').notNullable();
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['figure_id']);
  });
  await knex.raw("alter table comments add constraint comments_body_present check (length(trim(body)) > 0)");

  await knex.schema.createTable('export_runs', (t) => {
    t.bigIncrements('id');
    t.bigInteger('project_id').notNullable().references('projects.id').onDelete('CASCADE');
    t.bigInteger('started_by').notNullable().references('users.id');
    t.text('status').notNullable().defaultTo('queued');
    t.jsonb('request').notNullable();
    t.integer('done').notNullable().defaultTo(0);
    t.integer('total').notNullable().defaultTo(0);
    t.text('current_item');
    t.jsonb('errors').notNullable().defaultTo('[]');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('finished_at', { useTz: true });
  });
  await knex.raw(
    "alter table export_runs add constraint export_runs_status check (status in ('queued','running','succeeded','failed'))",
  );
  await knex.raw('alter table export_runs add constraint export_runs_progress check (done >= 0 and done <= total)');

  // Session table in the layout connect-pg-simple expects.
  await knex.schema.createTable('session', (t) => {
    t.string('sid').primary();
    t.json('sess').notNullable();
    t.timestamp('expire', { precision: 6 }).notNullable();
    t.index(['expire'], 'IDX_session_expire');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('session');
  await knex.schema.dropTable('export_runs');
  await knex.schema.dropTable('comments');
  await knex.raw('drop trigger if exists figure_revisions_no_change on figure_revisions');
  await knex.schema.dropTable('figure_revisions');
  await knex.raw('drop function if exists figure_revisions_immutable');
  await knex.schema.dropTable('figures');
  await knex.schema.dropTable('memberships');
  await knex.schema.dropTable('projects');
  await knex.schema.dropTable('site_settings');
  await knex.schema.dropTable('users');
}
