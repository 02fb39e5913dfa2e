/**
 * Coulomb potential of a uniformly charged spherical nucleus of radius R:
 *   V(r) = −Z(3 − r²/R²)/(2R) for r ≤ R,  −Z/r for r > R   (hartree, r and R in bohr).
 * Source: Gauss's law for a uniformly charged sphere (textbook electrostatics); the usual first
 * finite-size model of atomic-structure codes (common practice). V and V' are continuous at R;
 * V'' jumps, so R is laid on a grid point.
 */
import { z } from 'zod';
import type { Potential } from '../potential';
import { fmt, nuclearCharge, parseParameters, positive } from './parameters';

export const finiteNucleusSchema = z.strictObject({
  type: z.literal('finite-nucleus'),
  Z: nuclearCharge,
  radius: positive('radius (bohr)'),
});

export function finiteNucleusPotential(input: unknown, field = 'potential'): Potential {
  const { Z, radius: R } = parseParameters(finiteNucleusSchema, input, field);
  return {
    id: 'finite-nucleus',
    label: `Uniformly charged nucleus, Z = ${fmt(Z)}, R = ${fmt(R)} bohr`,
    formula: 'V(r) = −Z(3 − r²/R²)/(2R) for r ≤ R, −Z/r for r > R  [hartree, bohr]',
    evaluate: (r) => (r <= R ? (-Z * (3 - (r * r) / (R * R))) / (2 * R) : -Z / r),
    asymptotes: { threshold: 0, originCharge: 0, tailCharge: Z },
    lengthScale: 1 / Z,
    breakpoint: R,
    smooth: true,
  };
}
