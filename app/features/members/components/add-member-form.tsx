// Adds someone to the project by the e-mail address of their Lobewright account (owners only).
import { useState, type FormEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/form-field';
import { RoleSelectField } from '../../../components/ui/role-select-field';
import { FormAlert, SavedNote } from '../../../components/ui/status';
import { useValidatedSubmit } from '../../../hooks/use-validated-submit';
import { formErrorMessage } from '../../../lib/form-errors';
import { roleName } from '../../../components/ui/role-badge';
import type { ProjectRole } from '../../../../shared/api/roles';
import { addMemberBody } from '../../../../shared/api/schemas';
import { useAddMember } from '../api/add-member';

const FIELDS = ['email', 'role'] as const;

export function AddMemberForm({ projectId }: { projectId: number }) {
  const addMember = useAddMember(projectId);
  const [email, setEmail] = useState('');
  const [role, setRole] = useState<ProjectRole>('reviewer');
  const { errors, submit } = useValidatedSubmit(addMemberBody, addMember);

  function onSubmit(event: FormEvent) {
    event.preventDefault();
    submit({ email, role }, () => setEmail(''));
  }

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4" aria-label="Add a member">
      <FormAlert message={formErrorMessage(addMember.error, FIELDS)} />
      <div className="flex flex-wrap items-start gap-4">
        <TextField
          label="E-mail"
          type="email"
          name="email"
          value={email}
          onChange={(e) => setEmail(e.target.value)}
          error={errors.email}
          hint="They need a Lobewright account already."
          className="min-w-64 flex-1"
        />
        <RoleSelectField value={role} onChange={setRole} error={errors.role} />
        <Button type="submit" variant="primary" busy={addMember.isPending} className="mt-6">
          {addMember.isPending ? 'Adding…' : 'Add member'}
        </Button>
      </div>
      {addMember.isSuccess && (
        <SavedNote>
          {addMember.data.name} was added as {roleName(addMember.data.role).toLowerCase()}.
        </SavedNote>
      )}
    </form>
  );
}
