// What differs between two specs, leaf by leaf ("state.terms.0.n: 3 → 4"), so a user who meets a
// newer revision can see what it changed before choosing.
import type { FigureSpec } from '../../../../shared/spec/figure-spec';

export interface SpecChange {
  path: string;
  from: string;
  to: string;
}

const show = (v: unknown): string =>
  v === undefined ? 'house style' : typeof v === 'string' ? v : JSON.stringify(v);

function walk(a: unknown, b: unknown, path: string, out: SpecChange[]): void {
  if (a === b) return;
  const objA = a !== null && typeof a === 'object';
  const objB = b !== null && typeof b === 'object';
  if (objA && objB && Array.isArray(a) === Array.isArray(b)) {
    const keys = new Set([...Object.keys(a), ...Object.keys(b)]);
    for (const k of [...keys].sort())
      walk(
        (a as Record<string, unknown>)[k],
        (b as Record<string, unknown>)[k],
        path ? `${path}.${k}` : k,
        out,
      );
    return;
  }
  if (JSON.stringify(a) !== JSON.stringify(b)) out.push({ path, from: show(a), to: show(b) });
}

export function specChanges(from: FigureSpec, to: FigureSpec): SpecChange[] {
  const out: SpecChange[] = [];
  walk(from, to, '', out);
  return out;
}
