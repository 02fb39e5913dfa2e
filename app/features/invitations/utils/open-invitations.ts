// Which invitations still need the owner's attention (pending or lapsed, so they can be resent),
// newest first, and how long each link has left in words.
import type { Invitation } from '../../../../shared/api/schemas';
import { formatDate } from '../../../utils/format-date';

const HOUR_MS = 3_600_000;
const DAY_MS = 24 * HOUR_MS;

export function openInvitations(invitations: readonly Invitation[]): Invitation[] {
  return invitations
    .filter((i) => i.status === 'pending' || i.status === 'expired')
    .sort((a, b) => b.createdAt.localeCompare(a.createdAt) || b.id - a.id);
}

/** "expires in 6 days", "expires in 3 hours", "expired on 2 Dec 2026". */
export function describeExpiry(expiresAt: string, now: Date): string {
  const left = new Date(expiresAt).getTime() - now.getTime();
  if (Number.isNaN(left)) return `expires ${expiresAt}`;
  if (left <= 0) return `expired on ${formatDate(expiresAt)}`;
  // Rounded: a link mailed a minute ago for a week should read "7 days", not "6".
  const hours = Math.max(1, Math.round(left / HOUR_MS));
  if (hours < 24) return `expires in ${hours} ${hours === 1 ? 'hour' : 'hours'}`;
  const days = Math.round(left / DAY_MS);
  return `expires in ${days} ${days === 1 ? 'day' : 'days'}`;
}
