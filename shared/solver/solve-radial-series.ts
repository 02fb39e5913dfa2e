/**
 * The lowest levels of several angular momenta in one central potential (one solveRadial per l),
 * as an energy-level diagram needs them. Errors about one l name it by position: "l[2]".
 */
import { OrbitalInputError } from '../physics/orbital-input-error';
import { MAX_ANGULAR_MOMENTUM } from '../physics/quantum-numbers';
import { solveRadial, type RadialSolution, type SolveRadialRequest } from './solve-radial';

export interface SolveRadialSeriesRequest extends Omit<SolveRadialRequest, 'l'> {
  /** Distinct angular momenta, at most MAX_ANGULAR_MOMENTUM + 1 of them. */
  l: number[];
}

export function solveRadialSeries(request: SolveRadialSeriesRequest): RadialSolution[] {
  const ls = request.l;
  if (!Array.isArray(ls) || ls.length === 0)
    throw new OrbitalInputError('l', 'must be a non-empty list of angular momenta');
  if (ls.length > MAX_ANGULAR_MOMENTUM + 1)
    throw new OrbitalInputError('l', `lists ${ls.length} values; at most ${MAX_ANGULAR_MOMENTUM + 1} are allowed`);
  return ls.map((l, i) => {
    if (ls.indexOf(l) !== i) throw new OrbitalInputError(`l[${i}]`, `repeats l = ${l}`);
    try {
      return solveRadial({ ...request, l });
    } catch (err) {
      if (err instanceof OrbitalInputError && err.field === 'l') throw new OrbitalInputError(`l[${i}]`, err.reason);
      throw err;
    }
  });
}
