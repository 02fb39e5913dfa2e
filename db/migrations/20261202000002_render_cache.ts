// Rendered files, kept by content hash of (resolved spec, format, renderer version) so the same
// figure is never rendered twice. PostgreSQL is the only store of record, files included.
import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('render_cache', (t) => {
    t.text('key').primary();
    t.text('format').notNullable();
    t.text('content_type').notNullable();
    t.binary('bytes').notNullable();
    t.jsonb('facts').notNullable().defaultTo('{}');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('used_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
  await knex.raw("alter table render_cache add constraint render_cache_format check (format in ('png','tiff','pdf','svg'))");
  await knex.raw('alter table render_cache add constraint render_cache_key_shape check (key ~ \'^[0-9a-f]{64}$\')');
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('render_cache');
}
