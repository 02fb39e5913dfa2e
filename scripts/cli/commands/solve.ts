// `scripts/lobewright solve`: the lowest levels of the radial equation in a central potential
// (shared/solver). Request: { "potential": { "type": …, parameters }, "l": 0 | [0, 1, …],
// "levels": k, "csv"?: text for a tabulated potential (or inside "potential"), "muRatio"?, "step"? }.
// Answer: { "potential": { id, label, formula }, "levels": [{ n, l, nodes, energy: { hartree, eV },
// error, rMean, hydrogen? }], "grid": [{ l, points, step, rMin, rMax }], "ms" }.
import { z } from 'zod';
import { MAX_ANGULAR_MOMENTUM } from '../../../shared/physics/quantum-numbers';
import { buildPotential } from '../../../shared/solver/potentials/build-potential';
import { MAX_LEVELS, solveRadial, type RadialSolution } from '../../../shared/solver/solve-radial';
import { solveRadialSeries } from '../../../shared/solver/solve-radial-series';
import { CliError, type CliCommand } from '../cli-error';
import { parseRequest, withPhysicsErrors } from './physics-request';

const angular = z.number().int().min(0).max(MAX_ANGULAR_MOMENTUM);

const schema = z.strictObject({
  potential: z.record(z.string(), z.unknown()),
  l: z.union([angular, z.array(angular).min(1).max(MAX_ANGULAR_MOMENTUM + 1)]),
  levels: z.number().int().min(1).max(MAX_LEVELS),
  csv: z.string().optional(),
  muRatio: z.number().optional(),
  step: z.number().optional(),
});

const solve: CliCommand = (input) => {
  const req = parseRequest(schema, input, 'solve');
  const t0 = performance.now();
  let spec: Record<string, unknown> = req.potential;
  if (req.csv !== undefined) {
    if (spec.type !== 'tabulated') throw new CliError('csv', 'is only for a potential of type "tabulated"');
    if (spec.csv !== undefined) throw new CliError('csv', 'is given twice: here and in potential.csv');
    spec = { ...spec, csv: req.csv };
  }
  const csvAtTop = req.csv !== undefined;
  const potential = withPhysicsErrors(
    () => buildPotential(spec),
    (field) => (csvAtTop && field === 'potential.csv' ? 'csv' : field),
  );
  const options = { potential, levels: req.levels, muRatio: req.muRatio, step: req.step };
  const l = req.l;
  const solutions: RadialSolution[] = withPhysicsErrors(() =>
    Array.isArray(l) ? solveRadialSeries({ ...options, l }) : [solveRadial({ ...options, l })],
  );
  return {
    potential: { id: potential.id, label: potential.label, formula: potential.formula },
    levels: solutions.flatMap((s) =>
      s.levels.map((level) => ({
        n: level.n,
        l: level.l,
        nodes: level.nodes,
        energy: { hartree: level.energy, eV: level.energyEv },
        error: level.error,
        rMean: level.rMean,
        ...(level.hydrogen ? { hydrogen: level.hydrogen } : {}),
      })),
    ),
    grid: solutions.map((s) => ({ l: s.l, ...s.grid })),
    ms: Math.round((performance.now() - t0) * 100) / 100,
  };
};

export default solve;
