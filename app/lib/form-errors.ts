// Turns zod issues and API errors into one message per form field, keyed by dotted path
// (the same keys the server uses in `error.fields`).
import type { z } from 'zod';
import { ApiError } from './api-client';

export type FieldErrors = Record<string, string>;

/** Plain wording for zod's built-in messages; messages written in the shared schemas pass through. */
function plainMessage(issue: z.core.$ZodIssue): string {
  const builtIn = /^(Too small|Too big|Invalid)/.test(issue.message);
  if (!builtIn) return issue.message;
  if (issue.code === 'too_small' && issue.origin === 'string')
    return Number(issue.minimum) <= 1 ? 'Required' : `Use at least ${issue.minimum} characters`;
  if (issue.code === 'too_big' && issue.origin === 'string')
    return `Use at most ${issue.maximum} characters`;
  if (issue.code === 'too_small' && issue.origin === 'number')
    return `Must be at least ${issue.minimum}`;
  if (issue.code === 'too_big' && issue.origin === 'number')
    return `Must be at most ${issue.maximum}`;
  if (issue.code === 'too_small' && issue.origin === 'array')
    return Number(issue.minimum) <= 1 ? 'Choose at least one' : `Choose at least ${issue.minimum}`;
  if (issue.code === 'invalid_type' && issue.expected === 'number') return 'Enter a number';
  if (issue.code === 'invalid_format' && issue.format === 'email')
    return 'Enter an e-mail address such as name@example.org';
  return issue.message;
}

export function zodFieldErrors(error: z.ZodError): FieldErrors {
  const fields: FieldErrors = {};
  for (const issue of error.issues) {
    const key = issue.path.map(String).join('.') || 'form';
    fields[key] ??= plainMessage(issue as z.core.$ZodIssue);
  }
  return fields;
}

/** Parses form values with a shared schema; on failure returns the errors instead. */
export function validateForm<S extends z.ZodType>(
  schema: S,
  values: unknown,
): { ok: true; data: z.output<S> } | { ok: false; fields: FieldErrors } {
  const parsed = schema.safeParse(values);
  return parsed.success
    ? { ok: true, data: parsed.data }
    : { ok: false, fields: zodFieldErrors(parsed.error) };
}

export function apiFieldErrors(error: unknown): FieldErrors {
  return error instanceof ApiError ? error.fields : {};
}

/**
 * The message to show above a form, or null when every problem is already shown beside a field.
 * Field errors for fields the form does not show are listed here so that none is lost.
 */
export function formErrorMessage(
  error: unknown,
  shownFields: readonly string[] = [],
): string | null {
  if (!error) return null;
  if (!(error instanceof ApiError))
    return error instanceof Error ? error.message : 'Something went wrong.';
  const entries = Object.entries(error.fields);
  if (entries.length === 0) return error.message;
  const hidden = entries.filter(([key]) => !shownFields.includes(key));
  return hidden.length === 0
    ? null
    : hidden.map(([key, message]) => `${key}: ${message}`).join('; ');
}
