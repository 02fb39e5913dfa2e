/**
 * Typeset labels as text runs: conventional orbital names (3d_z², 2p_x) from shared/physics
 * orbital labels, with the letters of coordinate subscripts in italic and digits upright
 * (common practice, as in IUPAC's Green Book), and the small markup of user-written labels.
 */
import { angularMomentumLetter, orbitalLabel } from '../physics/orbital-labels';
import type { SpecTerm } from '../spec/figure-spec';
import type { TextRun } from './scene';

/** Splits a subscript into italic letter runs and upright runs for everything else. */
function subscriptRuns(text: string, shift: TextRun['shift']): TextRun[] {
  const runs: TextRun[] = [];
  for (const piece of text.match(/[a-z]+|[^a-z]+/g) ?? []) {
    runs.push({ text: piece, shift, italic: /^[a-z]/.test(piece) && !piece.startsWith('m=') });
  }
  return runs;
}

export function orbitalRuns(
  n: number | null,
  l: number,
  m: number,
  basis: 'real' | 'complex',
): TextRun[] {
  const label = orbitalLabel(n, l, m, basis);
  return label.parts.flatMap((p) =>
    't' in p ? [{ text: p.t, shift: 'base' as const }] : subscriptRuns(p.sub, 'sub'),
  );
}

/** "3d": shell and letter only, for radial functions (which do not depend on m). */
export function shellRuns(n: number, l: number): TextRun[] {
  return [{ text: `${n}${angularMomentumLetter(l)}`, shift: 'base' }];
}

/**
 * A user-written label: "_x" or "_{xy}" makes a subscript, "^2" or "^{−1}" a superscript,
 * everything else is set as written.
 */
export function markupRuns(text: string): TextRun[] {
  const runs: TextRun[] = [];
  const pattern = /([_^])(\{([^}]*)\}|(.))/gu;
  let last = 0;
  for (const match of text.matchAll(pattern)) {
    const index = match.index ?? 0;
    if (index > last) runs.push({ text: text.slice(last, index), shift: 'base' });
    runs.push({ text: match[3] ?? match[4], shift: match[1] === '_' ? 'sub' : 'sup' });
    last = index + match[0].length;
  }
  if (last < text.length) runs.push({ text: text.slice(last), shift: 'base' });
  return runs;
}

/** The figure's label: the look's override, else the state's conventional name (terms joined by +). */
export function stateLabelRuns(terms: readonly SpecTerm[], override: string): TextRun[] {
  if (override.trim() !== '') return markupRuns(override);
  const runs: TextRun[] = [];
  terms.forEach((t, i) => {
    const negative = t.weight.re < 0 && t.weight.im === 0;
    if (i > 0) runs.push({ text: negative ? ' \u2212 ' : ' + ', shift: 'base' });
    else if (negative) runs.push({ text: '\u2212', shift: 'base' });
    runs.push(...orbitalRuns(t.n, t.l, t.m, t.basis));
  });
  return runs;
}
