/**
 * 3-D isotropic harmonic oscillator V(r) = ½ ω² r² (hartree; r in bohr, ω in hartree/ħ, electron
 * mass). Levels E = ω(2n_r + l + 3/2) for μ = 1. Source: REFERENCE.md §10.1; any QM text.
 */
import { z } from 'zod';
import type { Potential } from '../potential';
import { fmt, parseParameters, positive } from './parameters';

export const harmonicOscillatorSchema = z.strictObject({
  type: z.literal('harmonic-oscillator'),
  omega: positive('omega (hartree/ħ)'),
});

export function harmonicOscillatorPotential(input: unknown, field = 'potential'): Potential {
  const { omega } = parseParameters(harmonicOscillatorSchema, input, field);
  return {
    id: 'harmonic-oscillator',
    label: `Harmonic oscillator, ω = ${fmt(omega)} E_h/ħ`,
    formula: 'V(r) = ½ ω² r²  [V in hartree, r in bohr, ω in hartree/ħ]',
    evaluate: (r) => 0.5 * omega * omega * r * r,
    asymptotes: { threshold: Infinity, originCharge: 0, tailCharge: 0 },
    lengthScale: 1 / Math.sqrt(omega),
    smooth: true,
  };
}
