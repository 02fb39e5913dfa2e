/**
 * Closed-form radial expectation values ⟨r^k⟩ of hydrogen-like states, in bohr^k.
 *
 * Source: Bethe & Salpeter (1957) §3; Pauling & Wilson (1935) (section numbers from memory);
 * REFERENCE.md §7. In units of a0/Z_eff (⟨r^k⟩ scales as Z_eff^{−k}):
 *   ⟨r⟩ = [3n² − l(l+1)]/2,  ⟨r²⟩ = n²[5n² + 1 − 3l(l+1)]/2,
 *   ⟨r³⟩ = n²[35n²(n²−1) − 30n²(l+2)(l−1) + 3(l+2)(l+1)l(l−1)]/8 (from Kramers' recursion),
 *   ⟨1/r⟩ = 1/n²,  ⟨1/r²⟩ = 1/[n³(l+½)],  ⟨1/r³⟩ = 1/[n³ l(l+½)(l+1)] (l ≥ 1; Infinity for l = 0).
 */
import { checkRadialInput } from './radial-function';

export interface RadialExpectationValues {
  r: number;
  r2: number;
  r3: number;
  invR: number;
  invR2: number;
  /** Infinity for s states (the integral diverges at the nucleus). */
  invR3: number;
}

export function radialExpectationValues(
  n: number,
  l: number,
  Z = 1,
  muRatio = 1,
): RadialExpectationValues {
  const p = checkRadialInput(n, l, Z, muRatio);
  const nn = p.n;
  const L = p.l * (p.l + 1);
  const z = p.zEff;
  const n2 = nn * nn;
  const n3 = n2 * nn;
  return {
    r: (3 * n2 - L) / 2 / z,
    r2: (n2 * (5 * n2 + 1 - 3 * L)) / 2 / (z * z),
    r3:
      (n2 *
        (35 * n2 * (n2 - 1) -
          30 * n2 * (p.l + 2) * (p.l - 1) +
          3 * (p.l + 2) * (p.l + 1) * p.l * (p.l - 1))) /
      8 /
      (z * z * z),
    invR: z / n2,
    invR2: (z * z) / (n3 * (p.l + 0.5)),
    invR3: p.l === 0 ? Infinity : (z * z * z) / (n3 * p.l * (p.l + 0.5) * (p.l + 1)),
  };
}
