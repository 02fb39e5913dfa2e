/**
 * Finite spherical well V(r) = −V₀ for r < a, 0 for r > a (hartree, bohr). Source: any QM text
 * (e.g. Griffiths 2nd ed., problem on the finite spherical well; from memory). V jumps at a: the
 * grid puts a point there, V there is the mean of the two sides, and the solver is told the jump
 * (+V₀) so that its scheme keeps order 4.
 */
import { z } from 'zod';
import type { Potential } from '../potential';
import { fmt, parseParameters, positive } from './parameters';

export const finiteWellSchema = z.strictObject({
  type: z.literal('finite-well'),
  depth: positive('depth (hartree)'),
  radius: positive('radius (bohr)'),
});

export function finiteWellPotential(input: unknown, field = 'potential'): Potential {
  const { depth, radius } = parseParameters(finiteWellSchema, input, field);
  return {
    id: 'finite-well',
    label: `Finite spherical well, V₀ = ${fmt(depth)} E_h, a = ${fmt(radius)} bohr`,
    formula: 'V(r) = −V₀ for r < a, 0 for r > a  [V₀ in hartree, r and a in bohr]',
    evaluate: (r) => (r < radius ? -depth : r > radius ? 0 : -depth / 2),
    asymptotes: { threshold: 0, originCharge: 0, tailCharge: 0 },
    lengthScale: radius,
    breakpoint: radius,
    jump: { dV: depth, dVprime: 0 },
    rangeEnd: radius,
    smooth: true,
  };
}
