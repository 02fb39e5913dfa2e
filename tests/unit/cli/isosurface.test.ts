// `scripts/lobewright isosurface` as a user runs it: one JSON request in, one JSON answer out.
// Checks: the 1s 90 % level of REFERENCE.md §9 and the 2p_z level from the mpmath fixture
// (tests/unit/grid/fixtures/enclosed-probability-level.json), each within the grid tolerance of
// the default sub-voxel level, h²/3 (shared/grid/sub-voxel-level.ts).
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import fixture from '../grid/fixtures/enclosed-probability-level.json';

const tool = fileURLToPath(new URL('../../../scripts/lobewright', import.meta.url));

interface Answer {
  densityLevel: number;
  psiLevel: number;
  enclosed: number;
  enclosedBySamples: number;
  levelMethod: string;
  gridTotal: number;
  extent: number;
  triangles: { positive: number; negative: number; magnitude: number };
  ms: Record<string, number>;
  error: { field: string; message: string };
}

function run(request: unknown): { status: number | null; answer: Answer } {
  const child = spawnSync(tool, ['isosurface'], { input: JSON.stringify(request), encoding: 'utf8' });
  return { status: child.status, answer: JSON.parse(child.stdout) };
}

describe('scripts/lobewright isosurface', () => {
  it('answers the 1s 90 % level of REFERENCE.md §9 on a 96³ grid', () => {
    const { status, answer } = run({ Z: 1, n: 1, l: 0, m: 0, basis: 'real', enclosed: 0.9, grid: 96 });
    expect(status).toBe(0);
    const h = (2 * answer.extent) / 95;
    const c = 0.001553802348981213;
    expect(Math.abs(answer.densityLevel - c) / c).toBeLessThan((h * h) / 3);
    expect(answer.psiLevel).toBeCloseTo(Math.sqrt(answer.densityLevel), 15);
    expect(answer.levelMethod).toBe('sub-voxel');
    expect(Math.abs(answer.enclosed - 0.9)).toBeLessThan(1e-12);
    expect(Math.abs(answer.enclosedBySamples - 0.9)).toBeLessThan(0.01);
    expect(answer.gridTotal).toBeGreaterThan(0.999);
    expect(answer.triangles.positive).toBeGreaterThan(1000);
    expect(answer.triangles.negative).toBe(0);
    expect(Object.keys(answer.ms).sort()).toEqual(['level', 'mesh', 'sample']);
  });

  it('answers 2p_z with two equal lobes at the mpmath level (grid 128, extent 12 bohr)', () => {
    const { status, answer } = run({ Z: 1, n: 2, l: 1, m: 0, basis: 'real', grid: 128, extent: 12 });
    expect(status).toBe(0);
    const exact = fixture['2p_z'].find((x) => x.enclosed === 0.9)!;
    const h = 24 / 127;
    expect(Math.abs(answer.densityLevel - exact.densityLevel) / exact.densityLevel).toBeLessThan((h * h) / 3);
    expect(answer.triangles.negative).toBe(answer.triangles.positive);
  });

  it('passes reducedMass on: on a grid scaled by m_e/μ the level scales by (μ/m_e)³ (μ/m_e of ¹H, REFERENCE.md §1)', () => {
    const mu = 0.9994556794247615; // CODATA 2022; the 2018 value differs by 2e-15
    const fixed = run({ Z: 1, n: 2, l: 1, m: 0, grid: 64, extent: 12 }).answer;
    const reduced = run({ Z: 1, n: 2, l: 1, m: 0, grid: 64, extent: 12 / mu, reducedMass: true }).answer;
    expect(Math.abs(reduced.densityLevel / fixed.densityLevel / mu ** 3 - 1)).toBeLessThan(1e-6);
  });

  it('refuses a grid above 256, naming "grid"', () => {
    const { status, answer } = run({ Z: 1, n: 2, l: 1, m: 0, basis: 'real', grid: 300 });
    expect(status).toBe(2);
    expect(answer.error.field).toBe('grid');
    expect(answer.error.message).toMatch(/from 8 to 256/);
  });

  it('names the field of other bad requests', () => {
    expect(run({ Z: 1, n: 2, l: 2, m: 0 }).answer.error.field).toBe('l');
    expect(run({ Z: 1, n: 2, l: 1, m: 0, enclosed: 1.2 }).answer.error.field).toBe('enclosed');
    expect(run({ Z: 1, n: 2, l: 1, m: 0, colour: 'red' }).answer.error.field).toBe('colour');
    expect(run({ Z: 1, n: 2, l: 1, m: 0, levelMethod: 'exact' }).answer.error.field).toBe('levelMethod');
    expect(run({ n: 2, l: 1, m: 0 }).answer.error.field).toBe('Z');
  });
});
