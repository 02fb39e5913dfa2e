// Numbers the composer shows beside the preview, computed by shared/physics for the state in the
// spec: per term its name, energy, radial and angular node counts, ⟨r⟩ and most probable radius,
// and for a superposition the weights after normalisation and the mean energy Σ|c|²E_n.
import { lengthUnit } from '../../../../shared/figures/length-units';
import { systemMassRatio } from '../../../../shared/figures/figure-system';
import { energyLevel, energyLevelEv } from '../../../../shared/physics/energy-levels';
import { mostProbableRadius } from '../../../../shared/physics/most-probable-radius';
import { orbitalLabel, type OrbitalLabel } from '../../../../shared/physics/orbital-labels';
import { radialExpectationValues } from '../../../../shared/physics/radial-expectation';
import type { FigureSpec } from '../../../../shared/spec/figure-spec';

export interface TermFacts {
  label: OrbitalLabel;
  /** |c|² after normalisation. */
  share: number;
  energyHartree: number;
  energyEv: number;
  radialNodes: number;
  angularNodes: number;
  /** ⟨r⟩ and the most probable radius, in the spec's length unit. */
  meanRadius: number;
  mostProbableRadius: number;
}

export interface StateFacts {
  unit: string;
  terms: TermFacts[];
  /** Σ|c|²E_n in eV; equals the energy of the one term for a single orbital. */
  meanEnergyEv: number;
  /** True when the terms do not all share one n: the state is not stationary. */
  mixesEnergies: boolean;
}

export function stateFacts(spec: Pick<FigureSpec, 'system' | 'state'>): StateFacts {
  const { Z } = spec.system;
  const mu = systemMassRatio(spec);
  const unit = lengthUnit(spec.system.lengthUnit);
  const total = spec.state.terms.reduce((s, t) => s + t.weight.re ** 2 + t.weight.im ** 2, 0);
  const terms = spec.state.terms.map((t): TermFacts => ({
    label: orbitalLabel(t.n, t.l, t.m, t.basis),
    share: (t.weight.re ** 2 + t.weight.im ** 2) / total,
    energyHartree: energyLevel(t.n, Z, mu),
    energyEv: energyLevelEv(t.n, Z, mu),
    radialNodes: t.n - t.l - 1,
    angularNodes: t.l,
    meanRadius: radialExpectationValues(t.n, t.l, Z, mu).r * unit.perBohr,
    mostProbableRadius: mostProbableRadius(t.n, t.l, Z, mu) * unit.perBohr,
  }));
  return {
    unit: unit.symbol,
    terms,
    meanEnergyEv: terms.reduce((s, t) => s + t.share * t.energyEv, 0),
    mixesEnergies: new Set(spec.state.terms.map((t) => t.n)).size > 1,
  };
}
