// "1 other session", "3 other sessions": a count with the noun that agrees with it.
export function countOf(count: number, singular: string, plural: string): string {
  return `${count} ${count === 1 ? singular : plural}`;
}
