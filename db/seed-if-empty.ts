// Loads the demo data when the database has no users yet (used by scripts/start).
import { createDb } from '../api/db/knex';
import { loadDemoData } from './demo-data';

const db = createDb(process.env.DATABASE_URL ?? '');
try {
  const { count } = (await db('users').count('* as count').first()) ?? { count: 0 };
  if (Number(count) === 0) {
    await loadDemoData(db, Number(process.env.BCRYPT_COST ?? 10));
    console.log('[lobewright] demo data loaded');
  } else {
    console.log('[lobewright] database already has data; demo data not reloaded');
  }
} finally {
  await db.destroy();
}
