// The application's Knex instance, created from the parsed environment.
import knex, { type Knex } from 'knex';
import config from '../../knexfile';

export function createDb(databaseUrl: string): Knex {
  return knex({ ...config, connection: databaseUrl });
}
