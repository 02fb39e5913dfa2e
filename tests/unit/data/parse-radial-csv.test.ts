// The radial CSV parser: header forms, units converted to atomic units, and line-numbered problems.
// Constants: CODATA 2022 a0 = 52.9177210544 pm and E_h = 27.211386245981 eV (/work/shared/REFERENCE.md,
// "Bohr radius" and "Hartree energy in eV" rows; SciPy 1.17.1 scipy.constants).
import { describe, expect, it } from 'vitest';
import {
  MAX_ROWS,
  parseRadialCsv,
  RadialCsvError,
  type RadialCsvProblem,
} from '../../../shared/data/parse-radial-csv';

const A0_PM = 52.9177210544;
const EH_EV = 27.211386245981;

function problemsOf(text: string, options = {}): RadialCsvProblem[] {
  try {
    parseRadialCsv(text, options);
  } catch (err) {
    if (err instanceof RadialCsvError) return err.problems;
    throw err;
  }
  throw new Error('expected the CSV to be refused');
}

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

describe('header forms and units', () => {
  it('when the header states bohr, then values are kept as written', () => {
    const d = parseRadialCsv(
      'r_bohr,R_bohr^-3/2\n0,2\n1,0.7357588823428847\n2,0.2706705664732254\n',
    );
    expect(d).toEqual({
      quantity: 'R',
      rUnit: 'bohr',
      valueUnit: 'bohr^-3/2',
      r: [0, 1, 2],
      values: [2, 0.7357588823428847, 0.2706705664732254],
    });
  });

  it('when R(1s) is tabulated in pm and pm^-3/2, then it becomes 2e^(-r) in bohr (R_10 of REFERENCE.md, Z = 1) within 1e-14', () => {
    const rowsPm = [0, 10, 52.9177210544, 100, 250];
    const csv = [
      '# hydrogen 1s',
      'r / pm, R / pm^-3/2',
      ...rowsPm.map((r) => `${r},${(2 * Math.exp(-r / A0_PM)) / Math.pow(A0_PM, 1.5)}`),
    ].join('\r\n');
    const d = parseRadialCsv(csv);
    expect(d.rUnit).toBe('pm');
    expect(d.valueUnit).toBe('pm^-3/2');
    d.r.forEach((r, i) => {
      expect(rel(r, rowsPm[i] / A0_PM) || 0).toBeLessThan(1e-15);
      expect(rel(d.values[i], 2 * Math.exp(-r))).toBeLessThan(1e-14);
    });
    expect(d.r[2]).toBeCloseTo(1, 15);
  });

  it('when r²R² is in angstrom^-1 and V in eV, then they convert to bohr^-1 and hartree', () => {
    const dist = parseRadialCsv('r (Å),r2R2 (Å^-1)\n0,0\n0.529177210544,1\n1,0.5\n');
    expect(dist.quantity).toBe('r2R2');
    expect(rel(dist.r[1], 1)).toBeLessThan(1e-15);
    expect(rel(dist.values[1], 0.529177210544)).toBeLessThan(1e-15);
    const pot = parseRadialCsv(
      'r [bohr], V [eV]\n0.5,-54.422772491962\n1,-27.211386245981\n2,-13.6056931229905\n',
    );
    expect(pot).toMatchObject({ quantity: 'potential', valueUnit: 'eV' });
    expect(pot.values.map((v) => v * EH_EV)).toEqual([
      -54.422772491962, -27.211386245981, -13.6056931229905,
    ]);
    expect(rel(pot.values[1], -1)).toBeLessThan(1e-15);
  });

  it('when the header names no units, then the chosen ones are used; when it does, a different choice is refused', () => {
    const d = parseRadialCsv('r,r^2R^2\n0,0\n1,0.5\n2,0.25\n', { rUnit: 'pm', valueUnit: 'pm^-1' });
    expect(d.r[1]).toBe(1 / A0_PM);
    expect(problemsOf('r,R\n0,1\n1,2\n2,3\n')).toEqual([
      {
        line: 1,
        field: 'rUnit',
        message:
          'the header gives no unit for r: write it there (e.g. "r / pm") or choose bohr, pm or angstrom',
      },
      {
        line: 1,
        field: 'valueUnit',
        message:
          'the header gives no unit for R: write it there or choose one of bohr^-3/2, pm^-3/2, angstrom^-3/2',
      },
    ]);
    expect(problemsOf('r_pm,V_eV\n0,1\n1,2\n2,3\n', { rUnit: 'bohr' })[0]).toMatchObject({
      line: 1,
      field: 'rUnit',
    });
    expect(problemsOf('r_pm,R_eV\n0,1\n1,2\n2,3\n')).toEqual([
      {
        line: 1,
        field: 'valueUnit',
        message: '"eV" is not a unit of R; use one of bohr^-3/2, pm^-3/2, angstrom^-3/2',
      },
    ]);
  });

  it('when the header does not name r and a known quantity, then line 1 says what is expected', () => {
    expect(problemsOf('x,y\n1,2\n')).toEqual([
      {
        line: 1,
        field: 'file',
        message:
          'the header must name two columns: r, then R, r2R2 or V, each with an optional unit (e.g. "r_bohr,R_bohr^-3/2" or "r / pm, V / eV"); got "x,y"',
      },
    ]);
    expect(problemsOf('')).toEqual([
      { line: null, field: 'file', message: expect.stringMatching(/^the file is empty/) },
    ]);
  });
});

describe('line-numbered problems', () => {
  it('when rows are broken, then each problem names its line (blank and # lines counted)', () => {
    const csv = [
      'r_bohr,R_bohr^-3/2',
      '0,1',
      '',
      '# comment',
      '1,NaN',
      '0.5,1',
      '-1,1',
      '2,3,4',
      '3,abc',
      '4',
      '5,0x1',
    ].join('\n');
    expect(problemsOf(csv)).toEqual([
      { line: 5, field: 'file', message: 'R "NaN" is not a finite decimal number' },
      { line: 6, field: 'file', message: 'r must increase from row to row, but 0.5 follows 1' },
      { line: 7, field: 'file', message: 'r must not be negative, got -1' },
      { line: 8, field: 'file', message: 'expected 2 values (r, R) separated by a comma, got 3' },
      { line: 9, field: 'file', message: 'R "abc" is not a finite decimal number' },
      { line: 10, field: 'file', message: 'expected 2 values (r, R) separated by a comma, got 1' },
      { line: 11, field: 'file', message: 'R "0x1" is not a finite decimal number' },
    ]);
  });

  it('when r²R² is negative, then the line is refused', () => {
    expect(problemsOf('r_bohr,r2R2_bohr^-1\n0,0\n1,-0.1\n2,0\n')).toEqual([
      {
        line: 3,
        field: 'file',
        message: 'r²R² is a probability density and cannot be negative, got -0.1',
      },
    ]);
  });

  it('when there are too few or too many rows, then the count and the limit are named', () => {
    expect(problemsOf('r_bohr,R_bohr^-3/2\n0,1\n1,2\n')).toEqual([
      {
        line: null,
        field: 'file',
        message: 'the file has 2 data rows; at least 3 are needed to draw a curve',
      },
    ]);
    const rows = Array.from({ length: MAX_ROWS + 5 }, (_, i) => `${i},1`);
    expect(problemsOf(['r_bohr,R_bohr^-3/2', ...rows].join('\n'))).toEqual([
      {
        line: MAX_ROWS + 2,
        field: 'file',
        message: `more than ${MAX_ROWS} data rows; split the data or thin it out`,
      },
    ]);
    expect(
      parseRadialCsv(['r_bohr,R_bohr^-3/2', ...rows.slice(0, MAX_ROWS)].join('\n')).r,
    ).toHaveLength(MAX_ROWS);
  });

  it('when the error is thrown, then its message lists the lines', () => {
    expect(() => parseRadialCsv('r_bohr,V_hartree\n0,1\n0,2\n1,3\n')).toThrow(
      'line 3: r must increase from row to row, but 0 follows 0',
    );
  });
});
