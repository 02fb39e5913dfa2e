/**
 * Real (tesseral) spherical harmonic S_lm(θ, φ), the angular part of the chemists' real orbitals.
 *
 * Convention (common practice; REFERENCE.md §5): S_l0 = Y_l^0;
 *   S_l,+m = √2 (−1)^m Re Y_l^m ∝ cos mφ,   S_l,−m = √2 (−1)^m Im Y_l^m ∝ sin mφ   (m > 0),
 * so p_x, p_y, p_z are m = +1, −1, 0, each positive on its own positive axis.
 * Method: fully normalised Legendre recurrences; the (−1)^m cancels the Condon–Shortley sign of P̄.
 * Bad l, m throw OrbitalInputError.
 */
import { normalisedLegendre } from './normalised-legendre';
import { checkDirection } from './quantum-numbers';

export function realSphericalHarmonic(l: number, m: number, theta: number, phi: number): number {
  const { l: ll, m: mm } = checkDirection(l, m, theta, phi);
  const mAbs = Math.abs(mm);
  const p = normalisedLegendre(ll, mAbs, Math.cos(theta), Math.sin(theta));
  if (mm === 0) return p;
  const csCancel = mAbs % 2 === 1 ? -1 : 1;
  return Math.SQRT2 * csCancel * p * (mm > 0 ? Math.cos(mAbs * phi) : Math.sin(mAbs * phi));
}
