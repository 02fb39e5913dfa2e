/**
 * ln(k!) for integers k ≥ 0, used for the normalisation of R_nl without forming factorials
 * (59! ≈ 1.4e80 would still fit a double, but products of them and powers would not).
 *
 * Method: a table of running sums of ln i, built once up to 200. Accuracy: each entry carries
 * at most ~k·1e-16 absolute error in the logarithm, i.e. ~2e-14 relative in exp(ln k!) at k = 200.
 */
const TABLE_SIZE = 201;
const table = new Float64Array(TABLE_SIZE);
for (let i = 2; i < TABLE_SIZE; i++) table[i] = table[i - 1] + Math.log(i);

export function logFactorial(k: number): number {
  if (!Number.isInteger(k) || k < 0 || k >= TABLE_SIZE)
    throw new RangeError(`logFactorial: k must be an integer in 0…${TABLE_SIZE - 1}`);
  return table[k];
}
