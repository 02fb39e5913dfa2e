// scripts/lobewright eval, radial, ylm and props as a user runs them: one JSON request in, one JSON answer
// out; values checked against REFERENCE.md (§4 R_nl, §5 Y_lm, §6 ψ, §7 expectation values, §8 nodes, §9 P(r)).
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { expectClose } from '../physics/close-to';

const tool = fileURLToPath(new URL('../../../scripts/lobewright', import.meta.url));

// eslint-disable-next-line @typescript-eslint/no-explicit-any -- answers are untyped JSON checked field by field
function run(command: string, request: unknown): { status: number | null; answer: any } {
  const child = spawnSync(tool, [command], { input: JSON.stringify(request), encoding: 'utf8' });
  return { status: child.status, answer: JSON.parse(child.stdout) };
}

describe('scripts/lobewright eval', () => {
  it('when real 3d_z² and complex 2p(m=+1) are asked at (1,2,3) bohr, then ψ matches REFERENCE.md §6', () => {
    const real = run('eval', {
      Z: 1,
      n: 3,
      l: 2,
      m: 0,
      basis: 'real',
      points: [
        [1, 2, 3],
        [0, 0, 0],
      ],
    });
    expect(real.status).toBe(0);
    expectClose(real.answer.psi[0][0], 0.010620559258552, { rel: 1e-13 });
    expect(real.answer.psi[1]).toEqual([0, 0]);
    const complex = run('eval', { Z: 1, n: 2, l: 1, m: 1, basis: 'complex', points: [[1, 2, 3]] });
    expectClose(complex.answer.psi[0][0], -0.01086036692742393, { rel: 1e-13 });
    expectClose(complex.answer.psi[0][1], -0.02172073385484786, { rel: 1e-13 });
  });

  it('when reducedMass is true, then ψ_1s(0)² = μ³/π (REFERENCE.md §6 scaled by the ¹H μ of §1, CODATA 2022)', () => {
    const { answer } = run('eval', {
      Z: 1,
      n: 1,
      l: 0,
      m: 0,
      basis: 'real',
      points: [[0, 0, 0]],
      reducedMass: true,
    });
    expectClose(answer.psi[0][0] ** 2, 0.9994556794247615 ** 3 / Math.PI, { rel: 1e-14 });
  });

  it('when l ≥ n, then the answer names the field l and the exit status is non-zero', () => {
    const { status, answer } = run('eval', {
      Z: 1,
      n: 2,
      l: 2,
      m: 0,
      basis: 'real',
      points: [[1, 2, 3]],
    });
    expect(status).not.toBe(0);
    expect(answer.error.field).toBe('l');
    expect(answer.error.message).toMatch(/less than n/);
  });

  it('when a point has two coordinates, then the answer names points[1]', () => {
    const { status, answer } = run('eval', {
      Z: 1,
      n: 2,
      l: 1,
      m: 0,
      points: [
        [1, 2, 3],
        [1, 2],
      ],
    });
    expect(status).not.toBe(0);
    expect(answer.error.field).toBe('points[1]');
  });
});

describe('scripts/lobewright radial', () => {
  it('when 2s is asked at 1 and 2 bohr, then R matches REFERENCE.md §4 and P the §9 enclosed probability', () => {
    const { status, answer } = run('radial', { Z: 1, n: 2, l: 0, r: [1, 2] });
    expect(status).toBe(0);
    expectClose(answer.R[0], 0.2144409712401767, { rel: 1e-13 });
    expectClose(answer.R[1], 0, { abs: 1e-16 });
    expectClose(answer.P[0], 0.03431646692496391, { rel: 1e-13 });
  });

  it('when a radius is negative or Z is out of range, then the field is named', () => {
    expect(run('radial', { Z: 1, n: 2, l: 0, r: [1, -2] }).answer.error.field).toBe('r[1]');
    const z = run('radial', { Z: 93, n: 2, l: 0, r: [1] });
    expect(z.status).not.toBe(0);
    expect(z.answer.error.field).toBe('Z');
  });
});

describe('scripts/lobewright ylm', () => {
  it('when θ = 1, φ = 2, then complex Y_3^3 and real f_y(3x²−y²) match REFERENCE.md §5', () => {
    const { status, answer } = run('ylm', { l: 3, m: 3, basis: 'complex', angles: [[1, 2]] });
    expect(status).toBe(0);
    expectClose(answer.Y[0][0], -0.2386903148597636, { rel: 1e-14 });
    expectClose(answer.Y[0][1], 0.0694603594477664, { rel: 1e-14 });
    const theta = Math.acos(3 / Math.sqrt(14));
    const phi = Math.atan2(2, 1);
    const real = run('ylm', {
      l: 3,
      m: -3,
      basis: 'real',
      angles: [[theta, phi]],
      reducedMass: false,
    });
    expectClose(real.answer.Y[0][0], -0.02252796894660857, { rel: 1e-13 });
    expect(real.answer.Y[0][1]).toBe(0);
  });

  it('when |m| > l or an unknown field is sent, then the field is named', () => {
    expect(run('ylm', { l: 1, m: 2, basis: 'real', angles: [[1, 2]] }).answer.error.field).toBe(
      'm',
    );
    expect(run('ylm', { l: 1, m: 0, basis: 'polar', angles: [[1, 2]] }).answer.error.field).toBe(
      'basis',
    );
  });
});

describe('scripts/lobewright props', () => {
  it('when 3s, then energy, nodes, r_mp and ⟨r^k⟩ match REFERENCE.md §2, §7, §8 and invR3 is null', () => {
    const { status, answer } = run('props', { Z: 1, n: 3, l: 0 });
    expect(status).toBe(0);
    expectClose(answer.energy.hartree, -1 / 18, { rel: 1e-15 });
    expectClose(answer.energy.eV, -13.60569312299 / 9, { rel: 1e-13 });
    expect(answer.radialNodes.length).toBe(2);
    expectClose(answer.radialNodes[0], (9 - 3 * Math.sqrt(3)) / 2, { abs: 1e-10 });
    expectClose(answer.radialNodes[1], (9 + 3 * Math.sqrt(3)) / 2, { abs: 1e-10 });
    expect(answer.angularNodes).toBe(0);
    expectClose(answer.rMostProbable, 13.07403282802196, { rel: 1e-13 });
    expect(answer.expectation).toMatchObject({ r: 13.5, r2: 207, invR3: null });
    expectClose(answer.expectation.invR, 1 / 9, { rel: 1e-15 });
    expectClose(answer.expectation.invR2, 2 / 27, { rel: 1e-15 });
  });

  it('when 2p of ¹H with reduced mass, then E = −hcR_H/4 (REFERENCE.md §1, CODATA 2022) and ⟨1/r³⟩ = μ³/24', () => {
    const { answer } = run('props', { Z: 1, n: 2, l: 1, reducedMass: true });
    expectClose(answer.energy.eV, -13.598287264283 / 4, { rel: 1e-13 });
    expectClose(answer.expectation.invR3, 0.9994556794247615 ** 3 / 24, { rel: 1e-14 });
    expect(answer.angularNodes).toBe(1);
  });

  it('when reducedMass is true for Z = 3, or n is not an integer, then the field is named', () => {
    expect(run('props', { Z: 3, n: 2, l: 1, reducedMass: true }).answer.error.field).toBe(
      'reducedMass',
    );
    const bad = run('props', { Z: 1, n: 2.5, l: 1 });
    expect(bad.status).not.toBe(0);
    expect(bad.answer.error).toMatchObject({
      field: 'n',
      message: expect.stringMatching(/integer/),
    });
  });
});
