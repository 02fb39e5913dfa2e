// Name and description of a new project; the creator becomes its owner.
import { useState, type FormEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { TextAreaField, TextField } from '../../../components/ui/form-field';
import { FormAlert } from '../../../components/ui/status';
import { useValidatedSubmit } from '../../../hooks/use-validated-submit';
import { formErrorMessage } from '../../../lib/form-errors';
import { createProjectBody, type Project } from '../../../../shared/api/schemas';
import { useCreateProject } from '../api/create-project';

const FIELDS = ['name', 'description'] as const;

export function CreateProjectForm({
  onCreated,
  onCancel,
}: {
  onCreated: (project: Project) => void;
  onCancel: () => void;
}) {
  const createProject = useCreateProject();
  const [name, setName] = useState('');
  const [description, setDescription] = useState('');
  const { errors, submit } = useValidatedSubmit(createProjectBody, createProject);

  function onSubmit(event: FormEvent) {
    event.preventDefault();
    submit({ name, description }, onCreated);
  }

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      <FormAlert message={formErrorMessage(createProject.error, FIELDS)} />
      <TextField
        label="Project name"
        name="name"
        required
        value={name}
        onChange={(e) => setName(e.target.value)}
        error={errors.name}
        hint="For example the book and chapter, or the course."
      />
      <TextAreaField
        label="Description"
        name="description"
        value={description}
        onChange={(e) => setDescription(e.target.value)}
        error={errors.description}
      />
      <div className="flex justify-end gap-2">
        <Button onClick={onCancel}>Cancel</Button>
        <Button type="submit" variant="primary" busy={createProject.isPending}>
          {createProject.isPending ? 'Creating…' : 'Create project'}
        </Button>
      </div>
    </form>
  );
}
