// Conventional names of single hydrogen-like states, e.g. 3d_z² or 2p_x: the spectroscopic letter
// for l and, for the real (chemists') orbitals up to f, the Cartesian subscript for m.
// Convention (common practice in the usual tables of real spherical harmonics):
// m > 0 takes the cos(mφ) combination (x-like), m < 0 the sin(|m|φ) one (y-like).
// Small on purpose; shared/physics will own the full set of labels.

/** Spectroscopic letters for l = 0, 1, 2, …: s p d f, then alphabetical without j (and s, p). */
const LETTERS = [
  's',
  'p',
  'd',
  'f',
  'g',
  'h',
  'i',
  'k',
  'l',
  'm',
  'n',
  'o',
  'q',
  'r',
  't',
  'u',
  'v',
  'w',
  'x',
  'y',
  'z',
];

const REAL_SUBSCRIPTS: Record<number, Record<number, string>> = {
  0: { 0: '' },
  1: { [-1]: 'y', 0: 'z', 1: 'x' },
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

export interface OrbitalLabelParts {
  /** "3d" */
  shell: string;
  /** "z²", "m=−1", or "" for s */
  subscript: string;
}

export function lLetter(l: number): string {
  return LETTERS[l] ?? `[l=${l}]`;
}

/** Writes m with a true minus sign, as in print. */
export function signed(m: number): string {
  return m < 0 ? `−${-m}` : m > 0 ? `+${m}` : '0';
}

export function orbitalLabelParts(
  n: number,
  l: number,
  m: number,
  basis: 'real' | 'complex' = 'real',
): OrbitalLabelParts {
  const shell = `${n}${lLetter(l)}`;
  if (l === 0) return { shell, subscript: '' };
  const real = basis === 'real' ? REAL_SUBSCRIPTS[l]?.[m] : undefined;
  return { shell, subscript: real ?? `m=${m < 0 ? `−${-m}` : m}` };
}

/** Plain-text label, e.g. "3d_z²", "2p_x", "1s", "5g_m=−2". */
export function orbitalLabel(
  n: number,
  l: number,
  m: number,
  basis: 'real' | 'complex' = 'real',
): string {
  const { shell, subscript } = orbitalLabelParts(n, l, m, basis);
  return subscript ? `${shell}_${subscript}` : shell;
}
