/**
 * Complex spherical harmonic Y_l^m(θ, φ) with the Condon–Shortley phase, θ polar from +z,
 * φ azimuth from +x toward +y (conventions in ./coordinates).
 *
 * Source: Condon & Shortley, The Theory of Atomic Spectra (1935); DLMF 14.30.1 and 14.6.1;
 * REFERENCE.md §5: Y_l^m = √[(2l+1)/(4π) (l−m)!/(l+m)!] P_l^m(cos θ) e^{imφ}, Y_l^{−m} = (−1)^m conj(Y_l^m).
 * Method: fully normalised Legendre recurrences (./normalised-legendre). Stable for l ≤ 30 (tested).
 * Bad l, m throw OrbitalInputError.
 */
import type { Complex } from './complex';
import { normalisedLegendre } from './normalised-legendre';
import { checkDirection } from './quantum-numbers';

export function sphericalHarmonic(
  l: number,
  m: number,
  theta: number,
  phi: number,
  out: Complex = { re: 0, im: 0 },
): Complex {
  const { l: ll, m: mm } = checkDirection(l, m, theta, phi);
  const mAbs = Math.abs(mm);
  const p = normalisedLegendre(ll, mAbs, Math.cos(theta), Math.sin(theta));
  // Y_l^{−|m|} = (−1)^{|m|} conj(Y_l^{|m|}).
  const sign = mm < 0 && mAbs % 2 === 1 ? -1 : 1;
  out.re = sign * p * Math.cos(mAbs * phi);
  out.im = (mm < 0 ? -sign : sign) * p * Math.sin(mAbs * phi);
  return out;
}
