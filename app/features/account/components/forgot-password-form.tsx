// Asks for a password-reset link. The answer is the same whether or not the address has an
// account, so the page says "if" rather than confirming who is registered.
import { useState, type FormEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/form-field';
import { FormAlert } from '../../../components/ui/status';
import { useValidatedSubmit } from '../../../hooks/use-validated-submit';
import { formErrorMessage } from '../../../lib/form-errors';
import { passwordResetRequestBody } from '../../../../shared/api/schemas';
import { useRequestPasswordReset } from '../api/request-password-reset';

export function ForgotPasswordForm() {
  const request = useRequestPasswordReset();
  const [email, setEmail] = useState('');
  const [sentTo, setSentTo] = useState<string | null>(null);
  const { errors, submit } = useValidatedSubmit(passwordResetRequestBody, request);

  function onSubmit(event: FormEvent) {
    event.preventDefault();
    submit({ email }, () => setSentTo(email.trim()));
  }

  if (sentTo) {
    return (
      <div role="status" className="space-y-3 text-sm text-stone-800">
        <p>
          If there is a Lobewright account for <strong>{sentTo}</strong>, a link to choose a new
          password is on its way there. It works once, and only for a short time.
        </p>
        <p className="text-stone-600">Nothing arrived? Check the spam folder, or ask again.</p>
        <Button
          size="sm"
          onClick={() => {
            request.reset();
            setSentTo(null);
          }}
        >
          Ask again
        </Button>
      </div>
    );
  }

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4" aria-label="Reset password">
      <p className="text-sm text-stone-700">
        Enter the e-mail address you sign in with. We will send a link to choose a new password.
      </p>
      <FormAlert message={formErrorMessage(request.error, ['email'])} />
      <TextField
        label="E-mail"
        type="email"
        name="email"
        autoComplete="username"
        autoFocus
        required
        value={email}
        onChange={(e) => setEmail(e.target.value)}
        error={errors.email}
      />
      <Button type="submit" variant="primary" busy={request.isPending} className="w-full">
        {request.isPending ? 'Sending…' : 'Send reset link'}
      </Button>
    </form>
  );
}
