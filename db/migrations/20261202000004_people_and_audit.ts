// Invitations, single-use tokens (password reset, e-mail change) and the project audit trail.
// Tokens are stored only as SHA-256 hashes, so a database dump does not hand out working links.
import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('invitations', (t) => {
    t.bigIncrements('id');
    t.bigInteger('project_id').notNullable().references('projects.id').onDelete('CASCADE');
    t.text('email').notNullable();
    t.text('role').notNullable();
    t.bigInteger('invited_by').notNullable().references('users.id');
    t.text('token_hash').notNullable().unique();
    t.timestamp('expires_at', { useTz: true }).notNullable();
    t.timestamp('accepted_at', { useTz: true });
    t.timestamp('withdrawn_at', { useTz: true });
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['project_id']);
  });
  await knex.raw(
    "alter table invitations add constraint invitations_role check (role in ('owner','editor','reviewer','viewer'))",
  );
  await knex.raw('alter table invitations add constraint invitations_one_end check (accepted_at is null or withdrawn_at is null)');

  await knex.schema.createTable('user_tokens', (t) => {
    t.bigIncrements('id');
    t.bigInteger('user_id').notNullable().references('users.id').onDelete('CASCADE');
    t.text('purpose').notNullable();
    t.text('token_hash').notNullable().unique();
    t.jsonb('payload').notNullable().defaultTo('{}');
    t.timestamp('expires_at', { useTz: true }).notNullable();
    t.timestamp('used_at', { useTz: true });
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
  await knex.raw("alter table user_tokens add constraint user_tokens_purpose check (purpose in ('password_reset','email_change'))");

  await knex.schema.createTable('audit_entries', (t) => {
    t.bigIncrements('id');
    t.bigInteger('project_id').notNullable().references('projects.id').onDelete('CASCADE');
    t.bigInteger('actor_id').references('users.id');
    t.text('action').notNullable();
    t.text('summary').notNullable();
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['project_id', 'id']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('audit_entries');
  await knex.schema.dropTable('user_tokens');
  await knex.schema.dropTable('invitations');
}
