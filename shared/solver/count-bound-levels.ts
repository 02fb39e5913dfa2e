/**
 * Number of bound levels of angular momentum l of a short-range potential, from the zero-energy
 * solution: its nodes on the grid plus one more if it is heading for a node beyond the grid.
 *
 * Source: the oscillation theorem at threshold (the zero-energy regular solution has as many nodes
 * as there are bound levels) and REFERENCE.md §10.5's definition of the critical point: beyond the
 * range of V the zero-energy solution is u = A r^{l+1} + B r^{−l}, and a level appears where A = 0.
 * A node lies beyond the last point exactly when A and u there have opposite signs. With u = r^{1/2} y
 * and x = ln r the free solution is y = A' t^i + B' t^{−i}, where t is the growth factor of
 * Numerov's recurrence for g = −(l + ½)² (≈ e^{(l+½)h}); two last values give the sign of A' as that
 * of t y_{N−1} − y_{N−2}, exactly for the discrete scheme (no derivative estimate).
 * Potentials with a Coulomb tail or confining ones have infinitely many levels (Infinity).
 * Tabulated potentials without a tail: the levels below V at the last point, on the table.
 * Accuracy: that of the Numerov discretisation, O(h⁴) in the critical parameters.
 */
import { OrbitalInputError } from '../physics/orbital-input-error';
import { radialSystem } from './radial-system';
import { sweepOutward } from './numerov-shooting';
import type { Potential } from './potential';

export function countBoundLevels(potential: Potential, l: number, mu: number, step: number): number {
  const { threshold, tailCharge } = potential.asymptotes;
  if (!Number.isFinite(threshold) || tailCharge > 0) return Infinity;
  // Twice the range, so that the last three points lie where V is negligible (and clear of a jump at a).
  const rEnd = potential.outerLimit ?? 2 * (potential.rangeEnd ?? Number.NaN);
  if (!(rEnd > 0)) throw new OrbitalInputError('potential', 'has neither a range nor a Coulomb tail');
  const s = radialSystem(potential, l, mu, rEnd, step);
  const nodes = sweepOutward(s, threshold);
  if (potential.outerLimit !== undefined) return nodes;
  const y = s.yOut;
  const n = y.length;
  const f = 1 - (step * step * (l + 0.5) * (l + 0.5)) / 12;
  const c = (12 - 10 * f) / f; // t + 1/t
  const t = 0.5 * (c + Math.sqrt(c * c - 4));
  return nodes + ((t * y[n - 1] - y[n - 2]) * y[n - 1] < 0 ? 1 : 0);
}
