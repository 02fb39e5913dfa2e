// Chooses a new password from a reset link; success signs in. A used, bad or old link is said
// plainly, with the way to get a new one.
import { useState, type FormEvent, type ReactNode } from 'react';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/form-field';
import { FormAlert } from '../../../components/ui/status';
import { useValidatedSubmit } from '../../../hooks/use-validated-submit';
import { formErrorMessage } from '../../../lib/form-errors';
import { passwordResetConfirmBody, type Session } from '../../../../shared/api/schemas';
import { useConfirmPasswordReset } from '../api/confirm-password-reset';
import { accountLinkProblem } from '../utils/account-link-problem';
import { LinkProblemNotice } from './link-problem-notice';

export function ResetPasswordForm({
  token,
  onReset,
  newLinkAction,
}: {
  token: string;
  onReset: (session: Session) => void;
  /** Where to ask for a new link (the page supplies it). */
  newLinkAction: ReactNode;
}) {
  const confirm = useConfirmPasswordReset();
  const [password, setPassword] = useState('');
  const { errors, submit } = useValidatedSubmit(passwordResetConfirmBody, confirm);
  const problem = accountLinkProblem(confirm.error, 'reset');

  function onSubmit(event: FormEvent) {
    event.preventDefault();
    submit({ token, password }, onReset);
  }

  if (problem) return <LinkProblemNotice problem={problem} action={newLinkAction} />;

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4" aria-label="Choose a new password">
      <FormAlert message={formErrorMessage(confirm.error, ['password'])} />
      <TextField
        label="New password"
        type="password"
        name="password"
        autoComplete="new-password"
        autoFocus
        required
        value={password}
        onChange={(e) => setPassword(e.target.value)}
        error={errors.password}
        hint="At least 10 characters. You will be signed in with it."
      />
      <Button type="submit" variant="primary" busy={confirm.isPending} className="w-full">
        {confirm.isPending ? 'Saving…' : 'Save new password'}
      </Button>
    </form>
  );
}
