/**
 * Term lists of the standard sp, sp² and sp³ hybrids on one centre, each normalised.
 *
 * Source: L. Pauling, J. Am. Chem. Soc. 53, 1367 (1931) (citation from memory); the coefficients are
 * the usual textbook set (e.g. Atkins, Physical Chemistry, hybridisation section; from memory):
 *   sp:  (s ± p_z)/√2, along ±z;
 *   sp²: s/√3 + √(2/3) p_x,  s/√3 − p_x/√6 ± p_y/√2, in the xy plane at 120°;
 *   sp³: ½(s + p_x + p_y + p_z), ½(s + p_x − p_y − p_z), ½(s − p_x + p_y − p_z), ½(s − p_x − p_y + p_z),
 *        pointing to alternate corners of a cube (tetrahedral).
 * All use the real basis of REFERENCE.md §5 (p_x = m +1, p_y = m −1, p_z = m 0) with shell n ≥ 2.
 *
 * Sign of s: the textbook sets assume s and p radial parts of the same sign where the hybrid's lobe
 * is. Lobewright's R_nl is positive at the nucleus (REFERENCE.md §4), so at large r, where most of
 * the probability is, R_ns has the sign (−1)^(n−1) and R_np the sign (−1)^(n−2): opposite, for
 * every n. The s coefficient is therefore negated, so that each hybrid's large lobe points along
 * the direction its p part names (sp: +z and −z; sp³: the cube diagonals as listed).
 */
import type { OrbitalTerm } from './orbital-state';
import { OrbitalInputError } from './orbital-input-error';
import { checkPrincipal } from './quantum-numbers';

type Coefficients = [s: number, px: number, py: number, pz: number];

function build(n: number, sets: Coefficients[]): OrbitalTerm[][] {
  const shell = checkPrincipal(n);
  if (shell < 2) throw new OrbitalInputError('n', 'hybrids need a shell with p orbitals (n ≥ 2)');
  return sets.map(([s, px, py, pz]) =>
    (
      [
        [0, 0, -s],
        [1, 1, px],
        [1, -1, py],
        [1, 0, pz],
      ] as const
    )
      .filter(([, , w]) => w !== 0)
      .map(([l, m, w]) => ({ n: shell, l, m, basis: 'real' as const, weight: { re: w, im: 0 } })),
  );
}

export function spHybrids(n: number): OrbitalTerm[][] {
  const h = Math.SQRT1_2;
  return build(n, [
    [h, 0, 0, h],
    [h, 0, 0, -h],
  ]);
}

export function sp2Hybrids(n: number): OrbitalTerm[][] {
  const s = 1 / Math.sqrt(3);
  return build(n, [
    [s, Math.sqrt(2 / 3), 0, 0],
    [s, -1 / Math.sqrt(6), Math.SQRT1_2, 0],
    [s, -1 / Math.sqrt(6), -Math.SQRT1_2, 0],
  ]);
}

export function sp3Hybrids(n: number): OrbitalTerm[][] {
  return build(n, [
    [0.5, 0.5, 0.5, 0.5],
    [0.5, 0.5, -0.5, -0.5],
    [0.5, -0.5, 0.5, -0.5],
    [0.5, -0.5, -0.5, 0.5],
  ]);
}
