/**
 * Gauss–Laguerre rule ∫₀^∞ e^{−x} f(x) dx ≈ Σ w_i f(x_i), exact for polynomials f of degree ≤ 2m − 1.
 *
 * Source: Abramowitz & Stegun 25.4.45 (number from memory): nodes are the zeros of L_m,
 * w_i = x_i / ((m + 1)² L_{m+1}(x_i)²). Nodes from ./laguerre-zeros; rules are cached by order.
 * The log-weights are kept as well so callers can combine them with large or tiny integrands.
 */
import { assocLaguerre } from './assoc-laguerre';
import { laguerreZeros } from './laguerre-zeros';

export interface QuadratureRule {
  readonly nodes: Float64Array;
  readonly weights: Float64Array;
  readonly logWeights: Float64Array;
}

const cache = new Map<number, QuadratureRule>();

export function gaussLaguerre(m: number): QuadratureRule {
  const hit = cache.get(m);
  if (hit) return hit;
  const zeros = laguerreZeros(m, 0);
  const nodes = Float64Array.from(zeros);
  const logWeights = nodes.map(
    (x) => Math.log(x) - 2 * Math.log(m + 1) - 2 * Math.log(Math.abs(assocLaguerre(m + 1, 0, x))),
  );
  const rule = { nodes, weights: logWeights.map(Math.exp), logWeights };
  cache.set(m, rule);
  return rule;
}
