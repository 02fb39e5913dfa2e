// The signed-in user's projects as cards: name, description, role, figure count, last change.
import { Link } from 'react-router';
import { RoleBadge } from '../../../components/ui/role-badge';
import type { Project } from '../../../../shared/api/schemas';
import { formatDate } from '../../../utils/format-date';

function figureCount(count: number): string {
  return count === 1 ? '1 figure' : `${count} figures`;
}

export function ProjectList({ projects, emptyText }: { projects: Project[]; emptyText: string }) {
  if (projects.length === 0)
    return (
      <p className="rounded-lg border border-dashed border-stone-300 p-8 text-center text-stone-600">
        {emptyText}
      </p>
    );
  const sorted = [...projects].sort((a, b) => a.name.localeCompare(b.name, 'en-GB'));
  return (
    <ul className="grid gap-4 sm:grid-cols-2" aria-label="Projects">
      {sorted.map((project) => (
        <li
          key={project.id}
          className="relative flex flex-col rounded-xl border border-stone-200 bg-white p-5 shadow-xs transition-shadow focus-within:shadow-md hover:shadow-md"
        >
          <div className="flex items-start justify-between gap-3">
            <h3 className="text-base font-semibold text-stone-900">
              {/* The whole card is clickable through this link's ::after; the link text is the name. */}
              <Link
                to={`/projects/${project.id}`}
                className="after:absolute after:inset-0 after:rounded-xl hover:text-accent-700"
              >
                {project.name}
              </Link>
            </h3>
            <RoleBadge role={project.role} />
          </div>
          {project.description && (
            <p className="mt-2 line-clamp-3 text-sm text-stone-700">{project.description}</p>
          )}
          <dl className="mt-auto flex gap-6 pt-4 text-sm text-stone-600">
            <div>
              <dt className="sr-only">Figures</dt>
              <dd>{figureCount(project.figureCount)}</dd>
            </div>
            <div>
              <dt className="inline">Updated </dt>
              <dd className="inline">{formatDate(project.updatedAt)}</dd>
            </div>
            {project.archived && (
              <div>
                <dt className="sr-only">State</dt>
                <dd className="font-semibold text-stone-700">Archived</dd>
              </div>
            )}
          </dl>
        </li>
      ))}
    </ul>
  );
}
