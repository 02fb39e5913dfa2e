// `scripts/lobewright isosurface`: the isosurface of one hydrogen-like orbital enclosing a chosen
// probability — its level, the probability the grid region holds, triangle counts and timings.
// Request: { "Z", "n", "l", "m", "basis"?: "real" | "complex", "enclosed"?: 0.9, "grid"?: 128,
//            "extent"?: bohr, "reducedMass"?: boolean, "maxTriangles"?: number,
//            "levelMethod"?: "sub-voxel" | "samples" }
import { z } from 'zod';
import { buildIsosurface } from '../../../shared/grid/build-isosurface';
import { compileState } from '../../../shared/physics/orbital-state';
import { OrbitalInputError } from '../../../shared/physics/orbital-input-error';
import { CliError, type CliCommand } from '../cli-error';

const request = z.strictObject({
  Z: z.number(),
  n: z.number().int(),
  l: z.number().int(),
  m: z.number().int(),
  basis: z.enum(['real', 'complex']).default('real'),
  enclosed: z.number().default(0.9),
  grid: z.number().int().default(128),
  extent: z.number().optional(),
  reducedMass: z.boolean().optional(),
  maxTriangles: z.number().int().optional(),
  levelMethod: z.enum(['sub-voxel', 'samples']).optional(),
});

/** Orbital errors name fields of the state ("terms[0].l"); the request has them at the top level. */
function requestField(field: string): string {
  return field.replace(/^terms\[0\]\./, '');
}

const isosurface: CliCommand = (input) => {
  const parsed = request.safeParse(input);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    if (issue.code === 'unrecognized_keys') throw new CliError(issue.keys[0], `is not a field of an isosurface request`);
    throw new CliError(issue.path.length > 0 ? issue.path.join('.') : 'request', issue.message);
  }
  const { Z, n, l, m, basis, enclosed, grid, extent, reducedMass, maxTriangles, levelMethod } = parsed.data;
  try {
    const state = compileState({ Z, reducedMass, terms: [{ n, l, m, basis }] });
    const result = buildIsosurface(state, { enclosed, grid, extent, maxTriangles, levelMethod });
    return {
      densityLevel: result.densityLevel,
      psiLevel: result.psiLevel,
      enclosed: result.enclosed,
      enclosedBySamples: result.enclosedBySamples,
      levelMethod: result.levelMethod,
      gridTotal: result.gridTotal,
      grid: result.grid.n,
      extent: result.grid.half,
      clippedByGrid: result.clippedByGrid,
      isReal: result.isReal,
      triangles: result.triangles,
      ms: {
        sample: Math.round(result.ms.sample * 100) / 100,
        level: Math.round(result.ms.level * 100) / 100,
        mesh: Math.round(result.ms.mesh * 100) / 100,
      },
    };
  } catch (err) {
    if (err instanceof OrbitalInputError) throw new CliError(requestField(err.field), err.message.replace(/^[^:]*: /, ''));
    throw err;
  }
};

export default isosurface;
