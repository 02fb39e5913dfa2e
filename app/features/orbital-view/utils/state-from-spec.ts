// The orbital state a figure spec describes, in the form shared/physics compileState takes.
import type { FigureSpec } from '../../../../shared/spec/figure-spec';
import type { OrbitalState } from '../../../../shared/physics/orbital-state';
import { NUCLEAR_MASSES, type ReducedMassOption } from '../../../../shared/physics/reduced-mass';

const NAMED_NUCLEI: Record<string, number> = {
  'H-1': NUCLEAR_MASSES.hydrogen1,
  'H-2': NUCLEAR_MASSES.hydrogen2,
  'He-4': NUCLEAR_MASSES.helium4,
};

export function stateFromSpec(spec: Pick<FigureSpec, 'system' | 'state'>): OrbitalState {
  const nucleus = spec.system.nucleus;
  let reducedMass: ReducedMassOption;
  if (nucleus === 'infinite') reducedMass = false;
  else if (typeof nucleus === 'string')
    reducedMass = { nuclearMassInElectronMasses: NAMED_NUCLEI[nucleus] };
  else reducedMass = { nuclearMassInElectronMasses: nucleus.massInElectronMasses };
  return {
    Z: spec.system.Z,
    reducedMass,
    time: spec.state.time,
    terms: spec.state.terms.map((t) => ({
      n: t.n,
      l: t.l,
      m: t.m,
      basis: t.basis,
      weight: { ...t.weight },
    })),
  };
}
