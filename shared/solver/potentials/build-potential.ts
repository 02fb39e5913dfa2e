/**
 * One entry point from a JSON description { "type": …, parameters } to a Potential, with errors
 * naming the field ("potential.type", "potential.lambda", "potential.csv"). The kinds and their
 * parameters are listed in POTENTIAL_TYPES.
 */
import { OrbitalInputError } from '../../physics/orbital-input-error';
import type { Potential } from '../potential';
import { coreScreenedCoulombPotential } from './core-screened-coulomb';
import { coulombPotential } from './coulomb';
import { finiteNucleusPotential } from './finite-nucleus';
import { finiteWellPotential } from './finite-well';
import { harmonicOscillatorPotential } from './harmonic-oscillator';
import { hulthenPotential } from './hulthen';
import { infiniteWellPotential } from './infinite-well';
import { linearPotential } from './linear';
import { tabulatedPotential } from './tabulated';
import { valenceGszPotential } from './valence-gsz';
import { yukawaPotential } from './yukawa';

export const POTENTIAL_TYPES = {
  coulomb: coulombPotential,
  yukawa: yukawaPotential,
  'finite-nucleus': finiteNucleusPotential,
  'harmonic-oscillator': harmonicOscillatorPotential,
  'finite-well': finiteWellPotential,
  'infinite-well': infiniteWellPotential,
  linear: linearPotential,
  hulthen: hulthenPotential,
  'core-screened': coreScreenedCoulombPotential,
  'valence-gsz': valenceGszPotential,
  tabulated: tabulatedPotential,
} satisfies Record<string, (input: unknown, field?: string) => Potential>;

export type PotentialType = keyof typeof POTENTIAL_TYPES;

export function buildPotential(input: unknown, field = 'potential'): Potential {
  if (typeof input !== 'object' || input === null || Array.isArray(input))
    throw new OrbitalInputError(field, 'must be an object with a "type" and its parameters');
  const type = (input as { type?: unknown }).type;
  if (typeof type !== 'string' || !(type in POTENTIAL_TYPES)) {
    throw new OrbitalInputError(
      `${field}.type`,
      `unknown potential type ${JSON.stringify(type ?? null)}; expected one of: ${Object.keys(POTENTIAL_TYPES).join(', ')}`,
    );
  }
  return POTENTIAL_TYPES[type as PotentialType](input, field);
}
