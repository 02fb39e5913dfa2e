/**
 * The logarithmic radial grid of the solver: x = ln r on equal steps h, so points crowd near the
 * nucleus (where Coulomb-like wavefunctions vary fastest) and thin out as r grows.
 *
 * Source: the standard log-grid treatment of the radial equation, e.g. P. Giannozzi, "Numerical
 * Methods in Quantum Mechanics", lecture notes (Univ. Udine), ch. 2 (from memory).
 * The grid is anchored at its outer end (or at a potential's breakpoint) so that a hard wall or a
 * jump in V falls exactly on a grid point, and a grid of step h/2 contains every point of step h.
 */
export interface LogGrid {
  /** Step in x = ln r. */
  step: number;
  /** Radii r_i = exp(x_i), bohr. */
  r: Float64Array;
}

/**
 * Grid from about rMin to rEnd (exactly rEnd, or exactly `anchor` with rEnd on the grid beyond it).
 * The first point is at rMin or less than one step above it (never below: a table starts there).
 */
export function logGrid(rMin: number, rEnd: number, step: number, anchor?: number): LogGrid {
  let xEnd = Math.log(rEnd);
  let stepsBeyondAnchor = -1;
  if (anchor !== undefined && anchor > rMin && anchor < rEnd) {
    const xAnchor = Math.log(anchor);
    stepsBeyondAnchor = Math.ceil((xEnd - xAnchor) / step - 1e-9);
    xEnd = xAnchor + stepsBeyondAnchor * step;
  }
  const points = Math.floor((xEnd - Math.log(rMin)) / step + 1e-9) + 1;
  const r = new Float64Array(points);
  for (let i = 0; i < points; i++) r[i] = Math.exp(xEnd - (points - 1 - i) * step);
  // Exact values where they matter: a wall on the wall, a jump of V on its grid point.
  if (stepsBeyondAnchor < 0) r[points - 1] = rEnd;
  else if (anchor !== undefined) r[points - 1 - stepsBeyondAnchor] = anchor;
  return { step, r };
}
