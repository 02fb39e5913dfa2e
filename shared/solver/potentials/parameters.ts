/**
 * zod pieces shared by the potential schemas, and the translation of a zod failure into
 * OrbitalInputError naming the field (e.g. "potential.lambda"), so every bad parameter reads the same.
 */
import { z } from 'zod';
import { OrbitalInputError } from '../../physics/orbital-input-error';
import { MAX_NUCLEAR_CHARGE } from '../../physics/constants';

const finite = (what: string) =>
  z.number({ error: `${what} must be a number` }).refine(Number.isFinite, `${what} must be a finite number`);

/** Strictly positive finite number (a radius, a depth, a frequency). */
export const positive = (what: string) => finite(what).refine((v) => v > 0, `${what} must be greater than 0`);

/** Non-negative finite number (a screening constant that may vanish). */
export const nonNegative = (what: string) => finite(what).refine((v) => v >= 0, `${what} must not be negative`);

/** Nuclear charge, 0 < Z ≤ 92 (not necessarily an integer: effective charges are allowed). */
export const nuclearCharge = positive('Z').refine(
  (v) => v <= MAX_NUCLEAR_CHARGE,
  `Z must be at most ${MAX_NUCLEAR_CHARGE}`,
);

/** Path of a zod issue as "potential.lambda" or "rows[3]". */
export function issueField(prefix: string, path: readonly PropertyKey[]): string {
  let field = prefix;
  for (const p of path) field += typeof p === 'number' ? `[${p}]` : field ? `.${String(p)}` : String(p);
  return field || 'potential';
}

/** Parses with the schema or throws OrbitalInputError for the first issue, field-named. */
export function parseParameters<T extends z.ZodType>(schema: T, input: unknown, prefix: string): z.infer<T> {
  const parsed = schema.safeParse(input);
  if (parsed.success) return parsed.data;
  const issue = parsed.error.issues[0];
  if (issue.code === 'unrecognized_keys') {
    throw new OrbitalInputError(issueField(prefix, [...issue.path, issue.keys[0]]), 'is not a parameter of this potential');
  }
  throw new OrbitalInputError(issueField(prefix, issue.path), issue.message);
}

/** Significant figures for labels. */
export const fmt = (v: number): string => String(Number(v.toPrecision(6)));
