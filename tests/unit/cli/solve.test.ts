// scripts/lobewright solve as a user runs it: one JSON request in, one JSON answer out. Values:
// hydrogen −1/(2n²) (REFERENCE.md §2), Hulthén s levels −½(1/n − nδ/2)² (REFERENCE.md §10.4),
// Yukawa 1s at λ = 1 (REFERENCE.md §12 item 6, computed there: −0.01028579).
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { HARTREE_EV } from '../../../shared/physics/constants';
import { expectClose } from '../physics/close-to';

const tool = fileURLToPath(new URL('../../../scripts/lobewright', import.meta.url));

// eslint-disable-next-line @typescript-eslint/no-explicit-any -- answers are untyped JSON checked field by field
function run(request: unknown): { status: number | null; answer: any } {
  const child = spawnSync(tool, ['solve'], { input: JSON.stringify(request), encoding: 'utf8' });
  return { status: child.status, answer: JSON.parse(child.stdout) };
}

describe('scripts/lobewright solve', () => {
  it('when three Yukawa s levels are asked, then each has n, l, nodes, energy in hartree and eV, error and ⟨r⟩', () => {
    const { status, answer } = run({ potential: { type: 'yukawa', Z: 1, lambda: 1 }, l: 0, levels: 1 });
    expect(status).toBe(0);
    expect(answer.levels).toHaveLength(1);
    const [level] = answer.levels;
    expect(level).toMatchObject({ n: 1, l: 0, nodes: 0 });
    expectClose(level.energy.hartree, -0.01028579, { abs: 1e-8 });
    expectClose(level.energy.eV, level.energy.hartree * HARTREE_EV, { rel: 1e-15 });
    expect(level.error).toBeLessThan(1e-10);
    expect(level.rMean).toBeGreaterThan(1);
    expect(typeof answer.ms).toBe('number');
    expect(answer.potential.formula).toContain('e^(−λr)');
  });

  it('when l is a list, then levels of every l come back with the hydrogen comparison', () => {
    const { answer } = run({ potential: { type: 'coulomb', Z: 1 }, l: [0, 1], levels: 2 });
    expect(answer.levels.map((v: { n: number; l: number }) => [v.n, v.l])).toEqual([[1, 0], [2, 0], [2, 1], [3, 1]]);
    for (const level of answer.levels) {
      expectClose(level.energy.hartree, -0.5 / level.n ** 2, { abs: 1e-10 }, level);
      expectClose(level.hydrogen.shift, 0, { abs: 1e-10 }, level);
    }
  });

  it('when a tabulated potential comes as "csv" text, then its levels are solved', () => {
    const rows = ['r_bohr,V_hartree'];
    for (let i = 0; i < 1500; i++) {
      const r = 1e-5 * Math.exp((i * Math.log(1.5e7)) / 1499);
      rows.push(`${r},${(-0.1 * Math.exp(-0.1 * r)) / -Math.expm1(-0.1 * r)}`);
    }
    const { status, answer } = run({ potential: { type: 'tabulated' }, csv: rows.join('\n'), l: 0, levels: 2 });
    expect(status).toBe(0);
    expectClose(answer.levels[0].energy.hartree, -0.5 * (1 - 0.05) ** 2, { abs: 1e-8 });
    expectClose(answer.levels[1].energy.hartree, -0.5 * (0.5 - 0.1) ** 2, { abs: 1e-8 });
  });

  it('when a field is bad, then the answer names it and the exit status is non-zero', () => {
    const cases: [unknown, string][] = [
      [{ potential: { type: 'yukawa', Z: 1, lambda: -1 }, l: 0, levels: 1 }, 'potential.lambda'],
      [{ potential: { type: 'infinite-well', radius: -2 }, l: 0, levels: 1 }, 'potential.radius'],
      [{ potential: { type: 'morse' }, l: 0, levels: 1 }, 'potential.type'],
      [{ potential: { type: 'coulomb', Z: 1 }, l: 0, levels: 0 }, 'levels'],
      [{ potential: { type: 'coulomb', Z: 1 }, l: -1, levels: 1 }, 'l'],
      [{ potential: { type: 'coulomb', Z: 1 }, l: 0, levels: 1, colour: 'red' }, 'colour'],
      [{ potential: { type: 'yukawa', Z: 1, lambda: 2 }, l: 0, levels: 1 }, 'l'],
      [{ potential: { type: 'hulthen', Z: 1, delta: 0.4 }, l: [1, 0], levels: 3 }, 'l[0]'],
      [{ potential: { type: 'tabulated' }, csv: 'r_bohr,V_hartree\n1,2\n2,x\n3,4\n4,5', l: 0, levels: 1 }, 'csv'],
      [{ potential: { type: 'coulomb', Z: 1 }, csv: 'r_bohr,V_hartree', l: 0, levels: 1 }, 'csv'],
    ];
    for (const [request, field] of cases) {
      const { status, answer } = run(request);
      expect(status, JSON.stringify(request)).not.toBe(0);
      expect(answer.error.field, JSON.stringify(request)).toBe(field);
    }
    expect(run(cases[8][0]).answer.error.message).toMatch(/^line 3: V "x" is not a finite number/);
  });
});
