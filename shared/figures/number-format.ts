/**
 * Numbers as figures print them: the true minus sign (U+2212), no "−0", fixed decimals for ticks and
 * significant digits for annotated values (common practice in scientific typesetting).
 */

export const MINUS = '\u2212';

export function formatFixed(value: number, decimals: number): string {
  const text = Math.abs(value).toFixed(decimals);
  const isZero = Number(text) === 0;
  return value < 0 && !isZero ? `${MINUS}${text}` : text;
}

/** Beyond these powers of ten a value is printed as "a × 10ⁿ", so no digits are implied that were not computed. */
const LARGEST_PLAIN_MAGNITUDE = 4;
const SMALLEST_PLAIN_MAGNITUDE = -4;

/** `digits` significant digits; "a × 10ⁿ" for |value| ≥ 10⁵ or < 10⁻⁴. */
export function formatSignificant(value: number, digits = 3): string {
  if (value === 0) return formatFixed(0, digits - 1);
  const magnitude = Math.floor(Math.log10(Math.abs(value)));
  const rounded = Number(value.toPrecision(digits));
  const roundedMagnitude = Math.floor(Math.log10(Math.abs(rounded)));
  if (roundedMagnitude > LARGEST_PLAIN_MAGNITUDE || roundedMagnitude < SMALLEST_PLAIN_MAGNITUDE) {
    const mantissa = rounded / Math.pow(10, roundedMagnitude);
    return `${formatFixed(mantissa, digits - 1)} × 10${superscriptInteger(roundedMagnitude)}`;
  }
  const decimals = Math.max(0, digits - 1 - Math.max(magnitude, roundedMagnitude));
  return formatFixed(rounded, decimals);
}

const SUPERSCRIPT_DIGITS = '⁰¹²³⁴⁵⁶⁷⁸⁹';

/** An integer in Unicode superscript digits, e.g. −3 → "⁻³". */
export function superscriptInteger(k: number): string {
  const digits = String(Math.abs(Math.trunc(k)))
    .split('')
    .map((d) => SUPERSCRIPT_DIGITS[Number(d)])
    .join('');
  return k < 0 ? `⁻${digits}` : digits;
}
