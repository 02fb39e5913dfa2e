/**
 * Axis ticks at "nice" numbers (1, 2, 5 × 10^k): Heckbert's loose labelling.
 *
 * Source: P. S. Heckbert, "Nice numbers for graph labels", Graphics Gems (Academic Press, 1990),
 * pp. 61–63. The range is rounded to a nice number, the step to a nice number near range/(target−1),
 * and the axis runs from floor(min/step)·step to ceil(max/step)·step, so every end is a tick.
 */

/** A nice number near x: rounded (1, 2, 5, 10) or the next one up (ceiling) × 10^k. */
export function niceNumber(x: number, round: boolean): number {
  const exponent = Math.floor(Math.log10(x));
  const fraction = x / Math.pow(10, exponent);
  let nice: number;
  if (round) nice = fraction < 1.5 ? 1 : fraction < 3 ? 2 : fraction < 7 ? 5 : 10;
  else nice = fraction <= 1 ? 1 : fraction <= 2 ? 2 : fraction <= 5 ? 5 : 10;
  return nice * Math.pow(10, exponent);
}

export interface TickSet {
  /** Axis ends (the outer ticks). */
  min: number;
  max: number;
  step: number;
  values: number[];
  /** Digits after the decimal point that show every tick exactly. */
  decimals: number;
}

function decimalsFor(step: number): number {
  return Math.max(0, -Math.floor(Math.log10(step) + 1e-9));
}

function ticksFrom(min: number, step: number, count: number): number[] {
  const digits = decimalsFor(step) + 2;
  return Array.from({ length: count }, (_, i) => Number((min + i * step).toFixed(digits)));
}

/** Loose labelling of [lo, hi] with about `target` ticks. */
export function niceTicks(lo: number, hi: number, target = 5): TickSet {
  if (!Number.isFinite(lo) || !Number.isFinite(hi))
    throw new Error(`niceTicks: range must be finite, got ${lo} … ${hi}`);
  if (hi < lo) [lo, hi] = [hi, lo];
  if (hi === lo) {
    const pad = lo === 0 ? 1 : Math.abs(lo) * 0.1;
    lo -= pad;
    hi += pad;
  }
  const range = niceNumber(hi - lo, false);
  return ticksWithStep(lo, hi, niceNumber(range / (Math.max(2, target) - 1), true));
}

/** Ticks inside a fixed range [lo, hi] (the ends stay where they are, ticks fall on nice numbers). */
export function niceTicksWithin(lo: number, hi: number, target = 5): TickSet {
  const loose = niceTicks(lo, hi, target);
  const values = loose.values.filter(
    (v) => v >= lo - loose.step * 1e-9 && v <= hi + loose.step * 1e-9,
  );
  return { min: lo, max: hi, step: loose.step, values, decimals: loose.decimals };
}

/** Loose labelling with a given step: ends floored and ceiled to it. */
function ticksWithStep(lo: number, hi: number, step: number): TickSet {
  const min = Math.floor(lo / step + 1e-9) * step;
  const max = Math.ceil(hi / step - 1e-9) * step;
  const values = ticksFrom(min, step, Math.round((max - min) / step) + 1);
  return {
    min: values[0],
    max: values[values.length - 1],
    step,
    values,
    decimals: decimalsFor(step),
  };
}

/**
 * Our variant of Heckbert's method: the step is the rounded nice number of span/(k − 1) for k = 4 … 7
 * (or the range given)
 * (without first rounding the span, which can overshoot the axis by half), keeping the tick set that
 * wastes the least span beyond the data; ties go to fewer ticks.
 */
export function snugTicks(lo: number, hi: number, fewest = 4, most = 7): TickSet {
  if (hi < lo) [lo, hi] = [hi, lo];
  if (!(hi > lo)) return niceTicks(lo, hi);
  let best: TickSet | null = null;
  const waste = (t: TickSet): number => (t.max - t.min - (hi - lo)) / (t.max - t.min);
  for (let k = fewest; k <= most; k++) {
    const t = ticksWithStep(lo, hi, niceNumber((hi - lo) / (k - 1), true));
    if (t.values.length > 8) continue;
    if (
      !best ||
      waste(t) < waste(best) - 1e-9 ||
      (Math.abs(waste(t) - waste(best)) <= 1e-9 && t.values.length < best.values.length)
    )
      best = t;
  }
  return best ?? niceTicks(lo, hi);
}
