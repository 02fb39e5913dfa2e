// One saved revision in full, fetched when the user opens it in the revision list: what it held,
// how it differs from the latest revision, and (for editors) a way to restore it as a new revision.
import { Button } from '../../../components/ui/button';
import { ErrorPanel, FormAlert, Loading, SavedNote } from '../../../components/ui/status';
import { formErrorMessage } from '../../../lib/form-errors';
import type { Figure, Revision } from '../../../../shared/api/schemas';
import { useRevision } from '../api/get-revision';
import { useUpdateFigure } from '../api/update-figure';
import { revisionDifferences } from '../utils/compare-revisions';
import { FigureDetailsView } from './figure-details-view';
import { RevisionSideBySide } from './revision-side-by-side';
import { SpecSummary } from './spec-summary';

interface RevisionDetailsProps {
  figure: Figure;
  revision: number;
  latestSpecHash: string | undefined;
  canEdit: boolean;
}

function RestoreRevision({
  figure,
  saved,
  unchanged,
}: {
  figure: Figure;
  saved: Revision;
  unchanged: boolean;
}) {
  const update = useUpdateFigure(figure.id, figure.projectId);
  const restore = () =>
    update.mutate({
      // On top of the latest revision as this page knows it; a newer one makes the server refuse.
      baseRevision: figure.revision,
      title: saved.title,
      // An unnumbered revision keeps the current number: the API cannot clear one.
      number: saved.number || undefined,
      caption: saved.caption,
      altText: saved.altText,
      spec: saved.spec,
      message: `Restored revision ${saved.revision}`,
    });
  return (
    <div className="space-y-2">
      <Button size="sm" busy={update.isPending} disabled={unchanged} onClick={restore}>
        {update.isPending ? 'Restoring…' : `Restore revision ${saved.revision}`}
      </Button>
      <FormAlert message={formErrorMessage(update.error)} />
      {update.isSuccess && (
        <SavedNote>
          Revision {saved.revision} restored as revision {update.data.revision}.
        </SavedNote>
      )}
    </div>
  );
}

export function RevisionDetails({
  figure,
  revision,
  latestSpecHash,
  canEdit,
}: RevisionDetailsProps) {
  const query = useRevision(figure.id, revision);
  if (query.isPending) return <Loading label={`Loading revision ${revision}…`} />;
  if (query.isError) return <ErrorPanel error={query.error} onRetry={() => void query.refetch()} />;
  const saved = query.data;
  const latest = saved.revision === figure.revision;
  const differences = latest ? [] : revisionDifferences(saved, figure, latestSpecHash);
  return (
    <div className="space-y-4">
      {!latest && (
        <p className="text-sm font-semibold text-stone-800">
          {differences.length
            ? `Differs from the latest revision (${figure.revision}) in: ${differences.join(', ')}.`
            : `Same as the latest revision (${figure.revision}).`}
        </p>
      )}
      {!latest && <RevisionSideBySide figure={figure} older={saved} />}
      <FigureDetailsView figure={saved} />
      <SpecSummary spec={saved.spec} />
      <p className="text-xs text-stone-600">
        Spec fingerprint <code className="font-mono">{saved.specHash.slice(0, 12)}</code>
      </p>
      {canEdit && !latest && (
        <RestoreRevision figure={figure} saved={saved} unchanged={differences.length === 0} />
      )}
    </div>
  );
}
