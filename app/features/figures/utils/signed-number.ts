// Integers as set in print: a true minus sign (U+2212), and a plus sign where the sign matters.
export function signedNumber(x: number, { plus = false }: { plus?: boolean } = {}): string {
  if (x < 0) return `−${-x}`;
  return plus && x > 0 ? `+${x}` : String(x);
}
