/**
 * All zeros of L_k^{(α)}(x), ascending, to full double precision.
 *
 * Method: the zeros of orthogonal polynomials of successive degree interlace (Szegő, Orthogonal
 * Polynomials, Thm 3.3.2; common knowledge), so the zeros of degree j − 1 bracket those of degree j
 * (plus 0 below and a point past the largest zero above). Each bracket is bisected until the
 * interval cannot shrink further. Cost O(k³), fine for k ≲ 60 and cached by callers when hot.
 */
import { assocLaguerre } from './assoc-laguerre';

export function bisectRoot(f: (x: number) => number, lo: number, hi: number): number {
  let flo = f(lo);
  if (flo === 0) return lo;
  for (let iter = 0; iter < 2000; iter++) {
    const mid = 0.5 * (lo + hi);
    if (mid <= lo || mid >= hi) break;
    const fm = f(mid);
    if (fm === 0) return mid;
    if (fm > 0 === flo > 0) {
      lo = mid;
      flo = fm;
    } else {
      hi = mid;
    }
  }
  return 0.5 * (lo + hi);
}

/** A point beyond the largest zero of L_k^{(α)}: where the sign has become (−1)^k for good. */
function upperBracket(k: number, alpha: number, above: number): number {
  const asymptoticPositive = k % 2 === 0;
  let b = Math.max(above, 4 * k + 2 * alpha + 4);
  while (assocLaguerre(k, alpha, b) > 0 !== asymptoticPositive) b *= 2;
  return b;
}

export function laguerreZeros(k: number, alpha: number): number[] {
  let zeros: number[] = [];
  for (let j = 1; j <= k; j++) {
    const f = (x: number): number => assocLaguerre(j, alpha, x);
    const last = zeros.length > 0 ? zeros[zeros.length - 1] : 0;
    const edges = [0, ...zeros, upperBracket(j, alpha, last)];
    const next: number[] = [];
    for (let i = 0; i + 1 < edges.length; i++) next.push(bisectRoot(f, edges[i], edges[i + 1]));
    zeros = next;
  }
  return zeros;
}
