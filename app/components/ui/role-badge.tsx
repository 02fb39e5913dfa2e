// A member's project role as a small labelled tag.
import type { ProjectRole } from '../../../shared/api/roles';
import { cn } from '../../utils/cn';

const tones: Record<ProjectRole, string> = {
  owner: 'bg-accent-100 text-accent-800 ring-accent-200',
  editor: 'bg-stone-100 text-stone-800 ring-stone-300',
  reviewer: 'bg-stone-100 text-stone-800 ring-stone-300',
  viewer: 'bg-white text-stone-700 ring-stone-300',
};

const names: Record<ProjectRole, string> = {
  owner: 'Owner',
  editor: 'Editor',
  reviewer: 'Reviewer',
  viewer: 'Viewer',
};

export function roleName(role: ProjectRole): string {
  return names[role];
}

export function RoleBadge({ role }: { role: ProjectRole }) {
  return (
    <span
      className={cn(
        'inline-flex items-center rounded-full px-2 py-0.5 text-xs font-semibold ring-1 ring-inset',
        tones[role],
      )}
    >
      <span className="sr-only">Your role: </span>
      {names[role]}
    </span>
  );
}
