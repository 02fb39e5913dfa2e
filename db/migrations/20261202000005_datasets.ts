// Uploaded data for radial plots: a column of radii and a column of values (a radial function, a
// radial distribution or a potential), in the units the upload stated, stored in PostgreSQL.
import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('datasets', (t) => {
    t.bigIncrements('id');
    t.bigInteger('project_id').notNullable().references('projects.id').onDelete('CASCADE');
    t.text('name').notNullable();
    t.text('quantity').notNullable();
    t.text('r_unit').notNullable();
    t.text('value_unit').notNullable();
    t.specificType('r', 'double precision[]').notNullable();
    t.specificType('values', 'double precision[]').notNullable();
    t.bigInteger('created_by').notNullable().references('users.id');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['project_id']);
  });
  await knex.raw("alter table datasets add constraint datasets_quantity check (quantity in ('R','r2R2','potential'))");
  await knex.raw('alter table datasets add constraint datasets_lengths check (cardinality(r) = cardinality("values") and cardinality(r) >= 2)');
  await knex.raw("alter table datasets add constraint datasets_name_present check (length(trim(name)) > 0)");
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('datasets');
}
