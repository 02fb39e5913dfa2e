/**
 * Screened Coulomb (Yukawa, Debye–Hückel) potential V(r) = −Z e^{−λr}/r (hartree; r in bohr,
 * λ = 1/D in bohr⁻¹). Source: REFERENCE.md §10.5; F. J. Rogers, H. C. Graboske & D. J. Harwood,
 * Phys. Rev. A 1, 1577 (1970) (from memory). λ = 0 is the pure Coulomb potential. Finitely many
 * levels for λ > 0; the 1s level disappears at λ_c ≈ 1.1906 Z.
 */
import { z } from 'zod';
import type { Potential } from '../potential';
import { fmt, nonNegative, nuclearCharge, parseParameters } from './parameters';

/** e^{−RANGE_DECAYS} is below double-precision significance. */
export const RANGE_DECAYS = 40;

export const yukawaSchema = z.strictObject({
  type: z.literal('yukawa'),
  Z: nuclearCharge,
  lambda: nonNegative('lambda (bohr⁻¹)'),
});

export function yukawaPotential(input: unknown, field = 'potential'): Potential {
  const { Z, lambda } = parseParameters(yukawaSchema, input, field);
  return {
    id: 'yukawa',
    label: `Screened Coulomb (Yukawa), Z = ${fmt(Z)}, λ = ${fmt(lambda)} bohr⁻¹`,
    formula: 'V(r) = −Z e^(−λr)/r  [V in hartree, r in bohr, λ in bohr⁻¹]',
    evaluate: (r) => (-Z * Math.exp(-lambda * r)) / r,
    asymptotes: { threshold: 0, originCharge: Z, tailCharge: lambda === 0 ? Z : 0 },
    lengthScale: 1 / Z,
    rangeEnd: lambda > 0 ? (RANGE_DECAYS + Math.log(1 + Z / lambda)) / lambda : undefined,
    smooth: true,
  };
}
