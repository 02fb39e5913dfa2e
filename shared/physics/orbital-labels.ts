/**
 * Conventional orbital labels as structured data, so the client can typeset subscripts.
 *
 * Letters s, p, d, f, g, h, i, k, l, m, n, o, q, r, t, u, v, w, x, y, z for l = 0…20 (spectroscopic
 * notation, j, p, s skipped after i; common practice); above l = 20 the letter is replaced by "[l=…]".
 * Real orbitals, l ≤ 3 (common practice, REFERENCE.md §5 table): s; p_x (m=+1), p_y (−1), p_z (0);
 * d_xy (−2), d_yz (−1), d_z² (0), d_xz (+1), d_x²−y² (+2); f_y(3x²−y²) (−3), f_xyz (−2), f_yz² (−1),
 * f_z³ (0), f_xz² (+1), f_z(x²−y²) (+2), f_x(x²−3y²) (+3).
 * Real orbitals, l ≥ 4, and all complex ones: the subscript is "m=+2" etc. For real orbitals +m means
 * the cos mφ function and −m the sin |m|φ function.
 *
 * Format: { text, parts }, parts a list of { t } (normal text) or { sub } (subscript). `text` is the
 * plain form: normal parts as they are, each subscript preceded by "_", e.g. "3d_z²", "5g_m=+2".
 * Superscript digits inside subscripts are Unicode (², ³).
 */
import type { Basis } from './orbital-state';
import { checkAngular, checkMagnetic, checkPrincipal } from './quantum-numbers';

export type LabelPart = { t: string } | { sub: string };
export interface OrbitalLabel {
  text: string;
  parts: LabelPart[];
}

const LETTERS = 'spdfghiklmnoqrtuvwxyz';

export function angularMomentumLetter(l: number): string {
  return l < LETTERS.length ? LETTERS[l] : `[l=${l}]`;
}

const REAL_SUBSCRIPTS: Record<number, Record<number, string>> = {
  1: { 1: 'x', [-1]: 'y', 0: 'z' },
  2: { [-2]: 'xy', [-1]: 'yz', 0: 'z²', 1: 'xz', 2: 'x²−y²' },
  3: {
    [-3]: 'y(3x²−y²)',
    [-2]: 'xyz',
    [-1]: 'yz²',
    0: 'z³',
    1: 'xz²',
    2: 'z(x²−y²)',
    3: 'x(x²−3y²)',
  },
};

function signedM(m: number): string {
  return m > 0 ? `+${m}` : `${m}`;
}

/** Subscript of the angular part alone (no n), or null for s. */
export function angularSubscript(l: number, m: number, basis: Basis): string | null {
  if (l === 0) return null;
  if (basis === 'real' && l <= 3) return REAL_SUBSCRIPTS[l][m];
  return `m=${signedM(m)}`;
}

export function orbitalLabel(n: number | null, l: number, m: number, basis: Basis): OrbitalLabel {
  const nn = n === null ? null : checkPrincipal(n);
  const ll = checkAngular(l, nn);
  const mm = checkMagnetic(m, ll);
  const head = `${nn ?? ''}${angularMomentumLetter(ll)}`;
  const sub = angularSubscript(ll, mm, basis);
  const parts: LabelPart[] = sub === null ? [{ t: head }] : [{ t: head }, { sub }];
  return { text: sub === null ? head : `${head}_${sub}`, parts };
}
