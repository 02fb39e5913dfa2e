/**
 * Tabulated potential from CSV (see ../parse-potential-csv for the format), interpolated by a
 * natural cubic spline (../natural-cubic-spline).
 *
 * Range rule: V is evaluated only inside the table, with one stated extrapolation. If
 * `asymptoticCharge` Z_∞ is given, V(r) = −Z_∞/r beyond the last point (the last tabulated value must
 * agree with −Z_∞/r_last to 1 %), the threshold is 0 and the grid may extend past the table.
 * Without it the grid ends at the last point (u = 0 there), the threshold is V at the last point,
 * and a level that has not died out by the end of the table is refused. Below the first point the
 * solver starts the regular solution at the first point (u ∝ r^{l+1}), which is accurate when the
 * table starts close to the nucleus compared with the level's extent.
 */
import { z } from 'zod';
import { OrbitalInputError } from '../../physics/orbital-input-error';
import type { Potential } from '../potential';
import { naturalCubicSpline } from '../natural-cubic-spline';
import { parsePotentialCsv } from '../parse-potential-csv';
import { fmt, issueField, nonNegative, parseParameters } from './parameters';

/** Largest relative mismatch between the last tabulated V and the Coulomb tail. */
const TAIL_MISMATCH = 0.01;
/** Smallest radius at which the grid may start (a table starting at r = 0). */
const SMALLEST_START = 1e-8;

export const tabulatedSchema = z.strictObject({
  type: z.literal('tabulated'),
  csv: z.string({ error: 'csv must be CSV text' }),
  asymptoticCharge: nonNegative('asymptoticCharge').optional(),
});

export function tabulatedPotential(input: unknown, field = 'potential'): Potential {
  const p = parseParameters(tabulatedSchema, input, field);
  const table = parsePotentialCsv(p.csv, issueField(field, ['csv']));
  const { r, V } = table;
  const first = r[0];
  const last = r[r.length - 1];
  const lastV = V[V.length - 1];
  const spline = naturalCubicSpline(r, V);
  const tail = p.asymptoticCharge;
  if (tail !== undefined) {
    const tailV = -tail / last;
    if (Math.abs(lastV - tailV) > TAIL_MISMATCH * Math.max(Math.abs(lastV), Math.abs(tailV))) {
      throw new OrbitalInputError(
        issueField(field, ['asymptoticCharge']),
        `the tail −${fmt(tail)}/r gives ${fmt(tailV)} hartree at the last tabulated radius ${fmt(last)} bohr, but the table has ${fmt(lastV)} hartree there (they must agree to ${TAIL_MISMATCH * 100} %)`,
      );
    }
  }
  const evaluate = (x: number): number => {
    if (x <= last) {
      const v = spline(Math.max(x, first));
      if (x >= first * (1 - 1e-12)) return v;
      throw new OrbitalInputError('r', `${fmt(x)} bohr lies below the first tabulated radius ${fmt(first)} bohr`);
    }
    if (tail !== undefined) return -tail / x;
    throw new OrbitalInputError('r', `${fmt(x)} bohr lies beyond the last tabulated radius ${fmt(last)} bohr and no asymptoticCharge is given`);
  };
  return {
    id: 'tabulated',
    label: `Tabulated, ${r.length} points, ${fmt(first)}–${fmt(last)} bohr (${table.units.r}, ${table.units.V})`,
    formula:
      'V(r) from the table by natural cubic spline' +
      (tail !== undefined ? `, −${fmt(tail)}/r beyond the last point` : ', no extrapolation') +
      '  [V in hartree, r in bohr]',
    evaluate,
    asymptotes: { threshold: tail !== undefined ? 0 : lastV, originCharge: 0, tailCharge: tail ?? 0 },
    lengthScale: last / 4,
    innerLimit: Math.max(first, SMALLEST_START),
    outerLimit: tail !== undefined ? undefined : last,
    smooth: true,
  };
}
