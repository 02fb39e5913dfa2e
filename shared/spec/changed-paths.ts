// What changed between two JSON values, as dotted paths to the changed leaves ("kind.enclosed",
// "state.terms.0.m"). Arrays of different lengths count as one change at the array's path.
export function changedPaths(before: unknown, after: unknown, prefix = ''): string[] {
  if (Object.is(before, after)) return [];
  const bothObjects =
    typeof before === 'object' && before !== null && typeof after === 'object' && after !== null;
  if (!bothObjects || Array.isArray(before) !== Array.isArray(after)) return [prefix || '(value)'];
  if (Array.isArray(before) && Array.isArray(after) && before.length !== after.length) return [prefix || '(value)'];
  const a = before as Record<string, unknown>;
  const b = after as Record<string, unknown>;
  const keys = [...new Set([...Object.keys(a), ...Object.keys(b)])].sort();
  return keys.flatMap((k) => changedPaths(a[k], b[k], prefix ? `${prefix}.${k}` : k));
}
