/**
 * The spec's system and state in the terms of shared/physics: the OrbitalState to compile, the
 * reduced-mass ratio μ/m_e for the chosen nucleus, and a plain description of the nucleus.
 * Nuclear masses: CODATA 2022 via shared/physics/reduced-mass (¹H proton, ²H deuteron, ⁴He alpha).
 */
import { massRatioForNucleus, NUCLEAR_MASSES } from '../physics/reduced-mass';
import type { OrbitalState } from '../physics/orbital-state';
import type { ResolvedFigureSpec } from '../spec/resolve-figure-spec';

type Nucleus = ResolvedFigureSpec['system']['nucleus'];

/** Nuclear mass in electron masses, or null for an infinitely heavy nucleus. */
export function nuclearMass(nucleus: Nucleus): number | null {
  if (nucleus === 'infinite') return null;
  if (nucleus === 'H-1') return NUCLEAR_MASSES.hydrogen1;
  if (nucleus === 'H-2') return NUCLEAR_MASSES.hydrogen2;
  if (nucleus === 'He-4') return NUCLEAR_MASSES.helium4;
  return nucleus.massInElectronMasses;
}

export function systemMassRatio(spec: Pick<ResolvedFigureSpec, 'system'>): number {
  const mass = nuclearMass(spec.system.nucleus);
  return mass === null ? 1 : massRatioForNucleus(mass, 'system.nucleus.massInElectronMasses');
}

export function orbitalStateOf(spec: Pick<ResolvedFigureSpec, 'system' | 'state'>): OrbitalState {
  const mass = nuclearMass(spec.system.nucleus);
  return {
    Z: spec.system.Z,
    reducedMass: mass === null ? false : { nuclearMassInElectronMasses: mass },
    terms: spec.state.terms.map((t) => ({
      n: t.n,
      l: t.l,
      m: t.m,
      basis: t.basis,
      weight: t.weight,
    })),
    time: spec.state.time,
  };
}

/** "hydrogen (¹H, reduced mass)", "Z = 3, infinite nuclear mass", … for titles and alt text. */
export function describeSystem(spec: Pick<ResolvedFigureSpec, 'system'>): string {
  const { Z, nucleus } = spec.system;
  const atom = Z === 1 ? 'hydrogen' : `hydrogen-like ion, Z = ${Z}`;
  if (nucleus === 'infinite') return `${atom}, infinite nuclear mass`;
  if (typeof nucleus === 'string') return `${atom}, reduced mass for ${nucleus}`;
  return `${atom}, nuclear mass ${nucleus.massInElectronMasses} mₑ`;
}
