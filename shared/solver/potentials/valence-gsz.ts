/**
 * Green–Sellin–Zachor independent-particle model potential for an electron in an atom or ion of
 * nuclear charge Z with N electrons:
 *   V(r) = −[(Z − N + 1) + (N − 1) Ω(r)]/r,  Ω(r) = 1/[H (e^{r/d} − 1) + 1]
 * (hartree; r and d in bohr, H dimensionless). Ω(0) = 1 gives −Z/r at the nucleus; far out the
 * electron sees the ion charge Z − N + 1. Source: A. E. S. Green, D. L. Sellin & A. S. Zachor,
 * Phys. Rev. 184, 1 (1969) (from memory; there written in rydberg units with a factor 2).
 */
import { z } from 'zod';
import type { Potential } from '../potential';
import { fmt, nuclearCharge, parseParameters, positive } from './parameters';

export const valenceGszSchema = z
  .strictObject({
    type: z.literal('valence-gsz'),
    Z: nuclearCharge,
    electrons: positive('electrons').refine(Number.isInteger, 'electrons must be an integer'),
    H: positive('H'),
    d: positive('d (bohr)'),
  })
  .refine((p) => p.electrons <= p.Z, { message: 'electrons must not exceed Z (negative ions are not bound by this model)', path: ['electrons'] });

export function valenceGszPotential(input: unknown, field = 'potential'): Potential {
  const { Z, electrons: N, H, d } = parseParameters(valenceGszSchema, input, field);
  const ion = Z - N + 1;
  return {
    id: 'valence-gsz',
    label: `Green–Sellin–Zachor, Z = ${fmt(Z)}, N = ${N}, H = ${fmt(H)}, d = ${fmt(d)} bohr`,
    formula: 'V(r) = −[(Z − N + 1) + (N − 1)/(H(e^(r/d) − 1) + 1)]/r  [V in hartree, r and d in bohr]',
    evaluate: (r) => -(ion + (N - 1) / (H * Math.expm1(r / d) + 1)) / r,
    asymptotes: { threshold: 0, originCharge: Z, tailCharge: ion },
    lengthScale: 1 / ion,
    smooth: true,
  };
}
