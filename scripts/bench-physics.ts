// Timings of the orbital computation's hot paths, printed as one JSON object (called by scripts/bench).
// Usage: npx tsx scripts/bench-physics.ts [--grid 128] [--repeat 5]
import { compileState, evaluatePsi, type OrbitalState } from '../shared/physics/orbital-state';
import { sampleStateOnGrid, suggestedExtent } from '../shared/physics/sample-state-on-grid';
import { radialFunction } from '../shared/physics/radial-function';
import { cumulativeRadialProbability } from '../shared/physics/radial-probability';
import { sp3Hybrids } from '../shared/physics/hybrid-orbitals';
import { medianTime } from './lib/median-time';

function option(name: string, fallback: number): number {
  const i = process.argv.indexOf(`--${name}`);
  return i > 0 ? Number(process.argv[i + 1]) : fallback;
}

const grid = option('grid', 128);
const repeat = option('repeat', 5);

const time = (run: () => void): number => medianTime(run, repeat);

const states: Record<string, OrbitalState> = {
  '1s': { Z: 1, terms: [{ n: 1, l: 0, m: 0, basis: 'real' }] },
  '4f_z3': { Z: 1, terms: [{ n: 4, l: 3, m: 0, basis: 'real' }] },
  '4f_m+1_complex': { Z: 1, terms: [{ n: 4, l: 3, m: 1, basis: 'complex' }] },
  sp3: { Z: 1, terms: sp3Hybrids(2)[0] },
  '1s+2p_z_t=1': {
    Z: 1,
    time: 1,
    terms: [
      { n: 1, l: 0, m: 0, basis: 'real' },
      { n: 2, l: 1, m: 0, basis: 'real' },
    ],
  },
  '30s': { Z: 1, terms: [{ n: 30, l: 0, m: 0, basis: 'real' }] },
  '20l15': { Z: 1, terms: [{ n: 20, l: 15, m: -7, basis: 'real' }] },
};

const points = grid ** 3;
const re = new Float32Array(points);
const im = new Float32Array(points);
const gridMs: Record<string, number> = {};
for (const [name, state] of Object.entries(states)) {
  const c = compileState(state);
  const spec = { n: grid, half: suggestedExtent(c) };
  gridMs[name] = time(() => sampleStateOnGrid(c, spec, re, c.isReal ? null : im));
}

const c4f = compileState(states['4f_z3']);
const out = { re: 0, im: 0 };
const evalPoints = 1_000_000;
const evaluateMs = time(() => {
  for (let i = 0; i < evalPoints; i++)
    evaluatePsi(c4f, (i % 97) * 0.3 - 14, (i % 89) * 0.3 - 13, (i % 83) * 0.3 - 12, out);
});
const radialMs = time(() => {
  for (let i = 0; i < 100_000; i++) radialFunction(30, 5, i * 0.02);
});
const cumulativeMs = time(() => {
  for (let i = 0; i < 1000; i++) cumulativeRadialProbability(30, 5, i * 2);
});
const extentMs = time(() => suggestedExtent(compileState(states['30s'])));

process.stdout.write(
  JSON.stringify({
    benchmark: 'physics',
    node: process.version,
    grid,
    repeat,
    sampleStateOnGridMs: gridMs,
    sampleStateOnGridNsPerPoint: Object.fromEntries(
      Object.entries(gridMs).map(([k, v]) => [k, Math.round(((v * 1e6) / points) * 10) / 10]),
    ),
    evaluatePsi4fNsPerPoint: Math.round(((evaluateMs * 1e6) / evalPoints) * 10) / 10,
    radialFunctionN30NsPerCall: Math.round(((radialMs * 1e6) / 100_000) * 10) / 10,
    cumulativeRadialProbabilityN30UsPerCall: Math.round(((cumulativeMs * 1e3) / 1000) * 10) / 10,
    suggestedExtent30sMs: extentMs,
  }) + '\n',
);
