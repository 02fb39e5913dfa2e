// Renaming a project and editing its description (owners).
import { useState, type FormEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { TextAreaField, TextField } from '../../../components/ui/form-field';
import { FormAlert, SavedNote } from '../../../components/ui/status';
import { useValidatedSubmit } from '../../../hooks/use-validated-submit';
import { formErrorMessage } from '../../../lib/form-errors';
import { updateProjectBody, type Project } from '../../../../shared/api/schemas';
import { useUpdateProject } from '../api/update-project';

const FIELDS = ['name', 'description'] as const;

export function ProjectDetailsForm({ project }: { project: Project }) {
  const updateProject = useUpdateProject(project.id);
  const [name, setName] = useState(project.name);
  const [description, setDescription] = useState(project.description);
  const { errors, submit } = useValidatedSubmit(updateProjectBody, updateProject);
  const unchanged = name === project.name && description === project.description;

  function onSubmit(event: FormEvent) {
    event.preventDefault();
    submit({ name, description });
  }

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4" aria-label="Project details">
      <FormAlert message={formErrorMessage(updateProject.error, FIELDS)} />
      <TextField
        label="Project name"
        name="name"
        required
        value={name}
        onChange={(e) => setName(e.target.value)}
        error={errors.name}
      />
      <TextAreaField
        label="Description"
        name="description"
        value={description}
        onChange={(e) => setDescription(e.target.value)}
        error={errors.description}
      />
      <div className="flex items-center gap-4">
        <Button type="submit" variant="primary" busy={updateProject.isPending} disabled={unchanged}>
          {updateProject.isPending ? 'Saving…' : 'Save details'}
        </Button>
        {updateProject.isSuccess && unchanged && <SavedNote>Saved.</SavedNote>}
      </div>
    </form>
  );
}
