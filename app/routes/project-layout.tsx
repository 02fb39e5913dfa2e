// /projects/:projectId/…: loads the project once, shows its heading and tabs, and hands the
// project (with the user's role in it) to the tab pages through the outlet context.
import { Link, NavLink, Outlet, useOutletContext, useParams } from 'react-router';
import { PageHeader } from '../components/ui/page-header';
import { RoleBadge } from '../components/ui/role-badge';
import { ErrorPanel, Loading } from '../components/ui/status';
import { useProject } from '../features/projects/api/get-project';
import { useDocumentTitle } from '../hooks/use-document-title';
import { roleAllows } from '../../shared/api/roles';
import type { Project } from '../../shared/api/schemas';
import { cn } from '../utils/cn';
import { parseIdParam } from './parse-id-param';
import { NotFoundRoute } from './not-found';

const tabClasses = ({ isActive }: { isActive: boolean }) =>
  cn(
    '-mb-px border-b-2 px-3 py-2 text-sm font-semibold',
    isActive
      ? 'border-accent-600 text-accent-800'
      : 'border-transparent text-stone-600 hover:text-stone-900',
  );

export function ProjectLayout() {
  const projectId = parseIdParam(useParams().projectId);
  if (projectId === null) return <NotFoundRoute />;
  return <ProjectFrame projectId={projectId} />;
}

function ProjectFrame({ projectId }: { projectId: number }) {
  const project = useProject(projectId);
  useDocumentTitle(project.data?.name);

  if (project.isPending) return <Loading label="Loading project…" />;
  if (project.isError)
    return <ErrorPanel error={project.error} onRetry={() => void project.refetch()} />;
  const p = project.data;

  return (
    <>
      <PageHeader
        context={
          <Link to="/" className="underline underline-offset-2 hover:text-stone-900">
            Projects
          </Link>
        }
        title={p.name}
        actions={<RoleBadge role={p.role} />}
      >
        {p.archived && <p className="text-sm font-semibold text-stone-700">Archived project</p>}
        {p.description && <p className="max-w-3xl text-stone-700">{p.description}</p>}
      </PageHeader>
      <nav aria-label="Project" className="mb-6 flex gap-2 border-b border-stone-200">
        <NavLink to={`/projects/${p.id}`} end className={tabClasses}>
          Figures
        </NavLink>
        <NavLink to={`/projects/${p.id}/exports`} className={tabClasses}>
          Exports
        </NavLink>
        <NavLink to={`/projects/${p.id}/data`} className={tabClasses}>
          Data
        </NavLink>
        <NavLink to={`/projects/${p.id}/members`} className={tabClasses}>
          Members
        </NavLink>
        <NavLink to={`/projects/${p.id}/settings`} className={tabClasses}>
          Settings
        </NavLink>
        {roleAllows(p.role, 'manage') && (
          <NavLink to={`/projects/${p.id}/audit`} className={tabClasses}>
            Audit
          </NavLink>
        )}
      </nav>
      <Outlet context={p satisfies Project} />
    </>
  );
}

export function useProjectFromLayout(): Project {
  return useOutletContext<Project>();
}
