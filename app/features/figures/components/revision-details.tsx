// One saved revision in full, fetched when the user opens it in the revision list.
import { ErrorPanel, Loading } from '../../../components/ui/status';
import { useRevision } from '../api/get-revision';
import { FigureDetailsView } from './figure-details-view';
import { SpecSummary } from './spec-summary';

export function RevisionDetails({ figureId, revision }: { figureId: number; revision: number }) {
  const query = useRevision(figureId, revision);
  if (query.isPending) return <Loading label={`Loading revision ${revision}…`} />;
  if (query.isError) return <ErrorPanel error={query.error} onRetry={() => void query.refetch()} />;
  return (
    <div className="space-y-4">
      <FigureDetailsView figure={query.data} />
      <SpecSummary spec={query.data.spec} />
      <p className="text-xs text-stone-600">
        Spec fingerprint <code className="font-mono">{query.data.specHash.slice(0, 12)}</code>
      </p>
    </div>
  );
}
