/**
 * Fully normalised associated Legendre function P̄_l^m(cos θ) for 0 ≤ m ≤ l, such that
 * Y_l^m(θ, φ) = P̄_l^m(cos θ) e^{imφ} (Condon–Shortley phase included, DLMF 14.6.1 / 14.30.1).
 *
 * Method: the standard stable recurrences for normalised functions (e.g. Holmes & Featherstone,
 * J. Geodesy 76, 279 (2002); citation from memory; common practice):
 *   P̄_0^0 = 1/√(4π),  P̄_m^m = −√((2m+1)/(2m)) sin θ P̄_{m−1}^{m−1},  P̄_{m+1}^m = √(2m+3) cos θ P̄_m^m,
 *   P̄_l^m = a_lm (cos θ P̄_{l−1}^m − b_lm P̄_{l−2}^m),
 *   a_lm = √((4l²−1)/(l²−m²)),  b_lm = √(((l−1)² − m²)/(4(l−1)² − 1)).
 * No factorials appear, so l = 30 (and far beyond) is stable. sin θ is passed separately so that
 * it keeps full relative accuracy near the poles. Accuracy ~1e-15·l relative to max|P̄|.
 */

/** P̄_m^m / sin^m θ: the constant that starts every column of the recurrence (sign (−1)^m). */
export function sectoralStart(m: number): number {
  let v = 1 / Math.sqrt(4 * Math.PI);
  for (let j = 1; j <= m; j++) v *= -Math.sqrt((2 * j + 1) / (2 * j));
  return v;
}

/** Coefficients a_lm (index l − m − 2 for l ≥ m + 2); see header. */
export function recurrenceA(l: number, m: number): number {
  return Math.sqrt((4 * l * l - 1) / (l * l - m * m));
}

export function recurrenceB(l: number, m: number): number {
  return Math.sqrt(((l - 1) * (l - 1) - m * m) / (4 * (l - 1) * (l - 1) - 1));
}

/** P̄_l^m(cos θ) with m ≥ 0 (internal: callers validate l, m). */
export function normalisedLegendre(
  l: number,
  m: number,
  cosTheta: number,
  sinTheta: number,
): number {
  let pmm = sectoralStart(m) * Math.pow(sinTheta, m);
  if (l === m) return pmm;
  let p1 = Math.sqrt(2 * m + 3) * cosTheta * pmm;
  for (let j = m + 2; j <= l; j++) {
    const p2 = recurrenceA(j, m) * (cosTheta * p1 - recurrenceB(j, m) * pmm);
    pmm = p1;
    p1 = p2;
  }
  return p1;
}
