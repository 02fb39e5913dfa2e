// The composer's spec with undo and redo: Ctrl/⌘+Z undoes, Shift+Ctrl/⌘+Z (or Ctrl+Y) redoes,
// except while typing in a text box, where the browser's own text undo applies. Leaving the page
// with unsaved changes (closing the tab, or following a link) asks first.
import { useCallback, useEffect, useReducer, useRef } from 'react';
import { useBlocker } from 'react-router';
import type { FigureSpec } from '../../../../shared/spec/figure-spec';
import {
  hasUnsavedChanges,
  specHistoryReducer,
  startHistory,
  type SpecHistory,
} from '../utils/spec-history';

function typingText(target: EventTarget | null): boolean {
  if (target instanceof HTMLTextAreaElement) return true;
  return target instanceof HTMLInputElement && (target.type === 'text' || target.type === 'search');
}

export function useSpecHistory(spec: FigureSpec, revision: number, enabled: boolean) {
  const [history, dispatch] = useReducer(specHistoryReducer, undefined, (): SpecHistory =>
    startHistory(spec, revision),
  );
  const dirty = hasUnsavedChanges(history);

  const edit = useCallback(
    (next: FigureSpec, field: string) =>
      dispatch({ type: 'edit', spec: next, field, at: Date.now() }),
    [],
  );
  const undo = useCallback(() => dispatch({ type: 'undo' }), []);
  const redo = useCallback(() => dispatch({ type: 'redo' }), []);
  const load = useCallback(
    (next: FigureSpec, rev: number, keepEdits = false) =>
      dispatch({ type: 'load', spec: next, revision: rev, keepEdits }),
    [],
  );

  useEffect(() => {
    if (!enabled) return;
    const onKey = (event: KeyboardEvent) => {
      if (!(event.ctrlKey || event.metaKey) || event.altKey || typingText(event.target)) return;
      const key = event.key.toLowerCase();
      if (key === 'z' && !event.shiftKey) undo();
      else if ((key === 'z' && event.shiftKey) || (key === 'y' && !event.shiftKey)) redo();
      else return;
      event.preventDefault();
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [enabled, undo, redo]);

  // Moving to another page inside the app asks too, unless the changes went with the user (a copy).
  const leaving = useRef(false);
  const allowLeave = useCallback(() => {
    leaving.current = true;
  }, []);
  const blocker = useBlocker(
    ({ currentLocation, nextLocation }) =>
      dirty && !leaving.current && currentLocation.pathname !== nextLocation.pathname,
  );
  useEffect(() => {
    if (blocker.state !== 'blocked') return;
    if (window.confirm('This figure has unsaved changes. Leave the page and drop them?'))
      blocker.proceed();
    else blocker.reset();
  }, [blocker]);

  useEffect(() => {
    if (!dirty) return;
    const warn = (event: BeforeUnloadEvent) => event.preventDefault();
    window.addEventListener('beforeunload', warn);
    return () => window.removeEventListener('beforeunload', warn);
  }, [dirty]);

  return { history, dirty, edit, undo, redo, load, allowLeave };
}
