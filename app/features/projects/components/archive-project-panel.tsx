// Archiving hides a project from the everyday list without deleting anything; restoring undoes it.
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/status';
import { formErrorMessage } from '../../../lib/form-errors';
import type { Project } from '../../../../shared/api/schemas';
import { useUpdateProject } from '../api/update-project';

export function ArchiveProjectPanel({ project }: { project: Project }) {
  const updateProject = useUpdateProject(project.id);
  const archive = !project.archived;
  return (
    <div className="space-y-3">
      <p className="text-sm text-stone-700">
        {project.archived
          ? 'This project is archived: it is listed under “Archived” and kept as it is. Restore it to list it with your active projects again.'
          : 'Archiving moves this project to the “Archived” list. Its figures, revisions and members are kept.'}
      </p>
      <FormAlert message={formErrorMessage(updateProject.error)} />
      <Button
        variant={archive ? 'danger' : 'secondary'}
        busy={updateProject.isPending}
        onClick={() => updateProject.mutate({ archived: archive })}
      >
        {archive ? 'Archive project' : 'Restore project'}
      </Button>
    </div>
  );
}
