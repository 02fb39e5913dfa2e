/**
 * Generalised Laguerre polynomial L_k^{(α)}(x) in the modern convention (DLMF §18.5, Abramowitz &
 * Stegun ch. 22), L_k^{(α)}(0) = C(k+α, k).
 *
 * Method: the three-term recurrence DLMF 18.9.1 written for Laguerre,
 *   (i+1) L_{i+1} = (2i + 1 + α − x) L_i − (i + α) L_{i−1},  L_0 = 1, L_1 = 1 + α − x,
 * run forward; the polynomial is the dominant solution, so forward recurrence is stable.
 * Accuracy: a few ulp times k relative to the size of the terms; near a zero only absolute.
 * Internal helper: callers validate k ≥ 0 and α > −1.
 */
export function assocLaguerre(k: number, alpha: number, x: number): number {
  if (k === 0) return 1;
  let prev = 1;
  let cur = 1 + alpha - x;
  for (let i = 1; i < k; i++) {
    const next = ((2 * i + 1 + alpha - x) * cur - (i + alpha) * prev) / (i + 1);
    prev = cur;
    cur = next;
  }
  return cur;
}
