/**
 * Hulthén potential V(r) = −Z δ e^{−δr}/(1 − e^{−δr}) (hartree; r in bohr, δ in bohr⁻¹): Coulomb-like
 * (−Z/r) near the nucleus, exponentially screened far out. Exact s levels E_n = −½(Z/n − nδ/2)²,
 * bound for n < √(2Z/δ). Source: REFERENCE.md §10.4; L. Hulthén, Ark. Mat. Astron. Fys. 28A (1942);
 * Flügge, Practical Quantum Mechanics (both from memory).
 */
import { z } from 'zod';
import type { Potential } from '../potential';
import { fmt, nuclearCharge, parseParameters, positive } from './parameters';
import { RANGE_DECAYS } from './yukawa';

export const hulthenSchema = z.strictObject({
  type: z.literal('hulthen'),
  Z: nuclearCharge,
  delta: positive('delta (bohr⁻¹)'),
});

export function hulthenPotential(input: unknown, field = 'potential'): Potential {
  const { Z, delta } = parseParameters(hulthenSchema, input, field);
  return {
    id: 'hulthen',
    label: `Hulthén, Z = ${fmt(Z)}, δ = ${fmt(delta)} bohr⁻¹`,
    formula: 'V(r) = −Z δ e^(−δr)/(1 − e^(−δr))  [V in hartree, r in bohr, δ in bohr⁻¹]',
    // expm1 keeps 1 − e^{−δr} accurate where δr is small.
    evaluate: (r) => (-Z * delta * Math.exp(-delta * r)) / -Math.expm1(-delta * r),
    asymptotes: { threshold: 0, originCharge: Z, tailCharge: 0 },
    lengthScale: 1 / Z,
    rangeEnd: (RANGE_DECAYS + Math.log(1 + Z)) / delta,
    smooth: true,
  };
}
