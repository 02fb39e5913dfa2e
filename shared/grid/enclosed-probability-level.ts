/**
 * The isosurface level by enclosed probability: given ψ sampled on a grid, the density level c
 * such that the region {|ψ|² ≥ c} holds a chosen fraction p of the probability (the
 * highest-density region; definition: common practice, REFERENCE.md §9), with the fraction the
 * grid region actually holds and the grid's captured total.
 *
 * Method (no full sort): the grid mass Σ|ψ|²·h³ is binned by the top 16 bits of the float32 bit
 * pattern of |ψ|² (8 exponent + 8 mantissa bits, so bins are ordered by value and 0.4 % wide);
 * walking the bins from the top finds the bin where the running mass reaches p; only the samples
 * of that bin (typically a few hundred to a few thousand) are then sorted. Three passes over the
 * samples, O(n³) time, 0.8 MB of histogram.
 *
 * What is exact: c is the density of one sample, the smallest one such that the samples with
 * |ψ|² ≥ c hold at least p·total (with total the exact total probability, 1 for a normalised
 * state); `enclosed` is that mass over the total, exactly as summed on the grid.
 *
 * Accuracy against the continuum: the grid sum over the region is a Riemann sum whose error comes
 * from the voxels the surface cuts, each counted wholly in or out. For a grid aligned with the
 * atom's symmetry these errors come in groups of up to 48 equal voxels and do not average away,
 * so the level's error fluctuates from grid to grid instead of falling smoothly. A random-error
 * estimate with groups of 48 gives, for a sphere of radius r, σ(c)/c ≈ 1.13 h²/r: about 1.7 % at
 * h = 0.2 bohr and 0.4 % at h = 0.1 bohr for the 1s 90 % surface (r = 2.66 bohr). Equal samples
 * go in together, so `enclosed` can overshoot p by a whole group (up to 3 % at 48³ for 1s, p = 0.5). The level is
 * grid-limited; the measured errors are in tests/unit/grid/enclosed-probability-level.test.ts.
 * sub-voxel-level.ts sharpens this level (find-isosurface-levels.ts combines the two).
 */
import { OrbitalInputError } from '../physics/orbital-input-error';

export interface EnclosedProbabilityLevel {
  /** The fraction asked for, of the exact total probability. */
  readonly fraction: number;
  /** c in bohr⁻³: the surface is |ψ|² = c. */
  readonly densityLevel: number;
  /** √c in bohr^(−3/2): the surfaces ψ = ±√c of a real state, |ψ| = √c of a complex one. */
  readonly psiLevel: number;
  /** Probability in the grid region {|ψ|² ≥ c}, over the exact total. */
  readonly enclosed: number;
  /** Probability the whole grid holds, over the exact total (below 1 when the extent truncates). */
  readonly gridTotal: number;
  /** Grid samples inside the region. */
  readonly samplesInside: number;
}

const KEY_SHIFT = 15;
const BIN_COUNT = 1 << (31 - KEY_SHIFT);

/**
 * Levels enclosing each of `fractions` of `totalProbability`, from ψ samples `re` (and `im` for
 * complex states, else null) on a grid of voxel volume h³ (bohr³).
 */
export function enclosedProbabilityLevels(
  re: Float32Array,
  im: Float32Array | null,
  voxelVolume: number,
  fractions: readonly number[],
  totalProbability = 1,
): EnclosedProbabilityLevel[] {
  if (im && im.length !== re.length) throw new OrbitalInputError('im', 'must have as many samples as re');
  if (!(voxelVolume > 0) || !Number.isFinite(voxelVolume)) {
    throw new OrbitalInputError('voxelVolume', `must be a positive number of bohr³, got ${voxelVolume}`);
  }
  if (!(totalProbability > 0)) throw new OrbitalInputError('totalProbability', 'must be positive');
  fractions.forEach((p, i) => {
    if (!(p > 0 && p < 1)) throw new OrbitalInputError(`enclosed[${i}]`, `must lie strictly between 0 and 1, got ${p}`);
  });

  const bits = new Float32Array(1);
  const key = new Int32Array(bits.buffer);
  const binMass = new Float64Array(BIN_COUNT);
  const binCount = new Uint32Array(BIN_COUNT);
  let total = 0;
  for (let s = 0; s < re.length; s++) {
    const a = re[s];
    const b = im ? im[s] : 0;
    const d = a * a + b * b;
    bits[0] = d;
    const bin = key[0] >>> KEY_SHIFT;
    binMass[bin] += d;
    binCount[bin]++;
    total += d;
  }
  if (!Number.isFinite(total)) {
    const bad = re.findIndex((v, s) => !Number.isFinite(v) || (im !== null && !Number.isFinite(im[s])));
    throw new OrbitalInputError('field', `sample ${bad} is not a finite number`);
  }
  const gridTotal = (total * voxelVolume) / totalProbability;

  return fractions.map((fraction) => {
    const target = (fraction * totalProbability) / voxelVolume; // in units of the raw sum
    if (total < target) {
      throw new OrbitalInputError(
        'extent',
        `the grid holds only ${gridTotal.toPrecision(6)} of the probability, less than the ${fraction} asked for; enlarge the extent`,
      );
    }
    let above = 0;
    let samplesAbove = 0;
    let bin = BIN_COUNT - 1;
    while (bin > 0 && above + binMass[bin] < target) {
      above += binMass[bin];
      samplesAbove += binCount[bin];
      bin--;
    }
    const inBin = new Float64Array(binCount[bin]);
    let m = 0;
    for (let s = 0; s < re.length; s++) {
      const a = re[s];
      const b = im ? im[s] : 0;
      const d = a * a + b * b;
      bits[0] = d;
      if (key[0] >>> KEY_SHIFT === bin) inBin[m++] = d;
    }
    inBin.sort().reverse();
    let t = 0;
    let mass = above + inBin[0];
    // Take samples in falling order until the target is met, then any ties with the last one taken.
    while (mass < target && t + 1 < inBin.length) mass += inBin[++t];
    while (t + 1 < inBin.length && inBin[t + 1] === inBin[t]) mass += inBin[++t];
    const densityLevel = inBin[t];
    return {
      fraction,
      densityLevel,
      psiLevel: Math.sqrt(densityLevel),
      enclosed: (mass * voxelVolume) / totalProbability,
      gridTotal,
      samplesInside: samplesAbove + t + 1,
    };
  });
}
