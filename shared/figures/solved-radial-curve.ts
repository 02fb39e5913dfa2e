/**
 * A numerically solved state (shared/solver) as the radial plot draws it: R(r), r²R² = u² and the
 * probability within r, read off the solver's logarithmic grid, with its radial nodes, most probable
 * radius and the radius enclosing a given probability.
 *
 * Method: cubic Lagrange interpolation in r through the four nearest grid points (the fine grid has
 * steps of 0.5 % in r; error ~1e-9 of the curve's size, far under a printed line's width); the
 * cumulative probability is the trapezoidal sum of u² dr on the grid (error ~1e-6, second order); nodes are the sign changes of u,
 * placed by linear interpolation; the most probable radius is the maximum of u², refined by the
 * parabola through it and its neighbours. u is normalised by the solver (∫u² dr = 1) and positive
 * near the nucleus, as hydrogen's R_nl of shared/physics is.
 */
import type { RadialSolution, SolvedLevel } from '../solver/solve-radial';
import { FigureSpecError } from './figure-error';

export interface SolvedRadialCurve {
  level: SolvedLevel;
  /** R(r), bohr^(−3/2). */
  R(r: number): number;
  /** r²R²(r) = u², bohr⁻¹. */
  r2R2(r: number): number;
  /** ∫₀^r u² dr. */
  cumulative(r: number): number;
  /** Radial nodes, bohr (the solver's node count of them). */
  nodes: number[];
  /** Radius of the largest u², bohr. */
  mostProbableRadius: number;
  /** Radius inside which the probability is p, bohr. */
  radiusEnclosing(p: number): number;
}

/** Index i with r[i] ≤ x < r[i + 1] (clamped to the grid). */
function bracket(r: Float64Array, x: number): number {
  let lo = 0;
  let hi = r.length - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (r[mid] <= x) lo = mid;
    else hi = mid;
  }
  return lo;
}

/** Cubic Lagrange interpolation through the four grid points around x (two at the ends of the grid). */
function interpolate(r: Float64Array, y: Float64Array, x: number, outside: number): number {
  if (x > r[r.length - 1]) return outside;
  if (x <= r[0]) return y[0];
  const i = bracket(r, x);
  const lo = Math.max(0, Math.min(i - 1, r.length - 4));
  let sum = 0;
  for (let j = lo; j < lo + 4 && j < r.length; j++) {
    let w = 1;
    for (let k = lo; k < lo + 4 && k < r.length; k++) if (k !== j) w *= (x - r[k]) / (r[j] - r[k]);
    sum += w * y[j];
  }
  return sum;
}

/** The level n of a solution as radial curves; `field` is blamed when n is not among its levels. */
export function solvedRadialCurve(
  solution: RadialSolution,
  n: number,
  field: string,
): SolvedRadialCurve {
  const level = solution.levels.find((lv) => lv.n === n);
  if (!level)
    throw new FigureSpecError(field, `the solution for l = ${solution.l} has no level n = ${n}`);
  const { r } = solution;
  const { u, R } = level;
  const u2 = new Float64Array(u.length);
  for (let i = 0; i < u.length; i++) u2[i] = u[i] * u[i];
  // Below the first point u² ∝ r^{2l+2} holds the probability r₀ u₀²/(2l + 3).
  const cumulative = new Float64Array(u.length);
  cumulative[0] = (r[0] * u2[0]) / (2 * solution.l + 3);
  for (let i = 1; i < u.length; i++)
    cumulative[i] = cumulative[i - 1] + 0.5 * (u2[i] + u2[i - 1]) * (r[i] - r[i - 1]);
  const total = cumulative[cumulative.length - 1];

  const nodes: number[] = [];
  // Skip the tail, where u is at round-off and may flicker in sign.
  const tailStart = cumulative.findIndex((c) => c > total * (1 - 1e-12));
  for (let i = 1; i < (tailStart > 0 ? tailStart : u.length); i++) {
    if (u[i - 1] !== 0 && Math.sign(u[i]) !== Math.sign(u[i - 1]))
      nodes.push(r[i - 1] + ((r[i] - r[i - 1]) * u[i - 1]) / (u[i - 1] - u[i]));
  }

  let k = 0;
  for (let i = 1; i < u2.length; i++) if (u2[i] > u2[k]) k = i;
  let mostProbableRadius = r[k];
  if (k > 0 && k < u2.length - 1) {
    const [x0, x1, x2] = [r[k - 1], r[k], r[k + 1]];
    const [y0, y1, y2] = [u2[k - 1], u2[k], u2[k + 1]];
    const d = (x0 - x1) * (x0 - x2) * (x1 - x2);
    const a = (x2 * (y1 - y0) + x1 * (y0 - y2) + x0 * (y2 - y1)) / d;
    const b = (x2 * x2 * (y0 - y1) + x1 * x1 * (y2 - y0) + x0 * x0 * (y1 - y2)) / d;
    if (a < 0) mostProbableRadius = -b / (2 * a);
  }

  return {
    level,
    R: (x) => interpolate(r, R, x, 0),
    r2R2: (x) => interpolate(r, u2, x, 0),
    cumulative: (x) => (x <= r[0] ? 0 : interpolate(r, cumulative, x, total) / total),
    nodes,
    mostProbableRadius,
    radiusEnclosing: (p) => {
      const target = p * total;
      const i = Math.max(
        1,
        cumulative.findIndex((c) => c >= target),
      );
      const t = (target - cumulative[i - 1]) / (cumulative[i] - cumulative[i - 1]);
      return r[i - 1] + t * (r[i] - r[i - 1]);
    },
  };
}
