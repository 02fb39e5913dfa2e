/**
 * Infinite spherical well: V = 0 for r < R, u(R) = 0 (a hard wall). Levels E = x_{l,k}²/(2R²), x_{l,k}
 * the zeros of the spherical Bessel function j_l. Source: REFERENCE.md §10.2; A&S Table 10.6
 * (from memory, digits confirmed by mpmath).
 */
import { z } from 'zod';
import type { Potential } from '../potential';
import { fmt, parseParameters, positive } from './parameters';

export const infiniteWellSchema = z.strictObject({
  type: z.literal('infinite-well'),
  radius: positive('radius (bohr)'),
});

export function infiniteWellPotential(input: unknown, field = 'potential'): Potential {
  const { radius } = parseParameters(infiniteWellSchema, input, field);
  return {
    id: 'infinite-well',
    label: `Infinite spherical well, R = ${fmt(radius)} bohr`,
    formula: 'V(r) = 0 for r < R, u(R) = 0 (hard wall)  [r and R in bohr]',
    evaluate: () => 0,
    asymptotes: { threshold: Infinity, originCharge: 0, tailCharge: 0 },
    lengthScale: radius,
    hardWall: radius,
    smooth: true,
  };
}
