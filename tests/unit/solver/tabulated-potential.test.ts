// Tabulated potentials from CSV: the parser's errors (line numbers, units, order, too few rows, NaN),
// the spline, the range rule, and levels of a tabulated −1/r against hydrogen's −1/(2n²)
// (REFERENCE.md §2). The table starts at r = 1e-5 bohr, where the solver's start u ∝ r misses the
// Coulomb factor (1 − r); measured 3.4e-10 hartree for 1s, so the tolerance is 1e-9.
import { describe, expect, it } from 'vitest';
import { ANGSTROM_PER_BOHR } from '../../../shared/physics/units';
import { HARTREE_EV } from '../../../shared/physics/constants';
import { naturalCubicSpline } from '../../../shared/solver/natural-cubic-spline';
import { parsePotentialCsv } from '../../../shared/solver/parse-potential-csv';
import { buildPotential } from '../../../shared/solver/potentials/build-potential';
import { solveRadial } from '../../../shared/solver/solve-radial';
import { expectClose } from '../physics/close-to';

function coulombTable(points: number, rFirst: number, rLast: number, header = 'r_bohr,V_hartree'): string {
  const rows = [header];
  for (let i = 0; i < points; i++) {
    const r = rFirst * Math.exp((i * Math.log(rLast / rFirst)) / (points - 1));
    rows.push(`${r},${-1 / r}`);
  }
  return rows.join('\n');
}

const errorOf = (run: () => unknown): { field: string; reason: string } => {
  try {
    run();
  } catch (err) {
    return err as { field: string; reason: string };
  }
  throw new Error('expected an error');
};

describe('parsePotentialCsv', () => {
  it('when the header says r_angstrom,V_eV, then values are converted with CODATA 2022 a0 and E_h', () => {
    const t = parsePotentialCsv('# comment\nr_angstrom,V_eV\n\n1,-2\n2,-1\n3,-0.5\n4,-0.25\n');
    expectClose(t.r[0], 1 / ANGSTROM_PER_BOHR, { rel: 1e-15 });
    expectClose(t.V[0], -2 / HARTREE_EV, { rel: 1e-15 });
    expect(t.units).toEqual({ r: 'angstrom', V: 'eV' });
  });

  it('when rows are bad, then the error names the field and the line', () => {
    const head = 'r_bohr,V_hartree\n';
    expect(errorOf(() => parsePotentialCsv(head + '1,2\n2,3\nx,4\n3,5\n4,6')).reason).toMatch(/^line 4: r "x" is not a finite number/);
    expect(errorOf(() => parsePotentialCsv(head + '1,2\n2,NaN\n3,5\n4,6')).reason).toMatch(/^line 3: V "NaN" is not a finite number/);
    expect(errorOf(() => parsePotentialCsv(head + '1,2\n3,3\n2,4\n4,6')).reason).toMatch(/^line 4: r must increase strictly/);
    expect(errorOf(() => parsePotentialCsv(head + '1,2\n2,3,4\n3,4\n4,6')).reason).toMatch(/^line 3: expected two values/);
    expect(errorOf(() => parsePotentialCsv(head + '-1,2\n2,3\n3,4\n4,6')).reason).toMatch(/^line 2: r must not be negative/);
    expect(errorOf(() => parsePotentialCsv(head + '1,2\n2,3\n3,4')).reason).toMatch(/has 3 data rows; at least 4/);
    expect(errorOf(() => parsePotentialCsv('radius,V\n1,2')).reason).toMatch(/^line 1: the header must name two columns with units/);
    expect(errorOf(() => parsePotentialCsv('r_furlong,V_eV\n1,2')).reason).toMatch(/unknown length unit "furlong"/);
    expect(errorOf(() => parsePotentialCsv('r_bohr,V_kcal\n1,2')).reason).toMatch(/unknown energy unit "kcal"/);
    expect(errorOf(() => parsePotentialCsv('')).reason).toMatch(/is empty/);
    const viaPotential = errorOf(() => buildPotential({ type: 'tabulated', csv: head + '1,2\n2,x\n3,4\n4,5' }));
    expect(viaPotential.field).toBe('potential.csv');
  });
});

describe('naturalCubicSpline', () => {
  it('when the data are a cubic with zero end curvature only in the limit, then interior values of a line are exact and ends have zero curvature', () => {
    const s = naturalCubicSpline([0, 1, 2, 3], [1, 3, 5, 7]);
    expectClose(s(1.5), 4, { abs: 1e-15 });
    expect(Number.isNaN(s(3.5))).toBe(true);
  });
});

describe('tabulated potential', () => {
  const csv = coulombTable(2000, 1e-5, 100);

  it('when −1/r is tabulated to 100 bohr with asymptoticCharge 1, then five s levels are hydrogen’s within 1e-9 hartree, the grid reaching past the table', () => {
    const sol = solveRadial({ potential: buildPotential({ type: 'tabulated', csv, asymptoticCharge: 1 }), l: 0, levels: 5 });
    for (const level of sol.levels) expectClose(level.energy, -0.5 / level.n ** 2, { abs: 1e-9 }, { n: level.n });
    expect(sol.grid.rMax).toBeGreaterThan(100);
  });

  it('when there is no tail, then the grid ends at the last radius and a level reaching it is refused', () => {
    const sol = solveRadial({ potential: buildPotential({ type: 'tabulated', csv }), l: 1, levels: 2 });
    expect(sol.grid.rMax).toBeCloseTo(100, 10);
    expectClose(sol.levels[1].energy, -0.5 / 9, { abs: 1e-9 });
    const e = errorOf(() => solveRadial({ potential: buildPotential({ type: 'tabulated', csv }), l: 0, levels: 6 }));
    expect(e.field).toBe('levels');
    expect(e.reason).toMatch(/has not died out by the last tabulated radius 100 bohr/);
  });

  it('when V is asked outside the table without a tail, then it is refused; with a tail, it is −Z/r', () => {
    const bare = buildPotential({ type: 'tabulated', csv });
    expect(() => bare.evaluate(200)).toThrow(/beyond the last tabulated radius/);
    expect(() => bare.evaluate(1e-6)).toThrow(/below the first tabulated radius/);
    expect(buildPotential({ type: 'tabulated', csv, asymptoticCharge: 1 }).evaluate(200)).toBe(-1 / 200);
  });

  it('when the tail charge does not continue the table, then asymptoticCharge is named', () => {
    const e = errorOf(() => buildPotential({ type: 'tabulated', csv, asymptoticCharge: 2 }));
    expect(e.field).toBe('potential.asymptoticCharge');
  });
});
