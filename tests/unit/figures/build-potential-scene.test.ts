// Effective-potential figures print the solver's levels at their energies. Check values: REFERENCE.md
// §10.4 (Hulthén s levels E_n = −½(Z/n − nδ/2)², Hulthén 1942, from memory), §10.1 (oscillator
// E = (2n_r + l + 3/2)ω, textbook result), and the solver's own output for the Yukawa potential.
import { describe, expect, it } from 'vitest';
import { buildFigureScene } from '../../../shared/figures/build-figure-scene';
import { runsText, type FigureScene, type PathNode } from '../../../shared/figures/scene';
import { buildPotential } from '../../../shared/solver/potentials/build-potential';
import { solveRadial } from '../../../shared/solver/solve-radial';
import { figureSpecSchema, type FigureSpecInput } from '../../../shared/spec/figure-spec';
import { nodesWithRole, resolved, textsWithRole, tickValue } from './figure-test-helpers';

type PotentialKindInput = Extract<FigureSpecInput['kind'], { type: 'potential' }>;

function figure(
  kind: Omit<PotentialKindInput, 'type'>,
  lengthUnit: 'bohr' | 'pm' = 'bohr',
): FigureScene {
  return buildFigureScene(
    resolved({
      schemaVersion: 1,
      system: { Z: 1, nucleus: 'infinite', lengthUnit },
      state: { terms: [{ n: 1, l: 0, m: 0 }] },
      kind: { type: 'potential', ...kind },
      print: { widthMm: 140, heightMm: 100 },
    }),
  );
}

/** Printed number of a fact ("−0.405000 hartree" → −0.405). */
const printedValue = (printed: string): number =>
  Number(printed.split(' ')[0].replace('\u2212', '-'));

/** Energy at page y, from the first and last y ticks (tick marks for the position, labels for the value). */
function energyAtY(scene: FigureScene, y: number): number {
  const labels = textsWithRole(scene, 'y-tick-label').map(tickValue);
  const marks = (nodesWithRole(scene.children, 'y-tick') as PathNode[]).map((p) =>
    p.commands[0].op === 'move' ? p.commands[0].y : NaN,
  );
  const k = labels.length - 1;
  return labels[0] + ((y - marks[0]) * (labels[k] - labels[0])) / (marks[k] - marks[0]);
}

describe('effective-potential figure', () => {
  it('when V is Yukawa with λ = 0.1 bohr⁻¹, then the 1s line lies at the solved energy and its label prints it', () => {
    const scene = figure({
      potential: { type: 'yukawa', Z: 1, lambda: 0.1 },
      l: [0, 1],
      levels: 2,
    });
    const solved = solveRadial({
      potential: buildPotential({ type: 'yukawa', Z: 1, lambda: 0.1 }),
      l: 0,
      levels: 1,
    });
    const e1s = solved.levels[0].energy;
    const fact = scene.metadata.facts.find((f) => f.name === '1s energy');
    expect(fact?.value).toBe(e1s);
    expect(fact?.printed).toBe(`−${(-e1s).toPrecision(6)} hartree`);
    const labels = textsWithRole(scene, 'level-label').map((t) => runsText(t.runs));
    expect(labels).toContain(`1s: ${fact?.printed}`);
    // The line's height, read back through the y axis, is the energy to well within a tick's width.
    const lines = nodesWithRole(scene.children, 'level-line') as PathNode[];
    const ys = lines.map((p) => (p.commands[0].op === 'move' ? p.commands[0].y : NaN));
    const readBack = ys.map((y) => energyAtY(scene, y));
    expect(Math.min(...readBack.map((e) => Math.abs(e - e1s)))).toBeLessThan(1e-9);
    expect(scene.metadata.notes[0]).toMatch(
      /estimated error of each level below 1 × 10⁻[⁰¹²³⁴⁵⁶⁷⁸⁹]+ hartree/,
    );
    // Screening lifts 1s above hydrogen's −0.5 hartree (loose physical check, REFERENCE §10.5).
    expect(e1s).toBeGreaterThan(-0.5);
    expect(e1s).toBeLessThan(-0.5 + 0.1);
  });

  it('when V is Hulthén with Z = 1, δ = 0.2 bohr⁻¹, then the printed s levels are −0.405, −0.045 and −5.55556e-4 hartree (REFERENCE §10.4)', () => {
    const scene = figure({ potential: { type: 'hulthen', Z: 1, delta: 0.2 }, l: [0], levels: 3 });
    const exact = [1, 2, 3].map((n) => -0.5 * (1 / n - (n * 0.2) / 2) ** 2);
    const names = ['1s energy', '2s energy', '3s energy'];
    names.forEach((name, i) => {
      const fact = scene.metadata.facts.find((f) => f.name === name);
      expect(fact, name).toBeDefined();
      const digits = fact!.printed.split(' ')[0].replace(/[−.]/g, '').replace(/^0+/, '').length;
      const printed = printedValue(fact!.printed);
      // Equal to the exact value to the printed precision: within half a unit of the last digit.
      const halfUnit = 0.5 * 10 ** (Math.floor(Math.log10(Math.abs(exact[i]))) - digits + 1);
      expect(
        Math.abs(printed - exact[i]),
        `${name}: ${fact!.printed} vs ${exact[i]}`,
      ).toBeLessThanOrEqual(halfUnit * (1 + 1e-9));
      expect(digits).toBe(6);
    });
  });

  it('when V is the oscillator with ω = 1, then the printed levels are (2n_r + l + 3/2)ω exactly (REFERENCE §10.1)', () => {
    const scene = figure({
      potential: { type: 'harmonic-oscillator', omega: 1 },
      l: [0, 1, 2],
      levels: 2,
    });
    const expected: Record<string, number> = {
      '1s': 1.5,
      '2s': 3.5,
      '2p': 2.5,
      '3p': 4.5,
      '3d': 3.5,
      '4d': 5.5,
    };
    const printed = Object.fromEntries(
      scene.metadata.facts.map((f) => [f.name.replace(' energy', ''), printedValue(f.printed)]),
    );
    expect(Object.keys(printed).length).toBeGreaterThanOrEqual(4);
    for (const [name, value] of Object.entries(printed)) expect(value, name).toBe(expected[name]);
  });

  it('when the length unit is pm, then energies are printed in eV', () => {
    const scene = figure({ potential: { type: 'coulomb', Z: 1 }, l: [0], levels: 1 }, 'pm');
    const fact = scene.metadata.facts.find((f) => f.name === '1s energy');
    expect(fact?.unit).toBe('eV');
    expect(fact?.printed).toBe('−13.6057 eV');
  });

  it('when a parameter is out of range, then the spec is refused naming kind.potential.lambda', () => {
    const parsed = figureSpecSchema.safeParse({
      schemaVersion: 1,
      state: { terms: [{ n: 1, l: 0, m: 0 }] },
      kind: { type: 'potential', potential: { type: 'yukawa', Z: 1, lambda: -0.5 } },
    });
    expect(parsed.success).toBe(false);
    const issue = parsed.error!.issues[0];
    expect(issue.path.join('.')).toBe('kind.potential.lambda');
    expect(issue.message).toBe('lambda (bohr⁻¹) must not be negative');
  });

  it('when an unknown parameter or type is given, then the figure builder names the field', () => {
    const spec = resolved({
      schemaVersion: 1,
      state: { terms: [{ n: 1, l: 0, m: 0 }] },
      kind: { type: 'potential' },
    });
    const bad = {
      ...spec,
      kind: { ...spec.kind, potential: { type: 'yukawa', Z: 1, lambda: 0.1, D: 3 } },
    };
    expect(() => buildFigureScene(bad as typeof spec)).toThrow(
      /kind\.potential\.D: is not a parameter/,
    );
  });

  it('when an l binds no level, then its V_eff is still drawn and a note says so', () => {
    const scene = figure({
      potential: { type: 'yukawa', Z: 1, lambda: 0.1 },
      l: [0, 2],
      levels: 1,
    });
    expect(scene.metadata.notes).toContain('The potential binds no level with l = 2.');
    expect(nodesWithRole(scene.children, 'effective-potential').length).toBeGreaterThan(0);
  });

  it('when the well is infinite, then the wall is drawn at its radius and l = 0 levels are (kπ)²/(2R²) (REFERENCE §10.2)', () => {
    const scene = figure({ potential: { type: 'infinite-well', radius: 1 }, l: [0], levels: 2 });
    expect(nodesWithRole(scene.children, 'hard-wall')).toHaveLength(1);
    const e = scene.metadata.facts.map((f) => printedValue(f.printed));
    expect(e).toEqual([
      Number((Math.PI ** 2 / 2).toPrecision(6)),
      Number((2 * Math.PI ** 2).toPrecision(6)),
    ]);
  });

  it('when V is a table of −1/r with a Coulomb tail, then V is drawn inside the table and 1s lies near −0.5 hartree', () => {
    const rows = Array.from({ length: 400 }, (_, i) => 1e-3 * Math.pow(4e4, i / 399)).map(
      (r) => `${r},${-1 / r}`,
    );
    const csv = ['r_bohr,V_hartree', ...rows].join('\n');
    const scene = figure({
      potential: { type: 'tabulated', csv, asymptoticCharge: 1 },
      l: [0],
      levels: 1,
    });
    const fact = scene.metadata.facts.find((f) => f.name === '1s energy');
    // Loose: the spline of −1/r on a 2.7 %-step table, not the solver, limits the accuracy here.
    expect(Math.abs((fact?.value ?? 0) + 0.5)).toBeLessThan(1e-3);
    expect(nodesWithRole(scene.children, 'potential').length).toBeGreaterThan(0);
  });

  it('when the spec asks nothing special, then the defaults draw a Yukawa figure', () => {
    const scene = figure({});
    expect(scene.metadata.title).toBe(
      'Effective potential of Screened Coulomb (Yukawa), Z = 1, λ = 0.1 bohr⁻¹, l = 0, 1, 2',
    );
  });
});
