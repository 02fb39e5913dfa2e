/**
 * Natural cubic spline through (x_i, y_i), x strictly increasing: second derivative zero at both ends.
 * Source: Press et al., Numerical Recipes, 3rd ed., §3.3 (spline, splint; from memory) — the
 * tridiagonal system for the second derivatives solved by the Thomas algorithm.
 * Evaluation outside [x_0, x_{n−1}] is the caller's decision; here it returns NaN.
 */
export interface CubicSpline {
  (x: number): number;
}

export function naturalCubicSpline(x: ArrayLike<number>, y: ArrayLike<number>): CubicSpline {
  const n = x.length;
  const m = new Float64Array(n); // second derivatives
  const c = new Float64Array(n);
  for (let i = 1; i < n - 1; i++) {
    const sig = (x[i] - x[i - 1]) / (x[i + 1] - x[i - 1]);
    const p = sig * m[i - 1] + 2;
    m[i] = (sig - 1) / p;
    const slope = (y[i + 1] - y[i]) / (x[i + 1] - x[i]) - (y[i] - y[i - 1]) / (x[i] - x[i - 1]);
    c[i] = ((6 * slope) / (x[i + 1] - x[i - 1]) - sig * c[i - 1]) / p;
  }
  m[n - 1] = 0;
  for (let i = n - 2; i >= 0; i--) m[i] = m[i] * m[i + 1] + c[i];
  m[0] = 0;
  return (t: number): number => {
    if (!(t >= x[0] && t <= x[n - 1])) return Number.NaN;
    let lo = 0;
    let hi = n - 1;
    while (hi - lo > 1) {
      const mid = (lo + hi) >> 1;
      if (x[mid] > t) hi = mid;
      else lo = mid;
    }
    const h = x[hi] - x[lo];
    const a = (x[hi] - t) / h;
    const b = (t - x[lo]) / h;
    return a * y[lo] + b * y[hi] + (((a * a * a - a) * m[lo] + (b * b * b - b) * m[hi]) * h * h) / 6;
  };
}
