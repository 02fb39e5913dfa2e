/**
 * The numerically solved curves of a radial plot: kind.potential solved once per l for the levels its
 * "solved" curves ask for, each curve's state as a SolvedRadialCurve, the curve names ("2s (solved)",
 * "2s (hydrogen)" when both kinds are drawn) and the solver's note for the figure.
 */
import type { ResolvedFigureSpec } from '../spec/resolve-figure-spec';
import { FigureSpecError } from './figure-error';
import { systemMassRatio } from './figure-system';
import { solvePotential, solverNote } from './solved-potential';
import { solvedRadialCurve, type SolvedRadialCurve } from './solved-radial-curve';

type RadialKind = Extract<ResolvedFigureSpec['kind'], { type: 'radial' }>;
type Curve = RadialKind['curves'][number];

export interface SolvedRadialSet {
  /** The solved state of a curve with source "solved", else null. */
  curveOf(c: Curve): SolvedRadialCurve | null;
  /** " (solved)" or " (hydrogen)" after a curve's name when the figure mixes both, else "" / " (solved)". */
  suffix(c: Curve): string;
  notes: string[];
}

export function solvedRadialSet(spec: ResolvedFigureSpec): SolvedRadialSet {
  if (spec.kind.type !== 'radial')
    throw new FigureSpecError('kind.type', `expected "radial", got "${spec.kind.type}"`);
  const { curves, potential: potentialSpec } = spec.kind;
  const solvedIndex = curves.map((c, i) => (c.source === 'solved' ? i : -1)).filter((i) => i >= 0);
  const mixed = solvedIndex.length > 0 && solvedIndex.length < curves.length;
  const suffix = (c: Curve): string =>
    c.source === 'solved' ? ' (solved)' : mixed ? ' (hydrogen)' : '';
  if (solvedIndex.length === 0) return { curveOf: () => null, suffix, notes: [] };
  if (potentialSpec === undefined)
    throw new FigureSpecError(
      'kind.potential',
      `curves[${solvedIndex[0]}] is solved numerically: give the potential`,
    );
  solvedIndex.forEach((i) => {
    if (curves[i].quantity === 'veff')
      throw new FigureSpecError(
        `kind.curves[${i}].source`,
        'V_eff of a solved potential is drawn by the effective-potential figure (kind "potential"); use R, r2R2 or cumulative here',
      );
  });
  // Per l, the levels up to the highest n asked for; an unbound one names the curve that asked.
  const byL = new Map<number, number>();
  for (const i of solvedIndex)
    byL.set(curves[i].l, Math.max(byL.get(curves[i].l) ?? 0, curves[i].n));
  const ls = [...byL.keys()];
  const askedBy = (l: number): number =>
    solvedIndex.find((i) => curves[i].l === l && curves[i].n === byL.get(l)) ?? 0;
  const { potential, solutions } = solvePotential(
    potentialSpec,
    ls.map((l) => ({ l, levels: (byL.get(l) ?? l + 1) - l })),
    systemMassRatio(spec),
    {
      potential: 'kind.potential',
      l: (l) => `kind.curves[${askedBy(l)}].l`,
      levels: (l) => `kind.curves[${askedBy(l)}].n`,
    },
  );
  const states = new Map<string, SolvedRadialCurve>();
  for (const i of solvedIndex) {
    const c = curves[i];
    const solution = solutions[ls.indexOf(c.l)];
    if (solution)
      states.set(`${c.n},${c.l}`, solvedRadialCurve(solution, c.n, `kind.curves[${i}].n`));
  }
  const levels = [...states.values()].map((s) => s.level);
  return {
    curveOf: (c) => (c.source === 'solved' ? (states.get(`${c.n},${c.l}`) ?? null) : null),
    suffix,
    notes: [solverNote(levels, potential)],
  };
}
