/**
 * Positions (bohr) of the n − l − 1 radial nodes of R_nl, ascending.
 *
 * Source: the nodes are the zeros of L_{n−l−1}^{(2l+1)}(ρ), ρ = 2Z_eff r/n (REFERENCE.md §4, §8).
 * Method: interlacing brackets + bisection to full double precision (./laguerre-zeros), so the
 * error is ~1e-15 relative, far below the 1e-10 bohr asked for.
 */
import { laguerreZeros } from './laguerre-zeros';
import { checkRadialInput } from './radial-function';

export function radialNodes(n: number, l: number, Z = 1, muRatio = 1): number[] {
  const p = checkRadialInput(n, l, Z, muRatio);
  const scale = p.n / (2 * p.zEff);
  return laguerreZeros(p.n - p.l - 1, 2 * p.l + 1).map((rho) => rho * scale);
}
