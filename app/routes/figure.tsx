// /figures/:figureId: one figure: the composer (controls, live preview, save as a new revision,
// downloads), its details (editable by editors, saved as revisions), its spec in words, its review
// and its revision history.
import { useQueryClient } from '@tanstack/react-query';
import { Link, useNavigate, useParams } from 'react-router';
import { roleAllows } from '../../shared/api/roles';
import type { Figure, Project } from '../../shared/api/schemas';
import { PageHeader } from '../components/ui/page-header';
import { RoleBadge } from '../components/ui/role-badge';
import { Panel } from '../components/ui/panel';
import { ErrorPanel, Loading } from '../components/ui/status';
import { figureBundleUrl } from '../features/bundles/api/bundle-urls';
import { BundleDownloadLink } from '../features/bundles/components/bundle-download-link';
import { useFigure } from '../features/figures/api/get-figure';
import { FigureActions } from '../features/figures/components/figure-actions';
import { FigureDetailsForm } from '../features/figures/components/figure-details-form';
import { FigureDetailsView } from '../features/figures/components/figure-details-view';
import { RevisionList } from '../features/figures/components/revision-list';
import { SpecSummary } from '../features/figures/components/spec-summary';
import { StatusBadge } from '../features/figures/components/status-badge';
import { useHouseStyle } from '../features/house-style/api/get-house-style';
import { useProject } from '../features/projects/api/get-project';
import { ReviewPanel } from '../features/review/components/review-panel';
import { projectsQueryKey } from '../features/projects/api/get-projects';
import { useDocumentTitle } from '../hooks/use-document-title';
import { Composer } from '../features/composer/components/composer';
import { useCreateFigure } from '../features/figures/api/create-figure';
import { useUpdateFigure } from '../features/figures/api/update-figure';
import type { HouseStyle } from '../../shared/spec/house-style';
import { Figure3dPreview } from './figure-3d-view';
import { NotFoundRoute } from './not-found';
import { parseIdParam } from './parse-id-param';

export function FigureRoute() {
  const figureId = parseIdParam(useParams().figureId);
  if (figureId === null) return <NotFoundRoute />;
  return <FigureLoader figureId={figureId} />;
}

function FigureLoader({ figureId }: { figureId: number }) {
  const figure = useFigure(figureId);
  useDocumentTitle(
    figure.data
      ? `${figure.data.number ? `Figure ${figure.data.number}: ` : ''}${figure.data.title}`
      : 'Figure',
  );
  if (figure.isPending) return <Loading label="Loading figure…" />;
  if (figure.isError)
    return <ErrorPanel error={figure.error} onRetry={() => void figure.refetch()} />;
  return <FigureWithProject figure={figure.data} />;
}

function FigureWithProject({ figure }: { figure: Figure }) {
  const project = useProject(figure.projectId);
  if (project.isPending) return <Loading label="Loading project…" />;
  if (project.isError)
    return <ErrorPanel error={project.error} onRetry={() => void project.refetch()} />;
  return <FigurePage figure={figure} project={project.data} />;
}

function FigurePage({ figure, project }: { figure: Figure; project: Project }) {
  // Only sharpens the print line of the summary, so the page does not wait for it.
  const houseStyle = useHouseStyle(project.id);
  const navigate = useNavigate();
  const queryClient = useQueryClient();
  const canEdit = roleAllows(project.role, 'edit') && !project.archived;
  const refreshProjects = () => void queryClient.invalidateQueries({ queryKey: projectsQueryKey });

  return (
    <>
      <PageHeader
        context={
          <nav aria-label="Breadcrumb">
            <ol className="flex flex-wrap gap-1">
              <li>
                <Link to="/" className="underline underline-offset-2 hover:text-stone-900">
                  Projects
                </Link>
                <span aria-hidden="true"> / </span>
              </li>
              <li>
                <Link
                  to={`/projects/${project.id}`}
                  className="underline underline-offset-2 hover:text-stone-900"
                >
                  {project.name}
                </Link>
              </li>
            </ol>
          </nav>
        }
        title={
          <>
            {figure.number && <span className="mr-2 text-stone-600">Figure {figure.number}</span>}
            {figure.title}
          </>
        }
        actions={
          canEdit && (
            <FigureActions
              figure={figure}
              onDuplicated={(copy) => {
                refreshProjects();
                void navigate(`/figures/${copy.id}`);
              }}
              onDeleted={() => {
                refreshProjects();
                void navigate(`/projects/${project.id}`, { replace: true });
              }}
            />
          )
        }
      >
        <div className="flex flex-wrap items-center gap-3 text-sm text-stone-700">
          <StatusBadge status={figure.status} />
          <span>Revision {figure.revision}</span>
          {figure.approvedRevision !== null && (
            <span>Approved at revision {figure.approvedRevision}</span>
          )}
          <RoleBadge role={project.role} />
          <BundleDownloadLink href={figureBundleUrl(figure.id)} />
          {canEdit && (
            <Link to={`/figures/${figure.id}/copy`} className="underline underline-offset-2">
              Copy to another project
            </Link>
          )}
        </div>
      </PageHeader>

      <div className="mb-6">
        <Panel id="composer-title" title="Composer">
          {houseStyle.isPending ? (
            <Loading label="Loading the project’s house style…" />
          ) : houseStyle.isError ? (
            <ErrorPanel error={houseStyle.error} onRetry={() => void houseStyle.refetch()} />
          ) : (
            <FigureComposer
              key={figure.id}
              figure={figure}
              houseStyle={houseStyle.data}
              canEdit={canEdit}
              onDuplicated={(copy) => {
                refreshProjects();
                void navigate(`/figures/${copy.id}`);
              }}
            />
          )}
        </Panel>
      </div>
      <div className="grid gap-6 lg:grid-cols-[3fr_2fr]">
        <Panel id="details-title" title="Details">
          {canEdit ? (
            <FigureDetailsForm key={figure.id} figure={figure} />
          ) : (
            <>
              <FigureDetailsView figure={figure} />
              <p className="mt-4 text-sm text-stone-600">
                {project.archived
                  ? 'The project is archived, so its figures are read-only.'
                  : 'Only editors and owners can change figures.'}
              </p>
            </>
          )}
        </Panel>
        <Panel id="spec-title" title="What the figure shows">
          <SpecSummary spec={figure.spec} houseStyle={houseStyle.data} />
        </Panel>
        <ReviewPanel figureId={figure.id} />
      </div>
      <div className="mt-6">
        <Panel id="revisions-title" title="Revisions">
          <RevisionList figure={figure} canEdit={canEdit} />
        </Panel>
      </div>
    </>
  );
}

function FigureComposer({
  figure,
  houseStyle,
  canEdit,
  onDuplicated,
}: {
  figure: Figure;
  houseStyle: HouseStyle;
  canEdit: boolean;
  onDuplicated: (copy: Figure) => void;
}) {
  const update = useUpdateFigure(figure.id, figure.projectId);
  const create = useCreateFigure(figure.projectId);
  return (
    <Composer
      figure={figure}
      houseStyle={houseStyle}
      canEdit={canEdit}
      readOnlyReason="Read-only: you can look at this figure and download it, but not change it."
      save={(spec, baseRevision, message) => update.mutateAsync({ baseRevision, spec, message })}
      duplicate={async (spec) => {
        const copy = await create.mutateAsync({
          title: `${figure.title} (copy)`,
          caption: figure.caption,
          altText: figure.altText,
          spec,
        });
        onDuplicated(copy);
      }}
      render3d={(spec, { onViewChange, viewOnlyChange }) => (
        <Figure3dPreview
          spec={spec}
          figure={figure}
          canEdit={canEdit}
          viewOnlyChange={viewOnlyChange}
          onViewChange={onViewChange}
        />
      )}
    />
  );
}
