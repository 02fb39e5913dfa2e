// Content hash of a figure spec: SHA-256 of its canonical JSON.
import { createHash } from 'node:crypto';
import { canonicalJson } from '../../shared/spec/canonical-json';

export function specHash(spec: unknown): string {
  return createHash('sha256').update(canonicalJson(spec)).digest('hex');
}
