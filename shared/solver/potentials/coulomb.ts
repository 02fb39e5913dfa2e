/**
 * Pure Coulomb potential V(r) = −Z/r (hartree, r in bohr): the hydrogen-like case, kept as a check of
 * the solver against the exact levels E_n = −Z²/(2n²). Source: any QM text (Griffiths 2nd ed. §4.2).
 */
import { z } from 'zod';
import type { Potential } from '../potential';
import { fmt, nuclearCharge, parseParameters } from './parameters';

export const coulombSchema = z.strictObject({ type: z.literal('coulomb'), Z: nuclearCharge });

export function coulombPotential(input: unknown, field = 'potential'): Potential {
  const { Z } = parseParameters(coulombSchema, input, field);
  return {
    id: 'coulomb',
    label: `Coulomb, Z = ${fmt(Z)}`,
    formula: 'V(r) = −Z/r  [V in hartree, r in bohr]',
    evaluate: (r) => -Z / r,
    asymptotes: { threshold: 0, originCharge: Z, tailCharge: Z },
    lengthScale: 1 / Z,
    smooth: true,
  };
}
