/**
 * Numerov shooting for one angular momentum on one logarithmic grid: the equation, the outward sweep
 * with its node count, the inward sweep, matching at the outer classical turning point and the
 * first-order energy correction from the mismatch.
 *
 * Equation: with x = ln r and u(r) = r^{1/2} y(x), the radial equation
 *   u'' = 2μ[V(r) + l(l+1)/(2μr²) − E] u   (atomic units)
 * becomes y'' = −g(x) y with g = 2μ r² (E − V) − (l + ½)², free of a first derivative.
 * Source: P. Giannozzi, "Numerical Methods in Quantum Mechanics", lecture notes, ch. 2 (log grid,
 * Numerov, node counting, matching at the classical turning point, perturbative energy update;
 * from memory). Numerov's scheme: B. Numerov, Publ. Obs. Central Astrophys. Russ. 2, 188 (1933),
 * the method dating from 1924 (from memory); in Koonin & Meredith, Computational Physics (1990) §3.1.
 *
 * Method. With f_i = 1 + h² g_i / 12 the scheme is f_{i+1}y_{i+1} + f_{i−1}y_{i−1} + (10 f_i − 12) y_i = 0.
 * The outward sweep starts from the regular solution u ≈ r^{l+1}(1 − Z₀ r/(l+1)) and runs to the
 * last point, where u = 0 is imposed; its sign changes count the levels below E (Sturm oscillation
 * theorem), which brackets each level. The inward sweep starts from u = 0 at the last point. Both
 * are scaled to agree at the matching point m; the residual d of the scheme at m measures the kink,
 * J ≈ d/h, and first-order perturbation theory gives δE = −J y_m / (2μ ∫ r² y² dx).
 *
 * A jump of V (and of V') at a grid point J, where V is given its mean, would cost the scheme two
 * orders. The stencils centred at J ∓ 1 therefore use the one-sided f at J (f̄ ± h²[g]/24), and the
 * stencil at J, expanded on each side, leaves the defect (h³/12)[y'''], [y'''] = −[g'] y − [g] y',
 * which is put back with y' from the central difference corrected for the jump of y''. This restores
 * order 4 (derivation: Taylor expansion of the scheme about J on each side; no published source claimed).
 *
 * Deeply forbidden points (h² g/12 < F_FLOOR − 1) have f clamped at F_FLOOR: there the exact
 * solution changes by more than e^{3} per step, the clamp keeps the recurrence free of spurious
 * sign changes, and the levels' amplitude there is far below double precision.
 */

/** Smallest f used in the recurrence (see the header). */
const F_FLOOR = 0.05;
/** Rescale a sweep when |y| passes this, so that growth in forbidden regions cannot overflow. */
const RESCALE_ABOVE = 1e150;

export interface ShootingSystem {
  step: number;
  r: Float64Array;
  l: number;
  mu: number;
  originCharge: number;
  /** Grid index of a jump of V (−1 when none) and the coefficients of its correction. */
  jump: number;
  jumpA: number;
  jumpB: number;
  /** V + l(l+1)/(2μr²) at the grid points (hartree). */
  vEff: Float64Array;
  /** f_i = fConstant_i + E fSlope_i before clamping. */
  fConstant: Float64Array;
  fSlope: Float64Array;
  f: Float64Array;
  yOut: Float64Array;
  yIn: Float64Array;
  /** yOut is on one scale up to this index (see sweepOutward). */
  outwardValid: number;
  /** Matching index of the last matched solve. */
  match: number;
  /** Factor applied to yIn in the last matched solve. */
  inScale: number;
}

export function shootingSystem(
  r: Float64Array,
  step: number,
  V: Float64Array,
  l: number,
  mu: number,
  originCharge: number,
  jumpAt?: { index: number; dV: number; dVprime: number },
): ShootingSystem {
  const n = r.length;
  const h12 = (step * step) / 12;
  const lh2 = (l + 0.5) * (l + 0.5);
  const fConstant = new Float64Array(n);
  const fSlope = new Float64Array(n);
  const vEff = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const r2 = r[i] * r[i];
    fSlope[i] = h12 * 2 * mu * r2;
    fConstant[i] = 1 - h12 * (2 * mu * r2 * V[i] + lh2);
    vEff[i] = V[i] + (l * (l + 1)) / (2 * mu * r2);
  }
  let jumpA = 0;
  let jumpB = 0;
  if (jumpAt) {
    const rm = r[jumpAt.index];
    const dg = -2 * mu * rm * rm * jumpAt.dV; // [g]
    const dgPrime = -4 * mu * rm * rm * jumpAt.dV - 2 * mu * rm * rm * rm * jumpAt.dVprime; // [dg/dx]
    jumpA = ((step * step * step) / 12) * (-dgPrime - (step * dg * dg) / 4);
    jumpB = (-step * step * dg) / 24;
  }
  return {
    step,
    r,
    l,
    mu,
    originCharge,
    jump: jumpAt ? jumpAt.index : -1,
    jumpA,
    jumpB,
    vEff,
    fConstant,
    fSlope,
    f: new Float64Array(n),
    yOut: new Float64Array(n),
    yIn: new Float64Array(n),
    outwardValid: 0,
    match: -1,
    inScale: 1,
  };
}

/** u ∝ r^{l+1}(1 − Z₀r/(l+1)) as y = u r^{−1/2}, relative to the first point. */
function regularStart(s: ShootingSystem, i: number): number {
  const { r, l, step, originCharge } = s;
  return Math.exp((l + 0.5) * step * i) * (1 - (originCharge * r[i]) / (l + 1));
}

/** y_{i+1} from the stencil at i = J − 1, J or J + 1 next to a jump of V at J (see the header). */
function outwardNearJump(s: ShootingSystem, i: number, y: Float64Array): number {
  const { f, jump: J, jumpA: A, jumpB: B } = s;
  if (i === J) return ((12 - 10 * f[J] + A) * y[J] - (f[J - 1] + B) * y[J - 1]) / (f[J + 1] - B);
  if (i === J - 1) return ((12 - 10 * f[i]) * y[i] - f[i - 1] * y[i - 1]) / (f[J] + B);
  return ((12 - 10 * f[i]) * y[i] - (f[J] - B) * y[J]) / f[i + 1];
}

/** y_{i−1} from the stencil at i = J − 1, J or J + 1 (the inward counterpart of outwardNearJump). */
function inwardNearJump(s: ShootingSystem, i: number, y: Float64Array): number {
  const { f, jump: J, jumpA: A, jumpB: B } = s;
  if (i === J) return ((12 - 10 * f[J] + A) * y[J] - (f[J + 1] - B) * y[J + 1]) / (f[J - 1] + B);
  if (i === J + 1) return ((12 - 10 * f[i]) * y[i] - f[i + 1] * y[i + 1]) / (f[J] - B);
  return ((12 - 10 * f[i]) * y[i] - (f[J] + B) * y[J]) / f[i - 1];
}

/** Whether the stencil at i touches the jump point (J − 1 ≤ i ≤ J + 1). */
const nearJump = (s: ShootingSystem, i: number): boolean => s.jump >= 0 && i >= s.jump - 1 && i <= s.jump + 1;

/**
 * Outward sweep at energy E over the whole grid; fills s.f and s.yOut and returns the number of
 * sign changes (the number of levels below E of the problem with u = 0 at the last point).
 * Growth past RESCALE_ABOVE rescales only the two newest values (the count needs nothing else), so
 * yOut is consistent only up to s.outwardValid.
 */
export function sweepOutward(s: ShootingSystem, E: number): number {
  const { f, yOut: y, fConstant, fSlope } = s;
  const n = y.length;
  for (let i = 0; i < n; i++) {
    const fi = fConstant[i] + E * fSlope[i];
    f[i] = fi < F_FLOOR ? F_FLOOR : fi;
  }
  y[0] = regularStart(s, 0);
  y[1] = regularStart(s, 1);
  s.outwardValid = n - 1;
  let count = 0;
  for (let i = 1; i < n - 1; i++) {
    const next = nearJump(s, i) ? outwardNearJump(s, i, y) : ((12 - 10 * f[i]) * y[i] - f[i - 1] * y[i - 1]) / f[i + 1];
    y[i + 1] = next;
    if ((next < 0 && y[i] > 0) || (next > 0 && y[i] < 0)) count++;
    if (Math.abs(next) > RESCALE_ABOVE) {
      if (s.outwardValid === n - 1) s.outwardValid = i;
      y[i] /= RESCALE_ABOVE;
      y[i + 1] /= RESCALE_ABOVE;
    }
  }
  return count;
}

/** Outward solution redone up to index `last` with every stored value kept on one scale. */
function consistentOutward(s: ShootingSystem, last: number): void {
  const { f, yOut: y } = s;
  if (last <= s.outwardValid) return;
  for (let i = 1; i < last; i++) {
    y[i + 1] = nearJump(s, i) ? outwardNearJump(s, i, y) : ((12 - 10 * f[i]) * y[i] - f[i - 1] * y[i - 1]) / f[i + 1];
    if (Math.abs(y[i + 1]) > RESCALE_ABOVE) {
      for (let j = 0; j <= i + 1; j++) y[j] /= RESCALE_ABOVE;
    }
  }
  s.outwardValid = last;
}


/** Matching index: the outer classical turning point, or the last maximum when E is above V to the end. */
function matchingIndex(s: ShootingSystem, E: number): number {
  const { vEff, yOut } = s;
  const n = vEff.length;
  let m = n - 1;
  while (m > 0 && vEff[m] >= E) m--;
  // The mismatch formula is the plain scheme's: never match on the jump itself.
  if (m === s.jump) m--;
  if (m < 2) return -1;
  if (m > n - 4) {
    consistentOutward(s, n - 1);
    m = n - 4;
    while (m > 2 && !(Math.abs(yOut[m]) >= Math.abs(yOut[m - 1]) && Math.abs(yOut[m]) >= Math.abs(yOut[m + 1]))) m--;
  }
  return m;
}

/**
 * After sweepOutward(s, E): sweeps inward, matches, and returns the first-order energy correction
 * δE (NaN when there is no allowed region or the outward solution vanishes at the matching point).
 */
export function energyCorrection(s: ShootingSystem, E: number): number {
  const { f, yOut, yIn, r, step, mu } = s;
  const n = yOut.length;
  const m = matchingIndex(s, E);
  if (m < 0) return Number.NaN;
  consistentOutward(s, m + 1);
  if (yOut[m] === 0) return Number.NaN;
  yIn[n - 1] = 0;
  yIn[n - 2] = 1;
  for (let i = n - 2; i > m - 1; i--) {
    const prev = nearJump(s, i)
      ? inwardNearJump(s, i, yIn)
      : ((12 - 10 * f[i]) * yIn[i] - f[i + 1] * yIn[i + 1]) / f[i - 1];
    yIn[i - 1] = prev;
    if (Math.abs(prev) > RESCALE_ABOVE) {
      for (let j = i - 1; j < n; j++) yIn[j] /= RESCALE_ABOVE;
    }
  }
  if (yIn[m] === 0) return Number.NaN;
  const scale = yOut[m] / yIn[m];
  s.match = m;
  s.inScale = scale;
  let norm = 0;
  for (let i = 0; i <= m; i++) norm += r[i] * r[i] * yOut[i] * yOut[i];
  for (let i = m + 1; i < n; i++) norm += r[i] * r[i] * yIn[i] * yIn[i] * scale * scale;
  norm *= step;
  // Next to a jump at J the stencil takes the one-sided f there (see the header).
  const fLeft = m - 1 === s.jump ? f[m - 1] - s.jumpB : f[m - 1];
  const fRight = m + 1 === s.jump ? f[m + 1] + s.jumpB : f[m + 1];
  const residual = fLeft * yOut[m - 1] + fRight * yIn[m + 1] * scale + (10 * f[m] - 12) * yOut[m];
  return -((residual / step) * yOut[m]) / (2 * mu * norm);
}

export interface GridState {
  /** u(r_i), normalised so that ∫ u² dr = 1, positive near the origin. */
  u: Float64Array;
  /** ⟨r⟩ in bohr. */
  rMean: number;
  /** Sign changes of u (tails below 1e-10 of the maximum ignored). */
  nodes: number;
}

/** The matched, normalised state of the last energyCorrection call. */
export function matchedState(s: ShootingSystem): GridState {
  const { yOut, yIn, r, step, match: m, inScale } = s;
  const n = r.length;
  const u = new Float64Array(n);
  let norm = 0;
  let first = 0;
  for (let i = 0; i < n; i++) {
    const y = i <= m ? yOut[i] : yIn[i] * inScale;
    u[i] = y;
    first += r[i] * r[i] * y * y * r[i];
    norm += r[i] * r[i] * y * y;
  }
  const c = 1 / Math.sqrt(norm * step);
  let peak = 0;
  for (let i = 0; i < n; i++) {
    u[i] *= c * Math.sqrt(r[i]);
    peak = Math.max(peak, Math.abs(u[i]));
  }
  let nodes = 0;
  let last = 0;
  for (let i = 0; i < n; i++) {
    if (Math.abs(u[i]) < 1e-10 * peak) continue;
    const sign = Math.sign(u[i]);
    if (last !== 0 && sign !== last) nodes++;
    last = sign;
  }
  return { u, rMean: first / norm, nodes };
}
