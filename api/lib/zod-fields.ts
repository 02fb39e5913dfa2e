// Turns zod issues into { "dotted.path": "reason" } for the API's error format.
import type { ZodError } from 'zod';

export function fieldsFromZod(err: ZodError, prefix = ''): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of err.issues) {
    const key = [prefix, ...issue.path.map(String)].filter(Boolean).join('.') || '(root)';
    fields[key] ??= issue.message;
  }
  return fields;
}
