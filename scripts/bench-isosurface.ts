// Benchmark of the isosurface pipeline (shared/grid): for 4f states on a 128³ grid, the time to
// sample ψ, find the 90 % level (the sample count, then sharpened by the voxel model, as
// buildIsosurface does; both timed) and mesh both phases, median of 5 runs after one warm-up, one core.
// Prints one JSON object; scripts/bench puts it under "isosurface".
import { enclosedProbabilityLevels } from '../shared/grid/enclosed-probability-level';
import { gridSpacing } from '../shared/grid/grid-spec';
import { subVoxelLevel } from '../shared/grid/sub-voxel-level';
import { marchingCubes } from '../shared/grid/marching-cubes';
import { compileState } from '../shared/physics/orbital-state';
import { sampleStateOnGrid, suggestedExtent } from '../shared/physics/sample-state-on-grid';

const GRID = 128;
const ENCLOSED = 0.9;
const RUNS = 5;
const STATES = [
  { label: '4f_z3', n: 4, l: 3, m: 0 },
  { label: '4f_xyz', n: 4, l: 3, m: -2 },
];

const median = (values: number[]): number => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)];
const round = (ms: number): number => Math.round(ms * 10) / 10;

const results: Record<string, unknown> = {};
for (const { label, n, l, m } of STATES) {
  const state = compileState({ Z: 1, terms: [{ n, l, m, basis: 'real' }] });
  const grid = { n: GRID, half: suggestedExtent(state) };
  const psi = new Float32Array(GRID ** 3);
  const times = { sample: [] as number[], levelCount: [] as number[], levelSubVoxel: [] as number[], mesh: [] as number[], total: [] as number[] };
  let summary = {};
  for (let run = 0; run <= RUNS; run++) {
    const t0 = performance.now();
    sampleStateOnGrid(state, grid, psi, null);
    const t1 = performance.now();
    const [count] = enclosedProbabilityLevels(psi, null, gridSpacing(grid) ** 3, [ENCLOSED]);
    const tCount = performance.now();
    const level = subVoxelLevel(psi, null, grid, count)!;
    const t2 = performance.now();
    const positive = marchingCubes(psi, grid, { isovalue: level.psiLevel });
    const negative = marchingCubes(psi, grid, { isovalue: level.psiLevel, sign: -1 });
    const t3 = performance.now();
    if (run === 0) continue; // warm-up: lets the JIT compile the loops
    times.sample.push(t1 - t0);
    times.levelCount.push(tCount - t1);
    times.levelSubVoxel.push(t2 - tCount);
    times.mesh.push(t3 - t2);
    times.total.push(t3 - t0);
    summary = {
      densityLevel: level.densityLevel,
      densityLevelByCount: count.densityLevel,
      enclosed: level.enclosed,
      enclosedBySamples: level.enclosedBySamples,
      gridTotal: count.gridTotal,
      triangles: { positive: positive.triangleCount, negative: negative.triangleCount },
      vertices: { positive: positive.vertexCount, negative: negative.vertexCount },
    };
  }
  results[label] = {
    ...summary,
    extent: grid.half,
    ms: {
      sample: round(median(times.sample)),
      levelCount: round(median(times.levelCount)),
      levelSubVoxel: round(median(times.levelSubVoxel)),
      mesh: round(median(times.mesh)),
      total: round(median(times.total)),
    },
  };
}

process.stdout.write(
  JSON.stringify({
    grid: GRID,
    enclosed: ENCLOSED,
    runs: RUNS,
    statistic: 'median of 5 after one warm-up, milliseconds, one thread',
    runtime: `node ${process.version}`,
    states: results,
  }) + '\n',
);
