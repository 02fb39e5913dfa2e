// Account creation: name, e-mail and a password of at least 10 characters (checked by the
// same schema the server uses).
import { useState, type FormEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/form-field';
import { FormAlert } from '../../../components/ui/status';
import { useValidatedSubmit } from '../../../hooks/use-validated-submit';
import { formErrorMessage } from '../../../lib/form-errors';
import { signupBody } from '../../../../shared/api/schemas';
import { useSignUp } from '../api/sign-up';

const FIELDS = ['name', 'email', 'password'] as const;

export function SignUpForm({ onSignedUp }: { onSignedUp: () => void }) {
  const signUp = useSignUp();
  const [values, setValues] = useState({ name: '', email: '', password: '' });
  const { errors, submit } = useValidatedSubmit(signupBody, signUp);

  const set = (field: keyof typeof values) => (e: { target: { value: string } }) =>
    setValues((v) => ({ ...v, [field]: e.target.value }));

  function onSubmit(event: FormEvent) {
    event.preventDefault();
    submit(values, onSignedUp);
  }

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      <FormAlert message={formErrorMessage(signUp.error, FIELDS)} />
      <TextField
        label="Name"
        name="name"
        autoComplete="name"
        required
        value={values.name}
        onChange={set('name')}
        error={errors.name}
      />
      <TextField
        label="E-mail"
        type="email"
        name="email"
        autoComplete="email"
        required
        value={values.email}
        onChange={set('email')}
        error={errors.email}
      />
      <TextField
        label="Password"
        type="password"
        name="password"
        autoComplete="new-password"
        required
        hint="At least 10 characters."
        value={values.password}
        onChange={set('password')}
        error={errors.password}
      />
      <Button type="submit" variant="primary" busy={signUp.isPending} className="w-full">
        {signUp.isPending ? 'Creating your account…' : 'Create account'}
      </Button>
    </form>
  );
}
