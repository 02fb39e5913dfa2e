// Tolerance check for numerical tests: on failure the message gives input, value, expected, difference and tolerance.
import { expect } from 'vitest';

export interface Tolerance {
  /** Relative tolerance (times |expected|, or times `scale` when given). */
  rel?: number;
  /** Absolute floor, for values near zeros and nodes. */
  abs?: number;
  /** Size the relative tolerance is measured against (e.g. the function's maximum). */
  scale?: number;
}

export function expectClose(
  value: number,
  expected: number,
  tol: Tolerance,
  input: unknown = '',
): void {
  const rel = tol.rel ?? 0;
  const allowed = Math.max(rel * (tol.scale ?? Math.abs(expected)), tol.abs ?? 0);
  const diff = Math.abs(value - expected);
  const ok = value === expected || diff <= allowed;
  if (!ok) {
    expect.fail(
      `input ${JSON.stringify(input)}: value ${value}, expected ${expected}, difference ${diff.toExponential(3)}, tolerance ${allowed.toExponential(3)}`,
    );
  }
}
