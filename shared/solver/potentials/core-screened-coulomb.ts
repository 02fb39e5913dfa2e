/**
 * Core-screened Coulomb model for one valence electron outside a closed core:
 *   V(r) = −[1 + (Z − 1) e^{−r/a}]/r   (hartree; r and the screening length a in bohr),
 * −Z/r at the nucleus and −1/r outside the core: the simplest interpolation between the bare and the
 * fully screened nucleus, a common one-parameter model of alkali-like valence electrons (common
 * practice; no single published source is claimed). Levels are reported with their quantum defect.
 */
import { z } from 'zod';
import type { Potential } from '../potential';
import { fmt, nuclearCharge, parseParameters, positive } from './parameters';

export const coreScreenedCoulombSchema = z.strictObject({
  type: z.literal('core-screened'),
  Z: nuclearCharge.refine((v) => v >= 1, 'Z must be at least 1'),
  a: positive('a (bohr)'),
});

export function coreScreenedCoulombPotential(input: unknown, field = 'potential'): Potential {
  const { Z, a } = parseParameters(coreScreenedCoulombSchema, input, field);
  return {
    id: 'core-screened',
    label: `Core-screened Coulomb, Z = ${fmt(Z)}, a = ${fmt(a)} bohr`,
    formula: 'V(r) = −[1 + (Z − 1) e^(−r/a)]/r  [V in hartree, r and a in bohr]',
    evaluate: (r) => -(1 + (Z - 1) * Math.exp(-r / a)) / r,
    asymptotes: { threshold: 0, originCharge: Z, tailCharge: 1 },
    lengthScale: 1,
    smooth: true,
  };
}
