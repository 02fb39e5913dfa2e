// Bad potentials, parameters and requests: every error is an OrbitalInputError naming the field.
import { describe, expect, it } from 'vitest';
import { OrbitalInputError } from '../../../shared/physics/orbital-input-error';
import { buildPotential } from '../../../shared/solver/potentials/build-potential';
import { MAX_LEVELS, solveRadial } from '../../../shared/solver/solve-radial';
import { solveRadialSeries } from '../../../shared/solver/solve-radial-series';

function fieldOf(run: () => unknown): string {
  try {
    run();
  } catch (err) {
    expect(err).toBeInstanceOf(OrbitalInputError);
    return (err as OrbitalInputError).field;
  }
  throw new Error('expected an error');
}

describe('potential parameters', () => {
  it('when a radius is negative or zero, then the radius field is named', () => {
    expect(fieldOf(() => buildPotential({ type: 'infinite-well', radius: -1 }))).toBe('potential.radius');
    expect(fieldOf(() => buildPotential({ type: 'finite-well', depth: 1, radius: 0 }))).toBe('potential.radius');
    expect(fieldOf(() => buildPotential({ type: 'finite-nucleus', Z: 1, radius: -1e-5 }))).toBe('potential.radius');
  });

  it('when a parameter is NaN, infinite, missing, of the wrong type or unknown, then it is named', () => {
    expect(fieldOf(() => buildPotential({ type: 'yukawa', Z: 1, lambda: Number.NaN }))).toBe('potential.lambda');
    expect(fieldOf(() => buildPotential({ type: 'harmonic-oscillator', omega: Infinity }))).toBe('potential.omega');
    expect(fieldOf(() => buildPotential({ type: 'hulthen', Z: 1 }))).toBe('potential.delta');
    expect(fieldOf(() => buildPotential({ type: 'coulomb', Z: '1' }))).toBe('potential.Z');
    expect(fieldOf(() => buildPotential({ type: 'coulomb', Z: 1, mass: 2 }))).toBe('potential.mass');
    expect(fieldOf(() => buildPotential({ type: 'coulomb', Z: 200 }))).toBe('potential.Z');
    expect(fieldOf(() => buildPotential({ type: 'yukawa', Z: 1, lambda: -0.1 }))).toBe('potential.lambda');
    expect(fieldOf(() => buildPotential({ type: 'valence-gsz', Z: 11, electrons: 12, H: 1, d: 1 }))).toBe('potential.electrons');
  });

  it('when the type is unknown or the potential is not an object, then the message lists the kinds', () => {
    expect(() => buildPotential({ type: 'morse' })).toThrow(/^potential\.type: unknown potential type "morse"; expected one of: coulomb, yukawa/);
    expect(fieldOf(() => buildPotential(null))).toBe('potential');
  });

  it('when a potential is built, then it carries its formula with units', () => {
    const p = buildPotential({ type: 'yukawa', Z: 1, lambda: 0.1 });
    expect(p.formula).toContain('hartree');
    expect(p.label).toBe('Screened Coulomb (Yukawa), Z = 1, λ = 0.1 bohr⁻¹');
    expect(p.evaluate(1)).toBeCloseTo(-Math.exp(-0.1), 15);
  });
});

describe('solve requests', () => {
  const coulomb = buildPotential({ type: 'coulomb', Z: 1 });

  it('when l or levels are out of range or not integers, then they are named', () => {
    expect(fieldOf(() => solveRadial({ potential: coulomb, l: -1, levels: 1 }))).toBe('l');
    expect(fieldOf(() => solveRadial({ potential: coulomb, l: 0.5, levels: 1 }))).toBe('l');
    expect(fieldOf(() => solveRadial({ potential: coulomb, l: 0, levels: 0 }))).toBe('levels');
    expect(fieldOf(() => solveRadial({ potential: coulomb, l: 0, levels: MAX_LEVELS + 1 }))).toBe('levels');
    expect(fieldOf(() => solveRadial({ potential: coulomb, l: 0, levels: 1, muRatio: 2 }))).toBe('muRatio');
    expect(fieldOf(() => solveRadial({ potential: coulomb, l: 0, levels: 1, step: 0 }))).toBe('step');
  });

  it('when a well with √(2V₀)·a = 2 (between π/2 and π) binds one s and no p level, then the refusal names l and the level', () => {
    const well = buildPotential({ type: 'finite-well', depth: 2, radius: 1 });
    expect(() => solveRadial({ potential: well, l: 1, levels: 1 })).toThrow(/^l: the potential binds no level with l = 1$/);
    expect(() => solveRadial({ potential: well, l: 0, levels: 2 })).toThrow(
      /^levels: the potential binds only 1 level with l = 0; level n = 2, l = 0 \(1 radial nodes\) is not bound$/,
    );
  });

  it('when thirty Coulomb s levels are asked, then they are all found (the grid grows to fit them)', () => {
    const sol = solveRadial({ potential: coulomb, l: 0, levels: MAX_LEVELS });
    expect(sol.levels[MAX_LEVELS - 1].energy).toBeCloseTo(-0.5 / 900, 9);
  });
});

describe('solveRadialSeries', () => {
  const hulthen = buildPotential({ type: 'hulthen', Z: 1, delta: 0.1 });

  it('when several l are asked, then one solution per l comes back in order (Hulthén 1s, 2s exact: REFERENCE.md §10.4)', () => {
    const series = solveRadialSeries({ potential: hulthen, l: [1, 0], levels: 2 });
    expect(series.map((s) => s.l)).toEqual([1, 0]);
    expect(series[1].levels[1].energy).toBeCloseTo(-0.08, 10);
  });

  it('when an l is repeated, unbound or the list is empty, then the position is named', () => {
    expect(fieldOf(() => solveRadialSeries({ potential: hulthen, l: [0, 0], levels: 1 }))).toBe('l[1]');
    expect(fieldOf(() => solveRadialSeries({ potential: hulthen, l: [0, 9], levels: 1 }))).toBe('l[1]');
    expect(fieldOf(() => solveRadialSeries({ potential: hulthen, l: [], levels: 1 }))).toBe('l');
  });
});
