// /projects/:projectId/audit: the project's audit trail, for its owners.
import { roleAllows } from '../../shared/api/roles';
import { AuditTrail } from '../features/audit/components/audit-trail';
import { useDocumentTitle } from '../hooks/use-document-title';
import { useProjectFromLayout } from './project-layout';

export function ProjectAuditRoute() {
  const project = useProjectFromLayout();
  useDocumentTitle(`Audit trail — ${project.name}`);
  return (
    <section aria-labelledby="audit-title" className="space-y-4">
      <h2 id="audit-title" className="text-lg font-semibold">
        Audit trail
      </h2>
      {roleAllows(project.role, 'manage') ? (
        <AuditTrail projectId={project.id} />
      ) : (
        <p className="text-sm text-stone-700">Only the project’s owners can read its audit trail.</p>
      )}
    </section>
  );
}
