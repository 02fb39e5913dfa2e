/**
 * Linear (confining) potential V(r) = F r (hartree; r in bohr, F in hartree/bohr). s levels
 * E_k = (F²/2)^{1/3} (−a_k), a_k the zeros of Ai. Source: REFERENCE.md §10.3; A&S Table 10.13
 * (from memory).
 */
import { z } from 'zod';
import type { Potential } from '../potential';
import { fmt, parseParameters, positive } from './parameters';

export const linearSchema = z.strictObject({
  type: z.literal('linear'),
  F: positive('F (hartree/bohr)'),
});

export function linearPotential(input: unknown, field = 'potential'): Potential {
  const { F } = parseParameters(linearSchema, input, field);
  return {
    id: 'linear',
    label: `Linear, F = ${fmt(F)} E_h/bohr`,
    formula: 'V(r) = F r  [V in hartree, r in bohr, F in hartree/bohr]',
    evaluate: (r) => F * r,
    asymptotes: { threshold: Infinity, originCharge: 0, tailCharge: 0 },
    lengthScale: Math.cbrt(1 / (2 * F)),
    smooth: true,
  };
}
