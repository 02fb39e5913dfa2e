/**
 * Radius r_p (bohr) of the sphere that holds probability p of the radial distribution of (n, l):
 * P_nl(r_p) = p. For l = n − 1 this is (n/(2Z)) P^{−1}(2n+1, p) (REFERENCE.md §9).
 *
 * Method: bracket by doubling from ⟨r⟩, then bisection on the cumulative probability to the last
 * representable digit (P is monotonic, so bisection cannot fail).
 */
import { OrbitalInputError } from './orbital-input-error';
import { cumulativeValue } from './radial-probability';
import { checkRadialInput } from './radial-function';
import { bisectRoot } from './laguerre-zeros';

/** r_p for validated n, l, Z_eff and 0 < p < 1. */
export function enclosingRadiusValue(n: number, l: number, p: number, zEff: number): number {
  let hi = (3 * n * n - l * (l + 1)) / (2 * zEff);
  while (cumulativeValue(n, l, hi, zEff) < p) hi *= 2;
  return bisectRoot((r) => cumulativeValue(n, l, r, zEff) - p, 0, hi);
}

export function radiusEnclosingProbability(
  n: number,
  l: number,
  p: number,
  Z = 1,
  muRatio = 1,
): number {
  const q = checkRadialInput(n, l, Z, muRatio);
  if (typeof p !== 'number' || !(p > 0 && p < 1))
    throw new OrbitalInputError(
      'p',
      `probability must be strictly between 0 and 1, got ${String(p)}`,
    );
  return enclosingRadiusValue(q.n, q.l, p, q.zEff);
}
