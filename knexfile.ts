// Knex configuration: one PostgreSQL database named by DATABASE_URL (scripts/start and scripts/test set it).
// Migrations come from db/migration-source.ts; seeds from db/seeds.
import type { Knex } from 'knex';
import { migrationSource } from './db/migration-source';

const config: Knex.Config = {
  client: 'pg',
  connection: process.env.DATABASE_URL,
  pool: { min: 0, max: 10 },
  migrations: { migrationSource },
  seeds: { directory: './db/seeds', extension: 'ts', loadExtensions: ['.ts'] },
};

export default config;
