// The read-out under the potential picker: the lowest levels of each l with their estimated error,
// node count and ⟨r⟩ from shared/solver, and for each l the solver refuses (fewer bound levels than
// asked, none at all) its own message, so one unbound l does not hide the others; where fewer are
// bound than asked, the bound ones are listed too.
import { OrbitalInputError } from '../../../../shared/physics/orbital-input-error';
import { countBoundLevels } from '../../../../shared/solver/count-bound-levels';
import { buildPotential } from '../../../../shared/solver/potentials/build-potential';
import { DEFAULT_STEP } from '../../../../shared/solver/solve-radial';
import { solveRadialSeries } from '../../../../shared/solver/solve-radial-series';
import type { PotentialSpec } from '../../../../shared/spec/figure-spec';

export interface ReadoutRow {
  name: string;
  energy: number;
  error: number;
  nodes: number;
  rMean: number;
}

export interface Refusal {
  /** What the solver blames: "l = 2" (too few levels bound), "potential.lambda". */
  field: string;
  message: string;
}

export interface Readout {
  rows: ReadoutRow[];
  refusals: Refusal[];
}

const LETTERS = 'spdfghiklmnoqrtuvwxyz';

export function potentialReadout(
  spec: PotentialSpec,
  ls: number[],
  levels: number,
  muRatio = 1,
): Readout {
  const rows: ReadoutRow[] = [];
  const refusals: Refusal[] = [];
  const refuse = (err: unknown, field?: string): void => {
    if (!(err instanceof OrbitalInputError)) throw err;
    refusals.push({ field: field ?? err.field, message: err.reason });
  };
  let potential;
  try {
    potential = buildPotential(spec);
  } catch (err) {
    refuse(err);
    return { rows, refusals };
  }
  const solve = (l: number, count: number): void => {
    const [solution] = solveRadialSeries({ potential, l: [l], levels: count, muRatio });
    for (const lv of solution.levels)
      rows.push({
        name: `${lv.n}${LETTERS[lv.l] ?? `(l=${lv.l})`}`,
        energy: lv.energy,
        error: lv.error,
        nodes: lv.nodes,
        rMean: lv.rMean,
      });
  };
  ls.forEach((l) => {
    try {
      solve(l, levels);
    } catch (err) {
      refuse(err, `l = ${l}`);
      // Fewer levels bound than asked: the refusal says so, and the bound ones are still shown.
      if (err instanceof OrbitalInputError && err.field === 'levels') {
        const bound = countBoundLevels(potential, l, muRatio, DEFAULT_STEP / 2);
        if (bound >= 1 && bound < levels) {
          try {
            solve(l, bound);
          } catch (again) {
            refuse(again, `l = ${l}`);
          }
        }
      }
    }
  });
  return { rows: rows.sort((a, b) => a.energy - b.energy), refusals };
}
