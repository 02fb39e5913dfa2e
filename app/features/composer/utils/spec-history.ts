// Undo and redo of figure-spec edits: a reducer over (past, present, future) that also knows the
// spec as last saved, so the composer can say whether there are unsaved changes. Quick runs of
// edits to one field (typing a number digit by digit) fold into one undo step.
import { canonicalJson } from '../../../../shared/spec/canonical-json';
import type { FigureSpec } from '../../../../shared/spec/figure-spec';

/** Edits to the same field closer together than this (ms) become one undo step. */
export const MERGE_WINDOW_MS = 1200;
/** Undo steps kept; older ones are dropped first. */
export const HISTORY_LIMIT = 200;

export interface SpecHistory {
  past: FigureSpec[];
  present: FigureSpec;
  future: FigureSpec[];
  /** The spec of the revision the edits started from. */
  saved: FigureSpec;
  /** That revision's number. */
  savedRevision: number;
  /** Field and time of the last edit, for folding runs of edits to one field. */
  lastEdit: { field: string; at: number } | null;
}

export type SpecHistoryAction =
  | { type: 'edit'; spec: FigureSpec; field: string; at: number }
  | { type: 'undo' }
  | { type: 'redo' }
  /** A revision was loaded (opened, saved, or chosen after a conflict): it becomes the saved state. */
  | { type: 'load'; spec: FigureSpec; revision: number; keepEdits?: boolean };

export function startHistory(spec: FigureSpec, revision: number): SpecHistory {
  return {
    past: [],
    present: spec,
    future: [],
    saved: spec,
    savedRevision: revision,
    lastEdit: null,
  };
}

export function sameSpec(a: FigureSpec, b: FigureSpec): boolean {
  return a === b || canonicalJson(a) === canonicalJson(b);
}

export function specHistoryReducer(state: SpecHistory, action: SpecHistoryAction): SpecHistory {
  switch (action.type) {
    case 'edit': {
      if (sameSpec(action.spec, state.present)) return state;
      const merge =
        state.lastEdit !== null &&
        state.lastEdit.field === action.field &&
        action.at - state.lastEdit.at < MERGE_WINDOW_MS &&
        state.past.length > 0;
      const past = merge ? state.past : [...state.past, state.present].slice(-HISTORY_LIMIT);
      return {
        ...state,
        past,
        present: action.spec,
        future: [],
        lastEdit: { field: action.field, at: action.at },
      };
    }
    case 'undo': {
      const previous = state.past.at(-1);
      if (!previous) return state;
      return {
        ...state,
        past: state.past.slice(0, -1),
        present: previous,
        future: [state.present, ...state.future],
        lastEdit: null,
      };
    }
    case 'redo': {
      const [next, ...rest] = state.future;
      if (!next) return state;
      return {
        ...state,
        past: [...state.past, state.present],
        present: next,
        future: rest,
        lastEdit: null,
      };
    }
    case 'load':
      return action.keepEdits
        ? { ...state, saved: action.spec, savedRevision: action.revision, lastEdit: null }
        : startHistory(action.spec, action.revision);
  }
}

export const canUndo = (h: SpecHistory): boolean => h.past.length > 0;
export const canRedo = (h: SpecHistory): boolean => h.future.length > 0;
export const hasUnsavedChanges = (h: SpecHistory): boolean => !sameSpec(h.present, h.saved);

/** How a control hands its edit to the history: the whole new spec and the field it changed. */
export type EditSpec = (spec: FigureSpec, field: string) => void;
