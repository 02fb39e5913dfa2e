/**
 * Gauss–Legendre rule on [−1, 1], exact for polynomials of degree ≤ 2m − 1.
 *
 * Method: Newton iteration on P_m from the initial guesses cos(π(i − ¼)/(m + ½)) (Numerical Recipes,
 * 3rd ed., §4.6, `gauleg`; common practice), P_m and P_m' by the Bonnet recurrence;
 * w_i = 2/((1 − x_i²) P_m'(x_i)²). Rules are cached by order.
 */
import type { QuadratureRule } from './gauss-laguerre';

const cache = new Map<number, QuadratureRule>();

export function gaussLegendre(m: number): QuadratureRule {
  const hit = cache.get(m);
  if (hit) return hit;
  const nodes = new Float64Array(m);
  const weights = new Float64Array(m);
  for (let i = 0; i < Math.ceil(m / 2); i++) {
    let x = Math.cos((Math.PI * (i + 0.75)) / (m + 0.5));
    let dp = 0;
    for (let iter = 0; iter < 100; iter++) {
      let p0 = 1;
      let p1 = x;
      for (let j = 2; j <= m; j++) {
        const p2 = ((2 * j - 1) * x * p1 - (j - 1) * p0) / j;
        p0 = p1;
        p1 = p2;
      }
      const pm = m === 1 ? x : p1;
      const pmPrev = m === 1 ? 1 : p0;
      dp = (m * (x * pm - pmPrev)) / (x * x - 1);
      const dx = pm / dp;
      x -= dx;
      if (Math.abs(dx) <= 1e-16 * Math.abs(x) + 1e-300) break;
    }
    nodes[i] = -x;
    nodes[m - 1 - i] = x;
    weights[i] = weights[m - 1 - i] = 2 / ((1 - x * x) * dp * dp);
  }
  const rule = { nodes, weights, logWeights: weights.map(Math.log) };
  cache.set(m, rule);
  return rule;
}
