// Moving the account to another e-mail address: the password proves it is the owner asking, and
// the change happens only when the link mailed to the new address is opened.
import { useState, type FormEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/form-field';
import { FormAlert, SavedNote } from '../../../components/ui/status';
import { useValidatedSubmit } from '../../../hooks/use-validated-submit';
import { formErrorMessage } from '../../../lib/form-errors';
import { changeEmailBody } from '../../../../shared/api/schemas';
import { useChangeEmail } from '../api/change-email';

const FIELDS = ['newEmail', 'password'] as const;

export function ChangeEmailForm({ currentEmail }: { currentEmail: string }) {
  const change = useChangeEmail();
  const [values, setValues] = useState({ newEmail: '', password: '' });
  const [sentTo, setSentTo] = useState<string | null>(null);
  const { errors, submit } = useValidatedSubmit(changeEmailBody, change);

  const set = (field: keyof typeof values) => (e: { target: { value: string } }) =>
    setValues((v) => ({ ...v, [field]: e.target.value }));

  function onSubmit(event: FormEvent) {
    event.preventDefault();
    const newEmail = values.newEmail.trim();
    submit(values, () => {
      setSentTo(newEmail);
      setValues({ newEmail: '', password: '' });
    });
  }

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4" aria-label="Change e-mail">
      <p className="text-sm text-stone-700">
        You sign in with <strong>{currentEmail}</strong>.
      </p>
      <FormAlert message={formErrorMessage(change.error, FIELDS)} />
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField
          label="New e-mail"
          type="email"
          name="newEmail"
          autoComplete="email"
          value={values.newEmail}
          onChange={set('newEmail')}
          error={errors.newEmail}
        />
        <TextField
          label="Current password"
          type="password"
          name="password"
          autoComplete="current-password"
          value={values.password}
          onChange={set('password')}
          error={errors.password}
        />
      </div>
      <Button type="submit" busy={change.isPending}>
        {change.isPending ? 'Sending…' : 'Send confirmation link'}
      </Button>
      {change.isSuccess && sentTo && (
        <SavedNote>
          A confirmation link was sent to {sentTo}. Your e-mail changes once you open it.
        </SavedNote>
      )}
    </form>
  );
}
