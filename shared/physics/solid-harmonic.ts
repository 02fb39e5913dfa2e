/**
 * Real solid harmonics r^l S_lm(r̂) as polynomials in x, y, z (no trigonometry), for fast grid work.
 *
 * Source: the normalised Legendre recurrences (./normalised-legendre) multiplied through by r^l:
 * with Q̄_l^m(z, r²) = r^{l−m} P̄_l^m(cos θ)/sin^m θ,
 *   Q̄_m^m = c_m,  Q̄_{m+1}^m = √(2m+3) z c_m,  Q̄_l^m = a_lm (z Q̄_{l−1}^m − b_lm r² Q̄_{l−2}^m),
 * and r^m sin^m θ e^{imφ} = (x + iy)^m. Hence (REFERENCE.md §5 convention)
 *   r^l S_l0 = Q̄_l^0,  r^l S_l,±m = √2 (−1)^m Q̄_l^m · {Re, Im}(x + iy)^m,
 * and r^l Y_l^m = Q̄_l^m (x + iy)^m for m ≥ 0. Cost: O(l) multiply-adds per point.
 */
import { recurrenceA, recurrenceB, sectoralStart } from './normalised-legendre';
import { checkAngular, checkMagnetic } from './quantum-numbers';

/** Precomputed recurrence for one (l, m): everything the inner loop needs, nothing it must compute. */
export interface SolidHarmonicPlan {
  readonly l: number;
  readonly m: number;
  readonly mAbs: number;
  /** Starting constant: c_m for the complex form; √2 (−1)^m c_m (> 0) for real m ≠ 0. */
  readonly start: number;
  /** a_jm and a_jm·b_jm for j = m+2 … l (index j − m − 2); start of the j = m+1 step is √(2m+3). */
  readonly a: Float64Array;
  readonly ab: Float64Array;
  readonly first: number;
}

const planCache = new Map<string, SolidHarmonicPlan>();

/** Plan for the real harmonic (real = true) or for r^l Y_l^{|m|} (real = false); l, m validated by caller. */
export function solidHarmonicPlan(l: number, m: number, real: boolean): SolidHarmonicPlan {
  const key = `${l},${m},${real}`;
  const hit = planCache.get(key);
  if (hit) return hit;
  const mAbs = Math.abs(m);
  const count = Math.max(0, l - mAbs - 1);
  const a = new Float64Array(count);
  const ab = new Float64Array(count);
  for (let j = mAbs + 2; j <= l; j++) {
    a[j - mAbs - 2] = recurrenceA(j, mAbs);
    ab[j - mAbs - 2] = recurrenceA(j, mAbs) * recurrenceB(j, mAbs);
  }
  const c = sectoralStart(mAbs);
  const start = real && m !== 0 ? Math.SQRT2 * Math.abs(c) : c;
  const plan = { l, m, mAbs, start, a, ab, first: Math.sqrt(2 * mAbs + 3) };
  planCache.set(key, plan);
  return plan;
}

/** Q̄_l^m(z, r²) times the plan's start constant. */
export function zonalFactor(plan: SolidHarmonicPlan, z: number, r2: number): number {
  let q0 = plan.start;
  if (plan.l === plan.mAbs) return q0;
  let q1 = plan.first * z * q0;
  const a = plan.a;
  const ab = plan.ab;
  for (let i = 0; i < a.length; i++) {
    const q2 = a[i] * z * q1 - ab[i] * r2 * q0;
    q0 = q1;
    q1 = q2;
  }
  return q1;
}

/** The plan's solid harmonic at (x, y, z), r2 = x² + y² + z²: real S or complex-basis factor as planned. */
export function solidHarmonicValue(
  plan: SolidHarmonicPlan,
  x: number,
  y: number,
  z: number,
  r2: number,
): number {
  const q = zonalFactor(plan, z, r2);
  if (plan.mAbs === 0) return q;
  // Re/Im of (x + iy)^|m| by repeated complex multiplication.
  let re = 1;
  let im = 0;
  for (let j = 0; j < plan.mAbs; j++) {
    const t = re * x - im * y;
    im = re * y + im * x;
    re = t;
  }
  return q * (plan.m > 0 ? re : im);
}

/** r^l S_lm at (x, y, z) (any length units); real harmonic convention of REFERENCE.md §5. */
export function realSolidHarmonic(l: number, m: number, x: number, y: number, z: number): number {
  const ll = checkAngular(l, null);
  const mm = checkMagnetic(m, ll);
  return solidHarmonicValue(solidHarmonicPlan(ll, mm, true), x, y, z, x * x + y * y + z * z);
}

/** S_lm(r̂) at the direction of (x, y, z) ≠ 0. */
export function realHarmonicAtPoint(l: number, m: number, x: number, y: number, z: number): number {
  const r = Math.hypot(x, y, z);
  return realSolidHarmonic(l, m, x / r, y / r, z / r);
}
