// `scripts/lobewright radial`: R_nl(r) and the cumulative radial probability P(r) at given radii.
// Request: { "Z", "n", "l", "r": [r, …] (bohr, ≥ 0), "reducedMass"?: boolean }.
// Answer: { "R": [bohr^(−3/2) …], "P": [probability within r …] }.
import { z } from 'zod';
import { radialFunction } from '../../../shared/physics/radial-function';
import { cumulativeRadialProbability } from '../../../shared/physics/radial-probability';
import type { CliCommand } from '../cli-error';
import {
  MAX_REQUEST_POINTS,
  massRatioFor,
  parseRequest,
  reducedMassField,
  withPhysicsErrors,
} from './physics-request';

const schema = z.strictObject({
  Z: z.number(),
  n: z.number(),
  l: z.number(),
  r: z
    .array(z.number().nonnegative().refine(Number.isFinite, 'must be a finite number'))
    .min(1)
    .max(MAX_REQUEST_POINTS),
  reducedMass: reducedMassField,
});

const radial: CliCommand = (input) => {
  const req = parseRequest(schema, input, 'radial');
  const mu = massRatioFor(req.Z, req.reducedMass);
  return withPhysicsErrors(() => ({
    R: req.r.map((r) => radialFunction(req.n, req.l, r, req.Z, mu)),
    P: req.r.map((r) => cumulativeRadialProbability(req.n, req.l, r, req.Z, mu)),
  }));
};

export default radial;
