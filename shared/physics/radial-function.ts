/**
 * Normalised hydrogen-like radial function R_nl(r) in bohr^(−3/2), r in bohr.
 *
 * Source: Bethe & Salpeter, Quantum Mechanics of One- and Two-Electron Atoms (1957) §3; Griffiths,
 * Introduction to Quantum Mechanics, 2nd ed., eq. 4.89 (number from memory); REFERENCE.md §4:
 *   R_nl(r) = √[a³ (n−l−1)! / (2n (n+l)!)] e^{−ρ/2} ρ^l L_{n−l−1}^{(2l+1)}(ρ),  a = 2Z_eff/n, ρ = a r,
 * with the modern Laguerre convention, so R_nl > 0 as r → 0⁺ and the sign at large r is (−1)^{n−l−1}.
 * Reduced mass: Z_eff = Z·μ/m_e (lengths scale by a_μ = a0·m_e/μ), which keeps R normalised.
 *
 * Method: the normalisation and ρ^l e^{−ρ/2} are combined in one logarithm (log-factorials, no
 * overflowing factorials or powers), the polynomial by its three-term recurrence.
 * Accuracy: ~1e-13 relative to max|R| for n ≤ 30 (checked against mpmath fixtures); near a node only
 * absolute. Bad quantum numbers, Z or μ throw OrbitalInputError.
 */
import { assocLaguerre } from './assoc-laguerre';
import { logFactorial } from './log-factorial';
import {
  checkAngular,
  checkMassRatio,
  checkNuclearCharge,
  checkPrincipal,
  checkRadius,
} from './quantum-numbers';

/** ln of the normalisation constant √[a³ (n−l−1)!/(2n (n+l)!)], a = 2 Z_eff / n. */
export function radialLogNormalisation(n: number, l: number, zEff: number): number {
  const a = (2 * zEff) / n;
  return 0.5 * (3 * Math.log(a) + logFactorial(n - l - 1) - Math.log(2 * n) - logFactorial(n + l));
}

/** R_nl(r) for already validated n, l and Z_eff = Z μ/m_e (used by the other physics modules). */
export function radialValue(n: number, l: number, r: number, zEff: number): number {
  const rho = ((2 * zEff) / n) * r;
  const poly = assocLaguerre(n - l - 1, 2 * l + 1, rho);
  if (rho === 0) return l === 0 ? poly * Math.exp(radialLogNormalisation(n, l, zEff)) : 0;
  if (poly === 0) return 0;
  if (!Number.isFinite(rho)) return 0;
  const logMagnitude =
    radialLogNormalisation(n, l, zEff) + l * Math.log(rho) - rho / 2 + Math.log(Math.abs(poly));
  return Math.sign(poly) * Math.exp(logMagnitude);
}

/** Validates (n, l, Z, μ) and returns Z_eff = Z μ. */
export function checkRadialInput(
  n: unknown,
  l: unknown,
  Z: unknown,
  muRatio: unknown,
): { n: number; l: number; zEff: number } {
  const nn = checkPrincipal(n);
  const ll = checkAngular(l, nn);
  return { n: nn, l: ll, zEff: checkNuclearCharge(Z) * checkMassRatio(muRatio) };
}

export function radialFunction(n: number, l: number, r: number, Z = 1, muRatio = 1): number {
  const p = checkRadialInput(n, l, Z, muRatio);
  return radialValue(p.n, p.l, checkRadius(r), p.zEff);
}
