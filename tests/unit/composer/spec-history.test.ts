// Undo and redo of composer edits: steps, folding quick edits of one field, the saved state and
// unsaved changes. (Behaviour of the composer itself; no outside reference needed.)
import { describe, expect, it } from 'vitest';
import { figureSpecSchema, type FigureSpec } from '../../../shared/spec/figure-spec';
import {
  canRedo,
  canUndo,
  hasUnsavedChanges,
  MERGE_WINDOW_MS,
  specHistoryReducer,
  startHistory,
  type SpecHistory,
  type SpecHistoryAction,
} from '../../../app/features/composer/utils/spec-history';
import { setQuantumNumber } from '../../../app/features/composer/utils/spec-edits';

const base: FigureSpec = figureSpecSchema.parse({
  schemaVersion: 1,
  state: { terms: [{ n: 3, l: 2, m: 0 }] },
  kind: { type: 'isosurface' },
});

const run = (h: SpecHistory, ...actions: SpecHistoryAction[]) =>
  actions.reduce(specHistoryReducer, h);
const edit = (spec: FigureSpec, field: string, at: number): SpecHistoryAction => ({
  type: 'edit',
  spec,
  field,
  at,
});
const n = (h: SpecHistory) => h.present.state.terms[0].n;

describe('composer undo and redo', () => {
  it('when nothing was edited, then there is nothing to undo or redo and nothing unsaved', () => {
    const h = startHistory(base, 4);
    expect(canUndo(h)).toBe(false);
    expect(canRedo(h)).toBe(false);
    expect(hasUnsavedChanges(h)).toBe(false);
    expect(run(h, { type: 'undo' }, { type: 'redo' })).toBe(h);
  });

  it('when two fields are edited, then undo walks back one step each and redo forward again', () => {
    const a = setQuantumNumber(base, 0, 'n', 4);
    const b = setQuantumNumber(a, 0, 'l', 3);
    let h = run(startHistory(base, 4), edit(a, 'n', 0), edit(b, 'l', 10));
    expect(h.past).toHaveLength(2);
    expect(hasUnsavedChanges(h)).toBe(true);
    h = run(h, { type: 'undo' });
    expect(h.present).toBe(a);
    h = run(h, { type: 'undo' });
    expect(h.present).toBe(base);
    expect(hasUnsavedChanges(h)).toBe(false);
    h = run(h, { type: 'redo' }, { type: 'redo' });
    expect(h.present).toBe(b);
    expect(canRedo(h)).toBe(false);
  });

  it('when one field is typed quickly, then the run is one undo step; after a pause it is a new one', () => {
    const specs = [4, 5, 6].map((v) => setQuantumNumber(base, 0, 'n', v));
    let h = run(
      startHistory(base, 1),
      edit(specs[0], 'n', 0),
      edit(specs[1], 'n', 100),
      edit(specs[2], 'n', 100 + MERGE_WINDOW_MS + 1),
    );
    expect(h.past.map((s) => s.state.terms[0].n)).toEqual([3, 5]);
    h = run(h, { type: 'undo' }, { type: 'undo' });
    expect(n(h)).toBe(3);
  });

  it('when a new edit follows an undo, then the redo steps are dropped', () => {
    const a = setQuantumNumber(base, 0, 'n', 4);
    const b = setQuantumNumber(base, 0, 'n', 5);
    const h = run(startHistory(base, 1), edit(a, 'n', 0), { type: 'undo' }, edit(b, 'n', 5000));
    expect(canRedo(h)).toBe(false);
    expect(n(h)).toBe(5);
  });

  it('when an edit changes nothing, then no undo step is added', () => {
    const copy = structuredClone(base);
    const h = run(startHistory(base, 1), edit(copy, 'n', 0));
    expect(canUndo(h)).toBe(false);
  });

  it('when a save is loaded keeping the edits, then the edits count as saved but can still be undone', () => {
    const a = setQuantumNumber(base, 0, 'n', 4);
    const h = run(startHistory(base, 1), edit(a, 'n', 0), {
      type: 'load',
      spec: a,
      revision: 2,
      keepEdits: true,
    });
    expect(hasUnsavedChanges(h)).toBe(false);
    expect(h.savedRevision).toBe(2);
    expect(canUndo(h)).toBe(true);
  });

  it('when another revision is loaded, then history starts again from it', () => {
    const a = setQuantumNumber(base, 0, 'n', 4);
    const h = run(startHistory(base, 1), edit(a, 'n', 0), {
      type: 'load',
      spec: base,
      revision: 3,
    });
    expect(canUndo(h)).toBe(false);
    expect(h.present).toBe(base);
    expect(h.savedRevision).toBe(3);
  });
});
