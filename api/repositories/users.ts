// Users table access: plain typed records in, plain typed records out.
import type { Knex } from 'knex';
import type { User } from '../../shared/api/schemas';

export interface UserRow {
  id: string;
  email: string;
  name: string;
  password_hash: string;
  is_admin: boolean;
  disabled: boolean;
}

export const toUser = (r: UserRow): User => ({ id: Number(r.id), email: r.email, name: r.name, isAdmin: r.is_admin });

export function findUserByEmail(db: Knex, email: string): Promise<UserRow | undefined> {
  return db<UserRow>('users').whereRaw('lower(email) = lower(?)', [email]).first();
}

export function findUserById(db: Knex, id: number): Promise<UserRow | undefined> {
  return db('users').where({ id }).first() as Promise<UserRow | undefined>;
}

export async function insertUser(
  db: Knex,
  u: { email: string; name: string; passwordHash: string; isAdmin?: boolean },
): Promise<UserRow> {
  const [row] = await db<UserRow>('users')
    .insert({ email: u.email, name: u.name, password_hash: u.passwordHash, is_admin: u.isAdmin ?? false })
    .returning('*');
  return row;
}

export async function getSetting<T>(db: Knex, key: string, fallback: T): Promise<T> {
  const row = await db('site_settings').where({ key }).first();
  return row ? (row.value as T) : fallback;
}

export async function putSetting(db: Knex, key: string, value: unknown): Promise<void> {
  await db('site_settings')
    .insert({ key, value: JSON.stringify(value) })
    .onConflict('key')
    .merge();
}
