// Invites someone by e-mail with a role (owners only). Works whether or not they have an account:
// the e-mail carries a single-use link that expires.
import { useState, type FormEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/form-field';
import { RoleSelectField } from '../../../components/ui/role-select-field';
import { roleName } from '../../../components/ui/role-badge';
import { FormAlert, SavedNote } from '../../../components/ui/status';
import { useValidatedSubmit } from '../../../hooks/use-validated-submit';
import { isApiError } from '../../../lib/api-client';
import { formErrorMessage } from '../../../lib/form-errors';
import { formatDateTime } from '../../../utils/format-date';
import type { ProjectRole } from '../../../../shared/api/roles';
import { createInvitationBody } from '../../../../shared/api/schemas';
import { useCreateInvitation } from '../api/create-invitation';

const FIELDS = ['email', 'role'] as const;

export function InviteForm({ projectId }: { projectId: number }) {
  const invite = useCreateInvitation(projectId);
  const [email, setEmail] = useState('');
  const [role, setRole] = useState<ProjectRole>('editor');
  const { errors, submit } = useValidatedSubmit(createInvitationBody, invite);
  // "Already a member" is about the address typed, so it is said beside that field.
  const alreadyMember = isApiError(invite.error, 'already_member') ? invite.error.message : undefined;

  function onSubmit(event: FormEvent) {
    event.preventDefault();
    submit({ email, role }, () => setEmail(''));
  }

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4" aria-label="Invite by e-mail">
      {!alreadyMember && <FormAlert message={formErrorMessage(invite.error, FIELDS)} />}
      <div className="flex flex-wrap items-start gap-4">
        <TextField
          label="E-mail"
          type="email"
          name="email"
          autoComplete="off"
          value={email}
          onChange={(e) => setEmail(e.target.value)}
          error={errors.email ?? alreadyMember}
          hint="They get a single-use link by e-mail. No Lobewright account is needed beforehand."
          className="min-w-64 flex-1"
        />
        <RoleSelectField value={role} onChange={setRole} error={errors.role} />
        <Button type="submit" variant="primary" busy={invite.isPending} className="mt-6">
          {invite.isPending ? 'Sending…' : 'Send invitation'}
        </Button>
      </div>
      {invite.isSuccess && (
        <SavedNote>
          Invitation sent to {invite.data.email} as {roleName(invite.data.role).toLowerCase()}; the
          link works until {formatDateTime(invite.data.expiresAt)}.
        </SavedNote>
      )}
    </form>
  );
}
