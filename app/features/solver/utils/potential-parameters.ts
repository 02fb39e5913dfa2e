// The potential types as the picker offers them: a plain name, the formula with units, and each
// parameter with its unit, the limits the picker allows (inside what shared/solver accepts) and a
// starting value. Formulas and units: the headers of shared/solver/potentials/*.ts.
import type { PotentialSpec } from '../../../../shared/spec/figure-spec';

export type PotentialType = PotentialSpec['type'];

export interface ParameterInfo {
  key: string;
  label: string;
  unit: string;
  min: number;
  max: number;
  step: number;
  integer?: boolean;
}

export interface PotentialTypeInfo {
  name: string;
  formula: string;
  parameters: ParameterInfo[];
  initial: PotentialSpec;
}

const Z: ParameterInfo = {
  key: 'Z',
  label: 'Nuclear charge Z',
  unit: 'e',
  min: 0.1,
  max: 92,
  step: 0.1,
};
const radius = (label: string): ParameterInfo => ({
  key: 'radius',
  label,
  unit: 'bohr',
  min: 0.001,
  max: 1000,
  step: 0.1,
});

/** A small Coulomb table (−1/r, 8 points) so that "Tabulated" starts from something that binds. */
const SAMPLE_CSV = [
  'r_bohr,V_hartree',
  ...[0.05, 0.1, 0.25, 0.5, 1, 2, 5, 10].map((r) => `${r},${-1 / r}`),
].join('\n');

export const POTENTIAL_TYPE_INFO: Record<PotentialType, PotentialTypeInfo> = {
  coulomb: {
    name: 'Coulomb (hydrogen-like)',
    formula: 'V(r) = −Z/r',
    parameters: [Z],
    initial: { type: 'coulomb', Z: 1 },
  },
  yukawa: {
    name: 'Screened Coulomb (Yukawa)',
    formula: 'V(r) = −Z e^(−λr)/r',
    parameters: [
      Z,
      { key: 'lambda', label: 'Screening λ', unit: 'bohr⁻¹', min: 0, max: 10, step: 0.01 },
    ],
    initial: { type: 'yukawa', Z: 1, lambda: 0.1 },
  },
  'finite-nucleus': {
    name: 'Uniformly charged nucleus',
    formula: 'V(r) = −Z(3 − r²/R²)/(2R) inside R, −Z/r outside',
    parameters: [Z, radius('Nuclear radius R')],
    initial: { type: 'finite-nucleus', Z: 1, radius: 0.01 },
  },
  'harmonic-oscillator': {
    name: 'Harmonic oscillator',
    formula: 'V(r) = ½ ω² r²',
    parameters: [
      { key: 'omega', label: 'Frequency ω', unit: 'hartree/ħ', min: 0.001, max: 100, step: 0.1 },
    ],
    initial: { type: 'harmonic-oscillator', omega: 1 },
  },
  'finite-well': {
    name: 'Finite spherical well',
    formula: 'V(r) = −V₀ for r < a, 0 outside',
    parameters: [
      { key: 'depth', label: 'Depth V₀', unit: 'hartree', min: 0.001, max: 1000, step: 0.1 },
      radius('Radius a'),
    ],
    initial: { type: 'finite-well', depth: 1, radius: 3 },
  },
  'infinite-well': {
    name: 'Infinite spherical well',
    formula: 'V(r) = 0 for r < R, hard wall at R',
    parameters: [radius('Radius R')],
    initial: { type: 'infinite-well', radius: 1 },
  },
  linear: {
    name: 'Linear (confining)',
    formula: 'V(r) = F r',
    parameters: [
      { key: 'F', label: 'Slope F', unit: 'hartree/bohr', min: 0.001, max: 100, step: 0.1 },
    ],
    initial: { type: 'linear', F: 1 },
  },
  hulthen: {
    name: 'Hulthén',
    formula: 'V(r) = −Z δ e^(−δr)/(1 − e^(−δr))',
    parameters: [
      Z,
      { key: 'delta', label: 'Screening δ', unit: 'bohr⁻¹', min: 0.001, max: 10, step: 0.01 },
    ],
    initial: { type: 'hulthen', Z: 1, delta: 0.2 },
  },
  'core-screened': {
    name: 'Screened core (one valence electron)',
    formula: 'V(r) = −[1 + (Z − 1) e^(−r/a)]/r',
    parameters: [
      { ...Z, min: 1 },
      { key: 'a', label: 'Core size a', unit: 'bohr', min: 0.001, max: 100, step: 0.05 },
    ],
    initial: { type: 'core-screened', Z: 3, a: 0.5 },
  },
  'valence-gsz': {
    name: 'Green–Sellin–Zachor model',
    formula: 'V(r) = −[(Z − N + 1) + (N − 1)/(H(e^(r/d) − 1) + 1)]/r',
    parameters: [
      Z,
      { key: 'electrons', label: 'Electrons N', unit: '', min: 1, max: 92, step: 1, integer: true },
      { key: 'H', label: 'Shape H', unit: '', min: 0.001, max: 100, step: 0.1 },
      { key: 'd', label: 'Size d', unit: 'bohr', min: 0.001, max: 100, step: 0.05 },
    ],
    // Example values, not fitted to an atom.
    initial: { type: 'valence-gsz', Z: 11, electrons: 11, H: 3, d: 0.5 },
  },
  tabulated: {
    name: 'Tabulated (CSV)',
    formula: 'V(r) from a table, cubic spline between points',
    parameters: [
      {
        key: 'asymptoticCharge',
        label: 'Charge of the −Z∞/r tail (0 for none)',
        unit: 'e',
        min: 0,
        max: 92,
        step: 1,
      },
    ],
    initial: { type: 'tabulated', csv: SAMPLE_CSV, asymptoticCharge: 1 },
  },
};

export const POTENTIAL_TYPES = Object.keys(POTENTIAL_TYPE_INFO) as PotentialType[];

/** The parameter's value in a spec (0 for an unset optional one). */
export function parameterValue(spec: PotentialSpec, key: string): number {
  const v = (spec as Record<string, unknown>)[key];
  return typeof v === 'number' ? v : 0;
}
