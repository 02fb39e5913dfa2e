// A revision's changed fields (dotted paths from the server: "title", "spec.kind.enclosed",
// "spec.state.terms.0.weight.re") in the words the revision list shows: "title", "kind.enclosed",
// "state.terms". Paths are cut at a list index and after two levels, so one edit to an orbital
// term reads as one change rather than five.
const MAX_DEPTH = 2;
const MAX_SHOWN = 6;

const NAMES: Record<string, string> = { altText: 'alt text', '(value)': 'everything' };

function words(segment: string): string {
  return NAMES[segment] ?? segment.replace(/([a-z0-9])([A-Z])/g, '$1 $2').toLowerCase();
}

export function changedFieldNames(paths: readonly string[]): string[] {
  const names = paths.map((path) => {
    const segments = path.split('.');
    const inSpec = segments[0] === 'spec' && segments.length > 1 ? segments.slice(1) : segments;
    const index = inSpec.findIndex((s) => /^\d+$/.test(s));
    const kept = (index === -1 ? inSpec : inSpec.slice(0, Math.max(index, 1))).slice(0, MAX_DEPTH);
    return kept.map(words).join('.');
  });
  return [...new Set(names)];
}

/** "changed: title, kind.enclosed", "first revision", "no changes", "… and 3 more". */
export function describeChanges(paths: readonly string[], isFirst: boolean): string {
  if (paths.length === 0) return isFirst ? 'first revision' : 'no changes';
  const names = changedFieldNames(paths);
  const shown = names.slice(0, MAX_SHOWN).join(', ');
  const more = names.length - MAX_SHOWN;
  return `changed: ${shown}${more > 0 ? ` and ${more} more` : ''}`;
}
