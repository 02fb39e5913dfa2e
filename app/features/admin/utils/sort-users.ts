// The admin user list's order: enabled accounts first, then by name as people read it.
import type { AdminUser } from '../../../../shared/api/schemas';

export function sortUsers(users: readonly AdminUser[]): AdminUser[] {
  return [...users].sort(
    (a, b) =>
      Number(a.disabled) - Number(b.disabled) ||
      a.name.localeCompare(b.name, 'en-GB', { sensitivity: 'base' }) ||
      a.email.localeCompare(b.email),
  );
}

/** Narrows the list to names or addresses containing the text typed, ignoring case and accents. */
export function filterUsers(users: readonly AdminUser[], text: string): AdminUser[] {
  const fold = (s: string) => s.normalize('NFD').replace(/\p{Diacritic}/gu, '').toLowerCase();
  const wanted = fold(text.trim());
  if (!wanted) return [...users];
  return users.filter((u) => fold(u.name).includes(wanted) || fold(u.email).includes(wanted));
}
