// Someone saved a newer revision while this user was editing: what it changed, and the choice
// between loading it (dropping these edits) and saving these edits on top of it.
import { Button } from '../../../components/ui/button';
import type { SpecChange } from '../utils/spec-diff';

export function StaleNotice({
  revision,
  savedBy,
  theirChanges,
  busy,
  onLoadTheirs,
  onSaveMine,
}: {
  revision: number;
  savedBy: string;
  theirChanges: readonly SpecChange[];
  busy: boolean;
  onLoadTheirs: () => void;
  onSaveMine: () => void;
}) {
  return (
    <div
      role="alert"
      className="space-y-2 rounded-lg border border-amber-300 bg-amber-50 p-3 text-sm text-amber-950"
    >
      <p className="font-semibold">
        {savedBy} saved revision {revision} while you were editing.
      </p>
      {theirChanges.length > 0 ? (
        <details>
          <summary className="cursor-pointer">
            Revision {revision} changed{' '}
            {theirChanges.length === 1 ? 'one setting' : `${theirChanges.length} settings`} of the
            figure
          </summary>
          <ul className="mt-1 list-disc pl-5 font-mono text-xs">
            {theirChanges.slice(0, 20).map((c) => (
              <li key={c.path}>
                {c.path}: {c.from} → {c.to}
              </li>
            ))}
          </ul>
        </details>
      ) : (
        <p>Revision {revision} did not change the figure itself (only its details).</p>
      )}
      <div className="flex flex-wrap gap-2">
        <Button size="sm" onClick={onLoadTheirs} disabled={busy}>
          Load revision {revision} (drop my changes)
        </Button>
        <Button size="sm" variant="primary" onClick={onSaveMine} busy={busy}>
          Save mine on top of revision {revision}
        </Button>
      </div>
    </div>
  );
}
