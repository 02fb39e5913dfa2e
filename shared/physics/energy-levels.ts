/**
 * Non-relativistic energy levels of a hydrogen-like ion, in hartree and eV.
 *
 * Source: Bethe & Salpeter (1957) §2; REFERENCE.md §2:
 *   E_n = −(μ/m_e) Z² E_h / (2n²), independent of l and m; degeneracy n² (2n² with spin).
 * Fine structure, Lamb shift and hyperfine structure are not included (≈ α²/n relative).
 * CODATA 2022 E_h (./constants). Bad n, Z or μ throw OrbitalInputError.
 */
import { HARTREE_EV } from './constants';
import { checkMassRatio, checkNuclearCharge, checkPrincipal } from './quantum-numbers';

export interface EnergyLevel {
  n: number;
  hartree: number;
  eV: number;
  /** Orbital degeneracy n² (without spin). */
  degeneracy: number;
}

/** E_n in hartree for validated inputs; muZ2 = (μ/m_e)·Z². */
export function energyValue(n: number, muZ2: number): number {
  return -muZ2 / (2 * n * n);
}

export function energyLevel(n: number, Z = 1, muRatio = 1): number {
  const nn = checkPrincipal(n);
  const z = checkNuclearCharge(Z);
  return energyValue(nn, z * z * checkMassRatio(muRatio));
}

export function energyLevelEv(n: number, Z = 1, muRatio = 1): number {
  return energyLevel(n, Z, muRatio) * HARTREE_EV;
}

/** Levels n = 1 … nMax. */
export function energyLevels(nMax: number, Z = 1, muRatio = 1): EnergyLevel[] {
  const top = checkPrincipal(nMax, 'nMax');
  const levels: EnergyLevel[] = [];
  for (let n = 1; n <= top; n++) {
    const hartree = energyLevel(n, Z, muRatio);
    levels.push({ n, hartree, eV: hartree * HARTREE_EV, degeneracy: n * n });
  }
  return levels;
}
