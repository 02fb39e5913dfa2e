// A new password, given the current one.
import { useState, type FormEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/form-field';
import { FormAlert, SavedNote } from '../../../components/ui/status';
import { useValidatedSubmit } from '../../../hooks/use-validated-submit';
import { formErrorMessage } from '../../../lib/form-errors';
import { changePasswordBody } from '../../../../shared/api/schemas';
import { useChangePassword } from '../api/change-password';

const FIELDS = ['currentPassword', 'newPassword'] as const;
const EMPTY = { currentPassword: '', newPassword: '' };

export function ChangePasswordForm() {
  const change = useChangePassword();
  const [values, setValues] = useState(EMPTY);
  const { errors, submit } = useValidatedSubmit(changePasswordBody, change);

  const set = (field: keyof typeof values) => (e: { target: { value: string } }) =>
    setValues((v) => ({ ...v, [field]: e.target.value }));

  function onSubmit(event: FormEvent) {
    event.preventDefault();
    submit(values, () => setValues(EMPTY));
  }

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4" aria-label="Change password">
      <FormAlert message={formErrorMessage(change.error, FIELDS)} />
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField
          label="Current password"
          type="password"
          name="currentPassword"
          autoComplete="current-password"
          value={values.currentPassword}
          onChange={set('currentPassword')}
          error={errors.currentPassword}
        />
        <TextField
          label="New password"
          type="password"
          name="newPassword"
          autoComplete="new-password"
          value={values.newPassword}
          onChange={set('newPassword')}
          error={errors.newPassword}
          hint="At least 10 characters."
        />
      </div>
      <Button type="submit" busy={change.isPending}>
        {change.isPending ? 'Changing…' : 'Change password'}
      </Button>
      {change.isSuccess && <SavedNote>Your password was changed.</SavedNote>}
    </form>
  );
}
