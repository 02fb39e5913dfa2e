// `scripts/lobewright ylm`: spherical harmonics at given directions.
// Request: { "l", "m", "basis"?: "complex" | "real" (default "complex"), "angles": [[θ, φ], …] (radians;
//            θ polar from +z, φ azimuth from +x), "reducedMass"?: boolean (accepted, no effect on angles) }.
// Answer: { "Y": [[re, im], …] }; real harmonics have im = 0.
import { z } from 'zod';
import { sphericalHarmonic } from '../../../shared/physics/spherical-harmonic';
import { realSphericalHarmonic } from '../../../shared/physics/real-spherical-harmonic';
import type { CliCommand } from '../cli-error';
import {
  MAX_REQUEST_POINTS,
  finite,
  parseRequest,
  reducedMassField,
  withPhysicsErrors,
} from './physics-request';

const schema = z.strictObject({
  l: z.number(),
  m: z.number(),
  basis: z.enum(['real', 'complex']).default('complex'),
  angles: z
    .array(z.tuple([finite, finite]))
    .min(1)
    .max(MAX_REQUEST_POINTS),
  reducedMass: reducedMassField,
});

const ylm: CliCommand = (input) => {
  const req = parseRequest(schema, input, 'ylm');
  const out = { re: 0, im: 0 };
  return withPhysicsErrors(() => ({
    Y: req.angles.map(([theta, phi]) => {
      if (req.basis === 'real') return [realSphericalHarmonic(req.l, req.m, theta, phi), 0];
      sphericalHarmonic(req.l, req.m, theta, phi, out);
      return [out.re, out.im];
    }),
  }));
};

export default ylm;
