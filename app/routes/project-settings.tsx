// /projects/:projectId/settings: the project's house style (owners change it, everyone reads it),
// and for owners renaming and archiving.
import { roleAllows } from '../../shared/api/roles';
import type { Project } from '../../shared/api/schemas';
import { Panel } from '../components/ui/panel';
import { projectBundleUrl } from '../features/bundles/api/bundle-urls';
import { BundleDownloadLink } from '../features/bundles/components/bundle-download-link';
import { ErrorPanel, Loading } from '../components/ui/status';
import { useHouseStyle } from '../features/house-style/api/get-house-style';
import { HouseStyleForm } from '../features/house-style/components/house-style-form';
import { HouseStyleSummary } from '../features/house-style/components/house-style-summary';
import { ArchiveProjectPanel } from '../features/projects/components/archive-project-panel';
import { ProjectDetailsForm } from '../features/projects/components/project-details-form';
import { useDocumentTitle } from '../hooks/use-document-title';
import { useProjectFromLayout } from './project-layout';

function HouseStylePanel({ project, canManage }: { project: Project; canManage: boolean }) {
  const style = useHouseStyle(project.id);
  return (
    <Panel id="house-style-title" title="House style">
      <p className="mb-4 max-w-3xl text-sm text-stone-700">
        Every figure in the project starts from these settings; a figure can override any of them.
      </p>
      {style.isPending ? (
        <Loading label="Loading house style…" />
      ) : style.isError ? (
        <ErrorPanel error={style.error} onRetry={() => void style.refetch()} />
      ) : canManage ? (
        <HouseStyleForm projectId={project.id} style={style.data} />
      ) : (
        <>
          <HouseStyleSummary style={style.data} />
          <p className="mt-4 text-sm text-stone-600">
            Only the project’s owners can change the house style.
          </p>
        </>
      )}
    </Panel>
  );
}

export function ProjectSettingsRoute() {
  const project = useProjectFromLayout();
  useDocumentTitle(`Settings — ${project.name}`);
  const canManage = roleAllows(project.role, 'manage');

  return (
    <div className="space-y-6">
      {canManage && (
        <div className="grid gap-6 lg:grid-cols-2">
          <Panel id="details-title" title="Details">
            <ProjectDetailsForm key={project.id} project={project} />
          </Panel>
          <Panel id="archive-title" title={project.archived ? 'Restore' : 'Archive'}>
            <ArchiveProjectPanel project={project} />
          </Panel>
        </div>
      )}
      <HouseStylePanel project={project} canManage={canManage} />
      <Panel id="bundle-title" title="Bundle">
        <p className="mb-3 max-w-3xl text-sm text-stone-700">
          One JSON file with every figure’s spec, caption and alt text, the house style and the
          uploaded data (no people or dates), to import as a new project or into another one.
        </p>
        <BundleDownloadLink href={projectBundleUrl(project.id)} />
      </Panel>
      {!canManage && (
        <p className="text-sm text-stone-600">
          Only the project’s owners can rename or archive it.
        </p>
      )}
    </div>
  );
}
