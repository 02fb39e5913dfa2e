// Runs the Knex migrations to the latest version against DATABASE_URL.
import { createDb } from '../api/db/knex';

const db = createDb(process.env.DATABASE_URL ?? '');
try {
  const [batch, applied] = await db.migrate.latest();
  console.log(applied.length ? `[lobewright] migrations applied (batch ${batch}): ${applied.join(', ')}` : '[lobewright] database schema is up to date');
} finally {
  await db.destroy();
}
