/**
 * Reduced-mass correction: μ/m_e = M/(M + 1) for a nucleus of mass M (in electron masses).
 * Lengths then scale by a_μ = a0·m_e/μ and energies by μ/m_e (textbook; REFERENCE.md §1).
 *
 * `reducedMass: true` means the usual nucleus for the charge: ¹H (proton) for Z = 1, ⁴He (alpha
 * particle) for Z = 2. For heavier ions the nuclear mass must be given explicitly, because
 * Lobewright carries no table of isotope masses; asking with `true` throws OrbitalInputError.
 */
import {
  ALPHA_PARTICLE_ELECTRON_MASS_RATIO,
  DEUTERON_ELECTRON_MASS_RATIO,
  PROTON_ELECTRON_MASS_RATIO,
} from './constants';
import { OrbitalInputError } from './orbital-input-error';

export type ReducedMassOption = boolean | { nuclearMassInElectronMasses: number } | undefined;

/** Nuclear masses in electron masses (CODATA 2022, see ./constants). */
export const NUCLEAR_MASSES = {
  hydrogen1: PROTON_ELECTRON_MASS_RATIO,
  hydrogen2: DEUTERON_ELECTRON_MASS_RATIO,
  helium4: ALPHA_PARTICLE_ELECTRON_MASS_RATIO,
} as const;

export function massRatioForNucleus(
  nuclearMassInElectronMasses: number,
  field = 'reducedMass.nuclearMassInElectronMasses',
): number {
  const M = nuclearMassInElectronMasses;
  if (typeof M !== 'number' || !Number.isFinite(M) || M <= 0) {
    throw new OrbitalInputError(
      field,
      `nuclear mass must be a positive number of electron masses, got ${String(M)}`,
    );
  }
  return M / (M + 1);
}

/** μ/m_e for the given nuclear charge and option (1 when the option is off or absent). */
export function reducedMassRatio(
  Z: number,
  option: ReducedMassOption,
  field = 'reducedMass',
): number {
  if (option === undefined || option === false) return 1;
  if (option === true) {
    if (Z === 1) return massRatioForNucleus(NUCLEAR_MASSES.hydrogen1);
    if (Z === 2) return massRatioForNucleus(NUCLEAR_MASSES.helium4);
    throw new OrbitalInputError(
      field,
      `for Z = ${Z} give { nuclearMassInElectronMasses } instead of true (only ¹H and ⁴He are built in)`,
    );
  }
  if (typeof option === 'object' && option !== null) {
    return massRatioForNucleus(
      option.nuclearMassInElectronMasses,
      `${field}.nuclearMassInElectronMasses`,
    );
  }
  throw new OrbitalInputError(field, 'must be true, false or { nuclearMassInElectronMasses }');
}
