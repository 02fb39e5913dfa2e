// The project's export runs, newest first; each follows its own progress while it runs.
import { ErrorPanel, Loading } from '../../../components/ui/status';
import { useExportRuns } from '../api/get-export-runs';
import { ExportRunItem } from './export-run-item';

export function ExportRunList({ projectId }: { projectId: number }) {
  const runs = useExportRuns(projectId);
  if (runs.isPending) return <Loading label="Loading export runs…" />;
  if (runs.isError) return <ErrorPanel error={runs.error} onRetry={() => void runs.refetch()} />;
  if (runs.data.length === 0)
    return <p className="text-sm text-stone-600">No exports yet. Start one above.</p>;
  return (
    <ul className="space-y-3" aria-label="Export runs">
      {runs.data.map((run) => (
        <ExportRunItem key={run.id} run={run} />
      ))}
    </ul>
  );
}
