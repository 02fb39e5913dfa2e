// A JSON document as a flat list of (dotted path, printed value) rows, for showing two revisions
// side by side with the changed rows marked (the paths match shared/spec/changed-paths).
export interface SettingRow {
  path: string;
  value: string;
}

export function flattenSettings(value: unknown, prefix = ''): SettingRow[] {
  if (value === null || typeof value !== 'object') {
    return [{ path: prefix || '(value)', value: value === undefined ? '' : JSON.stringify(value) }];
  }
  const entries = Array.isArray(value)
    ? value.map((v, i) => [String(i), v] as const)
    : Object.entries(value as Record<string, unknown>).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
  if (entries.length === 0) return [{ path: prefix || '(value)', value: Array.isArray(value) ? '[]' : '{}' }];
  return entries.flatMap(([k, v]) => flattenSettings(v, prefix ? `${prefix}.${k}` : k));
}
