/**
 * Maxima of the radial distribution r²R_nl²: all local maxima and the global one (the most
 * probable radius), in bohr. For l = n − 1 the single maximum is at n²/Z_eff (REFERENCE.md §8).
 *
 * Method: with u = rR ∝ ρ^{l+1} e^{−ρ/2} L_k^{(α)}(ρ) (k = n−l−1, α = 2l+1) and
 * d/dρ L_k^{(α)} = −L_{k−1}^{(α+1)} (DLMF 18.9.14), the stationary points of u are the zeros of
 *   g(ρ) = (l + 1 − ρ/2) L_k^{(α)}(ρ) − ρ L_{k−1}^{(α+1)}(ρ),
 * a polynomial of degree k + 1 with exactly one zero between consecutive zeros of u (and one beyond
 * the last node). Each is bracketed by the nodes and bisected to full precision; every such point is a
 * local maximum of u². The global maximum compares u² in logarithms.
 */
import { assocLaguerre } from './assoc-laguerre';
import { bisectRoot, laguerreZeros } from './laguerre-zeros';
import { checkRadialInput } from './radial-function';

function stationaryPolynomial(k: number, l: number, rho: number): number {
  const alpha = 2 * l + 1;
  const lk = assocLaguerre(k, alpha, rho);
  const derivative = k === 0 ? 0 : -assocLaguerre(k - 1, alpha + 1, rho);
  return (l + 1 - rho / 2) * lk + rho * derivative;
}

/** Local maxima of r²R² as ρ values, ascending, for validated n, l. */
function maximaInRho(n: number, l: number): number[] {
  const k = n - l - 1;
  const g = (rho: number): number => stationaryPolynomial(k, l, rho);
  const nodes = laguerreZeros(k, 2 * l + 1);
  const last = nodes.length > 0 ? nodes[nodes.length - 1] : 0;
  const asymptoticPositive = (k + 1) % 2 === 0;
  let upper = Math.max(2 * last, 2 * n + 2);
  while (g(upper) > 0 !== asymptoticPositive) upper *= 2;
  const edges = [0, ...nodes, upper];
  const maxima: number[] = [];
  for (let i = 0; i + 1 < edges.length; i++) maxima.push(bisectRoot(g, edges[i], edges[i + 1]));
  return maxima;
}

function logDistribution(n: number, l: number, rho: number): number {
  return (
    (2 * l + 2) * Math.log(rho) -
    rho +
    2 * Math.log(Math.abs(assocLaguerre(n - l - 1, 2 * l + 1, rho)))
  );
}

/** All local maxima of r²R_nl(r)², ascending, in bohr. */
export function radialDistributionMaxima(n: number, l: number, Z = 1, muRatio = 1): number[] {
  const p = checkRadialInput(n, l, Z, muRatio);
  const scale = p.n / (2 * p.zEff);
  return maximaInRho(p.n, p.l).map((rho) => rho * scale);
}

/** The most probable radius: global maximum of r²R_nl(r)², in bohr. */
export function mostProbableRadius(n: number, l: number, Z = 1, muRatio = 1): number {
  const p = checkRadialInput(n, l, Z, muRatio);
  const maxima = maximaInRho(p.n, p.l);
  let best = maxima[0];
  for (const rho of maxima)
    if (logDistribution(p.n, p.l, rho) > logDistribution(p.n, p.l, best)) best = rho;
  return (best * p.n) / (2 * p.zEff);
}
