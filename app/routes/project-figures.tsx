// /projects/:projectId: the project's figures, and (for editors) a way to add one. While some
// figures' print files are out of date (after a house-style change the server re-renders them in
// the background) the list is fetched again every few seconds, until nothing has changed for a while.
import { useQuery, useQueryClient } from '@tanstack/react-query';
import { useRef, useState } from 'react';
import { useNavigate } from 'react-router';
import { roleAllows } from '../../shared/api/roles';
import { Button } from '../components/ui/button';
import { Dialog } from '../components/ui/dialog';
import { ErrorPanel, Loading } from '../components/ui/status';
import { projectBundleUrl } from '../features/bundles/api/bundle-urls';
import { BundleDownloadLink } from '../features/bundles/components/bundle-download-link';
import { ImportBundleForm } from '../features/bundles/components/import-bundle-form';
import { figuresQueryKey, getFiguresQueryOptions } from '../features/figures/api/get-figures';
import { CreateFigureForm } from '../features/figures/components/create-figure-form';
import { FigureTable } from '../features/figures/components/figure-table';
import { projectsQueryKey } from '../features/projects/api/get-projects';
import { useProjectFromLayout } from './project-layout';

const OUT_OF_DATE_POLL_MS = 4000;
/** Figures that were never rendered stay out of date until exported: stop asking after a while. */
const GIVE_UP_AFTER_MS = 3 * 60_000;

export function ProjectFiguresRoute() {
  const project = useProjectFromLayout();
  // Which figures were out of date at the last answer, and since when that list has not changed.
  const progress = useRef({ outOfDate: '', since: 0 });
  const figures = useQuery({
    ...getFiguresQueryOptions(project.id),
    refetchInterval: (query) => {
      const outOfDate = (query.state.data ?? [])
        .filter((f) => !f.printFilesCurrent)
        .map((f) => f.id)
        .join(',');
      const now = Date.now();
      if (outOfDate !== progress.current.outOfDate) progress.current = { outOfDate, since: now };
      if (!outOfDate || now - progress.current.since > GIVE_UP_AFTER_MS) return false;
      return OUT_OF_DATE_POLL_MS;
    },
  });
  const outOfDate = figures.data?.filter((f) => !f.printFilesCurrent).length ?? 0;
  const [creating, setCreating] = useState(false);
  const navigate = useNavigate();
  const queryClient = useQueryClient();
  const canEdit = roleAllows(project.role, 'edit') && !project.archived;

  return (
    <section aria-labelledby="figures-title" className="space-y-4">
      <div className="flex flex-wrap items-center justify-between gap-4">
        <h2 id="figures-title" className="text-lg font-semibold">
          Figures
        </h2>
        <div className="flex flex-wrap gap-2">
          <BundleDownloadLink href={projectBundleUrl(project.id)} />
          {canEdit && (
            <Button variant="primary" onClick={() => setCreating(true)}>
              New figure
            </Button>
          )}
        </div>
      </div>
      {figures.isPending ? (
        <Loading label="Loading figures…" />
      ) : figures.isError ? (
        <ErrorPanel error={figures.error} onRetry={() => void figures.refetch()} />
      ) : (
        <>
          {outOfDate > 0 && (
            <p className="text-sm text-stone-600">
              Print files of {outOfDate} {outOfDate === 1 ? 'figure are' : 'figures are'} out of
              date: not rendered for the figure’s current spec and house style yet.
            </p>
          )}
          <FigureTable
            projectId={project.id}
            figures={figures.data}
            canEdit={canEdit}
            onExportSelected={(ids) =>
              void navigate(`/projects/${project.id}/exports?figures=${ids.join(',')}`)
            }
            onDeleted={() => void queryClient.invalidateQueries({ queryKey: projectsQueryKey })}
          />
        </>
      )}
      {canEdit && (
        <details className="rounded-xl border border-stone-200 bg-white p-4">
          <summary className="cursor-pointer text-sm font-semibold">
            Import figures from a bundle
          </summary>
          <div className="mt-3">
            <ImportBundleForm
              target={project.id}
              onImported={() => {
                void queryClient.invalidateQueries({ queryKey: projectsQueryKey });
                void queryClient.invalidateQueries({ queryKey: figuresQueryKey });
              }}
            />
          </div>
        </details>
      )}
      <Dialog
        open={creating}
        onClose={() => setCreating(false)}
        title="New figure"
        description="Pick what to draw and which orbital; colours, size and resolution start from the project’s house style and can be changed later."
      >
        <CreateFigureForm
          projectId={project.id}
          onCancel={() => setCreating(false)}
          onCreated={(figure) => {
            setCreating(false);
            // The project's figure count changed too.
            void queryClient.invalidateQueries({ queryKey: projectsQueryKey });
            void navigate(`/figures/${figure.id}`);
          }}
        />
      </Dialog>
    </section>
  );
}
