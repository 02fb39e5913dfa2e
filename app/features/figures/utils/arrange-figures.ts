// Pure steps of arranging a figure list before it is saved as one order: moving a figure, numbering
// the list in sequence under a chapter prefix, and finding numbers used twice.
import { figureNumberSchema } from '../../../../shared/api/schemas';

export interface ArrangedFigure {
  id: number;
  number: string;
}

/** A copy of `items` with the item at `from` moved to `to`; out-of-range moves change nothing. */
export function moveItem<T>(items: readonly T[], from: number, to: number): T[] {
  const copy = [...items];
  if (from < 0 || from >= copy.length || to < 0 || to >= copy.length || from === to) return copy;
  const [item] = copy.splice(from, 1);
  copy.splice(to, 0, item);
  return copy;
}

/**
 * Numbers "4.1", "4.2", … in list order under `prefix` ("4" or "4."); an empty prefix gives
 * "1", "2", …. Throws when the prefix would make numbers the schema refuses, naming the field.
 */
export function sequentialNumbers(count: number, prefix: string): string[] {
  const stem = prefix.trim().replace(/\.+$/, '');
  const numbers = Array.from({ length: count }, (_, i) => (stem ? `${stem}.${i + 1}` : `${i + 1}`));
  const bad = numbers.find((n) => !figureNumberSchema.safeParse(n).success);
  if (bad !== undefined)
    throw new RangeError(`prefix: “${prefix}” would give “${bad}”; use digits, letters, dots and dashes`);
  return numbers;
}

/** Gives each figure, in its current place, the sequential number for that place. */
export function renumberSequentially(figures: readonly ArrangedFigure[], prefix: string): ArrangedFigure[] {
  const numbers = sequentialNumbers(figures.length, prefix);
  return figures.map((f, i) => ({ ...f, number: numbers[i] }));
}

/** Numbers given to more than one figure (blank numbers may repeat). */
export function duplicateNumbers(figures: readonly ArrangedFigure[]): Set<string> {
  const seen = new Set<string>();
  const twice = new Set<string>();
  for (const { number } of figures) {
    const n = number.trim();
    if (!n) continue;
    if (seen.has(n)) twice.add(n);
    seen.add(n);
  }
  return twice;
}

/** Whether the arranged list differs from the saved one in order or in any number. */
export function arrangementChanged(
  saved: readonly ArrangedFigure[],
  arranged: readonly ArrangedFigure[],
): boolean {
  return (
    saved.length !== arranged.length ||
    saved.some((f, i) => f.id !== arranged[i].id || f.number !== arranged[i].number.trim())
  );
}
