/**
 * Seeded pseudo-random numbers for reproducible figures: xoshiro128** seeded through splitmix32.
 *
 * Source: D. Blackman and S. Vigna, "Scrambled linear pseudorandom number generators",
 * ACM Trans. Math. Softw. 47(4), 36 (2021); reference C code xoshiro128starstar.c (public domain,
 * prng.di.unimi.it). Seeding: the state is filled from splitmix32 (the 32-bit variant of Vigna's
 * splitmix64, constants from Java's SplittableRandom, as commonly used), so nearby seeds give
 * unrelated streams and the all-zero state cannot occur.
 * Period 2^128 − 1; the same seed gives the same sequence on every JavaScript engine (only 32-bit
 * integer operations through Math.imul and >>>).
 */

export interface RandomSource {
  /** Uniform on [0, 1) with 32 random bits. */
  next(): number;
  /** Uniform on [0, 1) with 53 random bits, for inverse-CDF draws that reach far into a tail. */
  next53(): number;
}

function splitmix32(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s = (s + 0x9e3779b9) >>> 0;
    let z = s;
    z = Math.imul(z ^ (z >>> 16), 0x85ebca6b);
    z = Math.imul(z ^ (z >>> 13), 0xc2b2ae35);
    return (z ^ (z >>> 16)) >>> 0;
  };
}

const TWO_POW_32 = 4294967296;
const TWO_POW_53 = 9007199254740992;

export function xoshiro128(seed: number): RandomSource {
  const init = splitmix32(seed);
  let a = init();
  let b = init();
  let c = init();
  let d = init();
  if ((a | b | c | d) === 0) a = 1;
  const nextUint = (): number => {
    const result = Math.imul(rotl(Math.imul(b, 5), 7), 9) >>> 0;
    const t = b << 9;
    c ^= a;
    d ^= b;
    b ^= c;
    a ^= d;
    c ^= t;
    d = rotl(d, 11);
    return result;
  };
  return {
    next: () => nextUint() / TWO_POW_32,
    next53: () => ((nextUint() >>> 5) * 67108864 + (nextUint() >>> 6)) / TWO_POW_53,
  };
}

function rotl(x: number, k: number): number {
  return (x << k) | (x >>> (32 - k));
}
