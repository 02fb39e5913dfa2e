// Figure numbers on import and copy: a number already used in the project gets the first free
// suffix ("4.1" → "4.1-2", then "4.1-3"), kept within the 20 characters a number may have.
const MAX_NUMBER_LENGTH = 20;

export function freeFigureNumber(number: string, used: ReadonlySet<string>): string {
  if (!number || !used.has(number)) return number;
  for (let k = 2; ; k++) {
    const suffix = `-${k}`;
    const candidate = number.slice(0, MAX_NUMBER_LENGTH - suffix.length) + suffix;
    if (!used.has(candidate)) return candidate;
  }
}
