// Side-by-side revision rows: every leaf of the document appears once, and the rows that
// changedPaths reports are exactly the rows whose printed values differ.
import { describe, expect, it } from 'vitest';
import { changedPaths } from '../../../shared/spec/changed-paths';
import { flattenSettings } from '../../../shared/spec/flatten-settings';

describe('flattenSettings', () => {
  it('when a spec-like document is flattened, then each leaf is a dotted path with its JSON value', () => {
    expect(flattenSettings({ kind: { type: 'isosurface', enclosed: 0.9 }, terms: [{ n: 2 }], look: {} })).toEqual([
      { path: 'kind.enclosed', value: '0.9' },
      { path: 'kind.type', value: '"isosurface"' },
      { path: 'look', value: '{}' },
      { path: 'terms.0.n', value: '2' },
    ]);
  });

  it('when two revisions differ in one setting, then changedPaths names exactly the row whose value differs', () => {
    const a = { title: 'A', spec: { kind: { enclosed: 0.9, grid: 96 } } };
    const b = { title: 'A', spec: { kind: { enclosed: 0.95, grid: 96 } } };
    const rowsA = new Map(flattenSettings(a).map((r) => [r.path, r.value]));
    const rowsB = new Map(flattenSettings(b).map((r) => [r.path, r.value]));
    const differing = [...rowsA.keys()].filter((k) => rowsA.get(k) !== rowsB.get(k));
    expect(changedPaths(a, b)).toEqual(differing);
    expect(differing).toEqual(['spec.kind.enclosed']);
  });
});
