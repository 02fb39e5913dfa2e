// `scripts/lobewright props`: derived quantities of the (n, l) level of a hydrogen-like ion.
// Request: { "Z", "n", "l", "reducedMass"?: boolean }.
// Answer: { "energy": { "hartree", "eV" }, "radialNodes": [bohr …], "angularNodes": l, "rMostProbable": bohr,
//           "expectation": { "r", "r2", "invR", "invR2", "invR3" } } (atomic units; invR3 is null for l = 0,
//           where the integral diverges).
import { z } from 'zod';
import { energyLevel } from '../../../shared/physics/energy-levels';
import { radialNodes } from '../../../shared/physics/radial-nodes';
import { mostProbableRadius } from '../../../shared/physics/most-probable-radius';
import { radialExpectationValues } from '../../../shared/physics/radial-expectation';
import { hartreeToEv } from '../../../shared/physics/units';
import type { CliCommand } from '../cli-error';
import { massRatioFor, parseRequest, reducedMassField, withPhysicsErrors } from './physics-request';

const schema = z.strictObject({
  Z: z.number(),
  n: z.number(),
  l: z.number(),
  reducedMass: reducedMassField,
});

const props: CliCommand = (input) => {
  const req = parseRequest(schema, input, 'props');
  const mu = massRatioFor(req.Z, req.reducedMass);
  return withPhysicsErrors(() => {
    const e = radialExpectationValues(req.n, req.l, req.Z, mu);
    const hartree = energyLevel(req.n, req.Z, mu);
    return {
      energy: { hartree, eV: hartreeToEv(hartree) },
      radialNodes: radialNodes(req.n, req.l, req.Z, mu),
      angularNodes: req.l,
      rMostProbable: mostProbableRadius(req.n, req.l, req.Z, mu),
      expectation: {
        r: e.r,
        r2: e.r2,
        invR: e.invR,
        invR2: e.invR2,
        invR3: Number.isFinite(e.invR3) ? e.invR3 : null,
      },
    };
  });
};

export default props;
