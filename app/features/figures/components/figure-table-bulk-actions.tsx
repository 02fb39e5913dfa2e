// What can be done to the selected rows of the figure table at once: submit them for review or
// delete them (editors; deleting asks first and names the figures), or export them (any member).
import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { FormAlert, SavedNote } from '../../../components/ui/status';
import { formErrorMessage } from '../../../lib/form-errors';
import type { FigureSummary } from '../../../../shared/api/schemas';
import { useBulkFigureAction, type BulkResult } from '../api/bulk-figure-action';
import { figureLabel } from '../utils/figure-label';

interface BulkActionsProps {
  projectId: number;
  selected: FigureSummary[];
  canEdit: boolean;
  onExport?: (ids: number[]) => void;
  onClear: () => void;
  onDeleted: (ids: number[]) => void;
}

function plural(n: number, one: string, many: string): string {
  return `${n} ${n === 1 ? one : many}`;
}

function outcome(result: BulkResult, verb: string, byId: Map<number, FigureSummary>): string {
  const done = `${plural(result.done.length, 'figure', 'figures')} ${verb}.`;
  if (result.skipped.length === 0) return done;
  const skipped = result.skipped.map((s) => {
    const f = byId.get(s.id);
    return `${f ? figureLabel(f) : `figure #${s.id}`}: ${s.reason}`;
  });
  return `${done} Skipped ${skipped.join('; ')}.`;
}

export function FigureTableBulkActions({
  projectId,
  selected,
  canEdit,
  onExport,
  onClear,
  onDeleted,
}: BulkActionsProps) {
  const bulk = useBulkFigureAction(projectId);
  const [confirming, setConfirming] = useState(false);
  // The outcome of the last action, shown only while the selection is the one it left behind.
  const [outcomeOf, setOutcomeOf] = useState<{ text: string; selection: string } | null>(null);
  const ids = selected.map((f) => f.id);
  const selectionKey = ids.join(',');
  const message = outcomeOf?.selection === selectionKey ? outcomeOf.text : null;
  const one = selected.length === 1;
  const none = selected.length === 0;
  const byId = new Map(selected.map((f) => [f.id, f]));

  function submitForReview() {
    setOutcomeOf(null);
    bulk.mutate(
      { ids, action: 'submit' },
      {
        onSuccess: (result) =>
          setOutcomeOf({
            text: outcome(result, 'submitted for review', byId),
            selection: selectionKey,
          }),
      },
    );
  }

  function remove() {
    setOutcomeOf(null);
    bulk.mutate(
      { ids, action: 'delete' },
      {
        onSuccess: (result) => {
          setConfirming(false);
          const left = ids.filter((id) => !result.done.includes(id));
          setOutcomeOf({ text: outcome(result, 'deleted', byId), selection: left.join(',') });
          onDeleted(result.done);
        },
      },
    );
  }

  return (
    <div
      role="region"
      aria-label="Selected figures"
      className="flex flex-wrap items-center gap-3 rounded-lg border border-accent-200 bg-accent-50 px-4 py-2"
    >
      <p className="text-sm font-semibold text-accent-900">
        {none
          ? 'Tick figures to act on several at once.'
          : `${plural(selected.length, 'figure', 'figures')} selected`}
      </p>
      {canEdit && (
        <>
          <Button
            size="sm"
            disabled={none}
            busy={bulk.isPending && !confirming}
            onClick={submitForReview}
          >
            Submit for review
          </Button>
          <Button size="sm" variant="danger" disabled={none} onClick={() => setConfirming(true)}>
            Delete…
          </Button>
        </>
      )}
      {onExport && (
        <Button size="sm" disabled={none} onClick={() => onExport(ids)}>
          Export selected
        </Button>
      )}
      {!none && (
        <Button size="sm" variant="quiet" onClick={onClear}>
          Clear selection
        </Button>
      )}
      {!confirming && <FormAlert message={formErrorMessage(bulk.error)} />}
      {message && <SavedNote>{message}</SavedNote>}
      <Dialog
        open={confirming}
        onClose={() => setConfirming(false)}
        title={`Delete ${plural(selected.length, 'figure', 'figures')}?`}
        description={`This removes ${one ? 'this figure and all its' : 'these figures and all their'} revisions from the project. It cannot be undone.`}
      >
        <ul className="max-h-60 list-disc space-y-1 overflow-y-auto pl-5 text-sm">
          {selected.map((f) => (
            <li key={f.id}>
              {f.number && <span className="mr-1 tabular-nums text-stone-600">{f.number}</span>}
              {f.title}
            </li>
          ))}
        </ul>
        <FormAlert message={formErrorMessage(bulk.error)} />
        <div className="flex justify-end gap-2">
          <Button onClick={() => setConfirming(false)}>{one ? 'Keep it' : 'Keep them'}</Button>
          <Button variant="danger" busy={bulk.isPending} onClick={remove}>
            {bulk.isPending ? 'Deleting…' : `Delete ${plural(selected.length, 'figure', 'figures')}`}
          </Button>
        </div>
      </Dialog>
    </div>
  );
}
