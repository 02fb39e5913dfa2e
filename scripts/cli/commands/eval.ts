// `scripts/lobewright eval`: ψ of one hydrogen-like orbital at given points.
// Request: { "Z", "n", "l", "m", "basis"?: "real" | "complex" (default "real"), "points": [[x, y, z], …] (bohr),
//            "reducedMass"?: boolean }. Answer: { "psi": [[re, im], …] } in bohr^(−3/2).
import { z } from 'zod';
import { compileState, evaluatePsi } from '../../../shared/physics/orbital-state';
import type { CliCommand } from '../cli-error';
import {
  MAX_REQUEST_POINTS,
  finite,
  massRatioFor,
  parseRequest,
  reducedMassField,
  withPhysicsErrors,
} from './physics-request';

const schema = z.strictObject({
  Z: z.number(),
  n: z.number(),
  l: z.number(),
  m: z.number(),
  basis: z.enum(['real', 'complex']).default('real'),
  points: z
    .array(z.tuple([finite, finite, finite]))
    .min(1)
    .max(MAX_REQUEST_POINTS),
  reducedMass: reducedMassField,
});

const evalCommand: CliCommand = (input) => {
  const req = parseRequest(schema, input, 'eval');
  massRatioFor(req.Z, req.reducedMass);
  const state = withPhysicsErrors(
    () =>
      compileState({
        Z: req.Z,
        reducedMass: req.reducedMass,
        terms: [{ n: req.n, l: req.l, m: req.m, basis: req.basis }],
      }),
    (field) => field.replace(/^terms\[0\]\./, ''),
  );
  const out = { re: 0, im: 0 };
  return {
    psi: req.points.map(([x, y, z]) => (evaluatePsi(state, x, y, z, out), [out.re, out.im])),
  };
};

export default evalCommand;
