// /projects/:projectId/settings: rename, describe and archive the project (owners only).
import { roleAllows } from '../../shared/api/roles';
import { ArchiveProjectPanel } from '../features/projects/components/archive-project-panel';
import { ProjectDetailsForm } from '../features/projects/components/project-details-form';
import { useDocumentTitle } from '../hooks/use-document-title';
import { useProjectFromLayout } from './project-layout';

export function ProjectSettingsRoute() {
  const project = useProjectFromLayout();
  useDocumentTitle(`Settings — ${project.name}`);

  if (!roleAllows(project.role, 'manage')) {
    return (
      <section aria-labelledby="settings-title" className="space-y-2">
        <h2 id="settings-title" className="text-lg font-semibold">
          Settings
        </h2>
        <p className="text-stone-700">Only the project’s owners can rename or archive it.</p>
      </section>
    );
  }

  return (
    <div className="grid gap-8 lg:grid-cols-2">
      <section
        aria-labelledby="details-title"
        className="rounded-xl border border-stone-200 bg-white p-6"
      >
        <h2 id="details-title" className="mb-4 text-lg font-semibold">
          Details
        </h2>
        <ProjectDetailsForm key={project.id} project={project} />
      </section>
      <section
        aria-labelledby="archive-title"
        className="rounded-xl border border-stone-200 bg-white p-6"
      >
        <h2 id="archive-title" className="mb-4 text-lg font-semibold">
          {project.archived ? 'Restore' : 'Archive'}
        </h2>
        <ArchiveProjectPanel project={project} />
      </section>
    </div>
  );
}
