// /projects/:projectId/exports: start an export run and follow the project's runs (progress, errors,
// the bundle to download). The e-mail sent when a run finishes links here. Coming from the figure
// table's "Export selected", ?figures=1,2,3 names the chosen figures.
import { useSearchParams } from 'react-router';
import { Panel } from '../components/ui/panel';
import { ErrorPanel, Loading } from '../components/ui/status';
import { ExportRunList } from '../features/exports/components/export-run-list';
import { StartExportForm } from '../features/exports/components/start-export-form';
import { useFigures } from '../features/figures/api/get-figures';
import { useProjectFromLayout } from './project-layout';

function idsFrom(value: string | null): number[] {
  return (value ?? '')
    .split(',')
    .map(Number)
    .filter((n) => Number.isInteger(n) && n > 0);
}

export function ProjectExportsRoute() {
  const project = useProjectFromLayout();
  const figures = useFigures(project.id);
  const [params] = useSearchParams();
  const initialIds = idsFrom(params.get('figures'));

  return (
    <div className="space-y-6">
      <Panel id="start-export-title" title="New export">
        {figures.isPending ? (
          <Loading label="Loading figures…" />
        ) : figures.isError ? (
          <ErrorPanel error={figures.error} onRetry={() => void figures.refetch()} />
        ) : figures.data.length === 0 ? (
          <p className="text-sm text-stone-600">The project has no figures to export yet.</p>
        ) : (
          <StartExportForm
            // A new choice from the figure table starts the form afresh.
            key={initialIds.join(',')}
            projectId={project.id}
            figures={figures.data}
            initialIds={initialIds}
          />
        )}
        <p className="mt-4 text-sm text-stone-600">
          A bundle is a ZIP with each figure’s files named by its number, a manifest (JSON and CSV)
          with captions, alt text and checksums, and a proof sheet (PDF) of every figure.
        </p>
      </Panel>
      <section aria-labelledby="export-runs-title" className="space-y-3">
        <h2 id="export-runs-title" className="text-lg font-semibold">
          Export runs
        </h2>
        <ExportRunList projectId={project.id} />
      </section>
    </div>
  );
}
