// Timings of the radial solver (shared/solver), printed as one JSON object: median wall time in ms
// over repeated solves after a warm-up, plus the first (cold) call of the process.
// Usage: npx tsx scripts/bench-solver.ts [--repeat 9]
import { countBoundLevels } from '../shared/solver/count-bound-levels';
import { buildPotential } from '../shared/solver/potentials/build-potential';
import { DEFAULT_STEP, solveRadial } from '../shared/solver/solve-radial';
import { medianTime } from './lib/median-time';

const at = process.argv.indexOf('--repeat');
const repeat = at > 0 ? Number(process.argv[at + 1]) : 9;

const median = (run: () => void): number => medianTime(run, repeat);

function solveAll(spec: unknown, ls: number[], levels: number): () => void {
  return () => {
    const potential = buildPotential(spec);
    for (const l of ls) solveRadial({ potential, l, levels });
  };
}

const coldStart = performance.now();
solveAll({ type: 'yukawa', Z: 1, lambda: 0.1 }, [0], 3)();
const coldMs = Math.round((performance.now() - coldStart) * 100) / 100;

const table = ['r_bohr,V_hartree'];
for (let i = 0; i < 2000; i++) {
  const r = 1e-5 * Math.exp((i * Math.log(1e7)) / 1999);
  table.push(`${r},${-1 / r}`);
}
const csv = table.join('\n');

function criticalScreening(): void {
  let lo = 1;
  let hi = 1.5;
  for (let i = 0; i < 40; i++) {
    const mid = 0.5 * (lo + hi);
    const p = buildPotential({ type: 'yukawa', Z: 1, lambda: mid });
    if (countBoundLevels(p, 0, 1, DEFAULT_STEP / 2) > 0) lo = mid;
    else hi = mid;
  }
}

const cases: Record<string, () => void> = {
  'yukawa λ=0.1, l=0, 3 levels': solveAll({ type: 'yukawa', Z: 1, lambda: 0.1 }, [0], 3),
  'yukawa λ=0.005, l=0..3, 5 levels each': solveAll({ type: 'yukawa', Z: 1, lambda: 0.005 }, [0, 1, 2, 3], 5),
  'coulomb Z=1, l=0..3, 5 levels each': solveAll({ type: 'coulomb', Z: 1 }, [0, 1, 2, 3], 5),
  'coulomb Z=1, l=0, 30 levels': solveAll({ type: 'coulomb', Z: 1 }, [0], 30),
  'harmonic oscillator, l=0..3, 5 levels each': solveAll({ type: 'harmonic-oscillator', omega: 1 }, [0, 1, 2, 3], 5),
  'infinite well, l=0..3, 5 levels each': solveAll({ type: 'infinite-well', radius: 1 }, [0, 1, 2, 3], 5),
  'tabulated −1/r (2000 rows) with tail, l=0, 3 levels': solveAll({ type: 'tabulated', csv, asymptoticCharge: 1 }, [0], 3),
  'yukawa 1s critical λ, 40 bisection steps': criticalScreening,
};

const ms: Record<string, number> = {};
for (const [name, run] of Object.entries(cases)) ms[name] = median(run);
process.stdout.write(JSON.stringify({ solver: { repeat, firstCallMs: coldMs, medianMs: ms } }, null, 2) + '\n');
