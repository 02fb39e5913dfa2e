// Single-use link tokens: 32 random bytes in base64url for the e-mail, SHA-256 in the database.
import { createHash, randomBytes } from 'node:crypto';

export function newToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, hash: hashToken(token) };
}

export function hashToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}
