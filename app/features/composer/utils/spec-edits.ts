// Edits of a figure spec that can only produce valid specs: every change of n, l or m clamps the
// others (0 ≤ l < n ≤ 30, |m| ≤ l), kinds start from their schema defaults, radial curves and
// transitions keep l < n and upper > lower. The controls offer only what these functions allow.
import { orbitalLabel, type OrbitalLabel } from '../../../../shared/physics/orbital-labels';
import {
  figureKindSchema,
  MAX_N,
  type FigureKind,
  type FigureSpec,
  type SpecTerm,
} from '../../../../shared/spec/figure-spec';

export type KindType = FigureKind['type'];
export type KindOf<T extends KindType> = Extract<FigureKind, { type: T }>;
export type Basis = SpecTerm['basis'];
export type RadialCurve = KindOf<'radial'>['curves'][number];
export type Transition = KindOf<'levels'>['transitions'][number];

/** Terms in a superposition; the schema allows 16. */
export const MAX_TERMS = 16;
export const MAX_RADIAL_CURVES = 12;
export const MAX_TRANSITIONS = 24;
/** Highest upper level the level diagrams accept for a transition. */
export const MAX_TRANSITION_UPPER = 30;

const clampInt = (v: number, lo: number, hi: number): number =>
  Math.min(hi, Math.max(lo, Math.trunc(Number.isFinite(v) ? v : lo)));

/** The nearest valid (n, l, m): n first, then l below it, then m within ±l. */
export function clampQuantumNumbers<T extends { n: number; l: number }>(t: T & { m?: number }): T {
  const n = clampInt(t.n, 1, MAX_N);
  const l = clampInt(t.l, 0, n - 1);
  return t.m === undefined ? { ...t, n, l } : { ...t, n, l, m: clampInt(t.m, -l, l) };
}

export function range(from: number, to: number): number[] {
  return from > to ? [] : Array.from({ length: to - from + 1 }, (_, i) => from + i);
}

/** m in the order orbitals are usually listed: 0, +1, −1, +2, −2, … */
export function magneticOrder(l: number): number[] {
  const out = [0];
  for (let k = 1; k <= l; k++) out.push(k, -k);
  return out;
}

export interface OrbitalChoice {
  m: number;
  label: OrbitalLabel;
}

/** The 2l + 1 orbitals of one (n, l) in a basis, by their conventional names (n left off). */
export function orbitalChoices(l: number, basis: Basis): OrbitalChoice[] {
  return magneticOrder(l).map((m) => ({ m, label: orbitalLabel(null, l, m, basis) }));
}

// ---- state -----------------------------------------------------------------------------------

function withTerms(spec: FigureSpec, terms: SpecTerm[]): FigureSpec {
  return { ...spec, state: { ...spec.state, terms } };
}

export function isSuperposition(spec: FigureSpec): boolean {
  return spec.state.terms.length > 1;
}

/** Changes one quantum number of a term; the others follow so the term stays valid. */
export function setQuantumNumber(
  spec: FigureSpec,
  index: number,
  which: 'n' | 'l' | 'm',
  value: number,
): FigureSpec {
  const terms = spec.state.terms.map((t, i) =>
    i === index ? clampQuantumNumbers({ ...t, [which]: value }) : t,
  );
  return withTerms(spec, terms);
}

export function setBasis(spec: FigureSpec, index: number, basis: Basis): FigureSpec {
  return withTerms(
    spec,
    spec.state.terms.map((t, i) => (i === index ? { ...t, basis } : t)),
  );
}

/** Sets one part of a term's complex weight; the state keeps at least one non-zero weight. */
export function setWeight(
  spec: FigureSpec,
  index: number,
  part: 're' | 'im',
  value: number,
): FigureSpec {
  if (!Number.isFinite(value)) return spec;
  const terms = spec.state.terms.map((t, i) =>
    i === index ? { ...t, weight: { ...t.weight, [part]: value } } : t,
  );
  if (terms.every((t) => t.weight.re === 0 && t.weight.im === 0)) return spec;
  return withTerms(spec, terms);
}

/** Adds a term: the next orbital of the same n not yet in the state, weight 1. */
export function addTerm(spec: FigureSpec): FigureSpec {
  const terms = spec.state.terms;
  if (terms.length >= MAX_TERMS) return spec;
  const last = terms[terms.length - 1];
  const taken = new Set(terms.map((t) => `${t.n},${t.l},${t.m}`));
  let next: SpecTerm = { ...last, weight: { re: 1, im: 0 } };
  search: for (let n = last.n; n <= MAX_N; n++)
    for (let l = 0; l < n; l++)
      for (const m of magneticOrder(l))
        if (!taken.has(`${n},${l},${m}`)) {
          next = { ...last, n, l, m, weight: { re: 1, im: 0 } };
          break search;
        }
  return withTerms(spec, [...terms, next]);
}

export function removeTerm(spec: FigureSpec, index: number): FigureSpec {
  const terms = spec.state.terms.filter((_, i) => i !== index);
  if (terms.length === 0) return spec;
  if (terms.every((t) => t.weight.re === 0 && t.weight.im === 0))
    terms[0] = { ...terms[0], weight: { re: 1, im: 0 } };
  return withTerms(spec, terms);
}

/** One orbital: keeps the first term with weight 1 (a single term's weight only sets a phase). */
export function makeSingle(spec: FigureSpec): FigureSpec {
  return withTerms(spec, [{ ...spec.state.terms[0], weight: { re: 1, im: 0 } }]);
}

export function setTime(spec: FigureSpec, time: number): FigureSpec {
  if (!Number.isFinite(time) || time < 0) return spec;
  return { ...spec, state: { ...spec.state, time } };
}

// ---- kind ------------------------------------------------------------------------------------

/** The distinct shells (n, l) of the state, for radial curves. */
function shells(spec: FigureSpec): { n: number; l: number }[] {
  const seen = new Map<string, { n: number; l: number }>();
  for (const t of spec.state.terms) seen.set(`${t.n},${t.l}`, { n: t.n, l: t.l });
  return [...seen.values()];
}

/** A new kind with the schema's defaults, drawn from the present state where it needs one. */
export function defaultKind(type: KindType, spec: FigureSpec): FigureKind {
  switch (type) {
    case 'radial':
      return figureKindSchema.parse({
        type,
        curves: shells(spec)
          .slice(0, MAX_RADIAL_CURVES)
          .map((s) => ({ ...s, quantity: 'r2R2' })),
      });
    case 'levels': {
      const nTop = Math.max(...spec.state.terms.map((t) => t.n));
      return figureKindSchema.parse({ type, nMax: clampInt(Math.max(6, nTop), 2, 12) });
    }
    default:
      return figureKindSchema.parse({ type });
  }
}

export function changeKind(spec: FigureSpec, type: KindType): FigureSpec {
  if (spec.kind.type === type) return spec;
  return { ...spec, kind: defaultKind(type, spec) };
}

/** Changes settings of the present kind; a patch for another kind leaves the spec as it is. */
export function patchKind<T extends KindType>(
  spec: FigureSpec,
  type: T,
  patch: Partial<Omit<KindOf<T>, 'type'>>,
): FigureSpec {
  if (spec.kind.type !== type) return spec;
  return { ...spec, kind: { ...spec.kind, ...patch } as FigureKind };
}

export function setRadialCurve(
  spec: FigureSpec,
  index: number,
  patch: Partial<RadialCurve>,
): FigureSpec {
  if (spec.kind.type !== 'radial') return spec;
  const curves = spec.kind.curves.map((c, i) =>
    i === index ? clampQuantumNumbers({ ...c, ...patch }) : c,
  );
  return patchKind(spec, 'radial', { curves });
}

export function addRadialCurve(spec: FigureSpec): FigureSpec {
  if (spec.kind.type !== 'radial' || spec.kind.curves.length >= MAX_RADIAL_CURVES) return spec;
  const last = spec.kind.curves[spec.kind.curves.length - 1];
  const next = clampQuantumNumbers({ ...last, n: Math.min(MAX_N, last.n + 1) });
  return patchKind(spec, 'radial', { curves: [...spec.kind.curves, next] });
}

export function removeRadialCurve(spec: FigureSpec, index: number): FigureSpec {
  if (spec.kind.type !== 'radial' || spec.kind.curves.length <= 1) return spec;
  return patchKind(spec, 'radial', { curves: spec.kind.curves.filter((_, i) => i !== index) });
}

/** Keeps upper > lower ≥ 1 whichever end moved. */
export function clampTransition(t: Transition, moved: 'upper' | 'lower'): Transition {
  if (moved === 'lower') {
    const lower = clampInt(t.lower, 1, MAX_TRANSITION_UPPER - 1);
    return { lower, upper: clampInt(Math.max(t.upper, lower + 1), 2, MAX_TRANSITION_UPPER) };
  }
  const upper = clampInt(t.upper, 2, MAX_TRANSITION_UPPER);
  return { upper, lower: clampInt(Math.min(t.lower, upper - 1), 1, upper - 1) };
}

export function setTransition(
  spec: FigureSpec,
  index: number,
  moved: 'upper' | 'lower',
  value: number,
): FigureSpec {
  if (spec.kind.type !== 'levels') return spec;
  const transitions = spec.kind.transitions.map((t, i) =>
    i === index ? clampTransition({ ...t, [moved]: value }, moved) : t,
  );
  return patchKind(spec, 'levels', { transitions });
}

export function addTransition(spec: FigureSpec): FigureSpec {
  if (spec.kind.type !== 'levels' || spec.kind.transitions.length >= MAX_TRANSITIONS) return spec;
  const list = spec.kind.transitions;
  const last = list[list.length - 1] ?? { upper: 2, lower: 2 };
  const next = clampTransition({ lower: last.lower, upper: last.upper + 1 }, 'upper');
  return patchKind(spec, 'levels', { transitions: [...list, next] });
}

export function removeTransition(spec: FigureSpec, index: number): FigureSpec {
  if (spec.kind.type !== 'levels') return spec;
  return patchKind(spec, 'levels', {
    transitions: spec.kind.transitions.filter((_, i) => i !== index),
  });
}

// ---- view, look, print -------------------------------------------------------------------------

export function patchView(spec: FigureSpec, patch: Partial<FigureSpec['view']>): FigureSpec {
  return { ...spec, view: { ...spec.view, ...patch } };
}

/** Sets a look field, or clears it (undefined) so the house style applies. */
export function patchLook(spec: FigureSpec, patch: Partial<FigureSpec['look']>): FigureSpec {
  return { ...spec, look: dropUnset({ ...spec.look, ...patch }) };
}

export function patchPrint(spec: FigureSpec, patch: Partial<FigureSpec['print']>): FigureSpec {
  return { ...spec, print: dropUnset({ ...spec.print, ...patch }) };
}

function dropUnset<T extends object>(o: T): T {
  return Object.fromEntries(Object.entries(o).filter(([, v]) => v !== undefined)) as T;
}
