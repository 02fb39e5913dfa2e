// E-mail and password sign-in; problems are shown beside the field they concern.
import { useState, type FormEvent } from 'react';
import { Link } from 'react-router';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/form-field';
import { FormAlert } from '../../../components/ui/status';
import { useValidatedSubmit } from '../../../hooks/use-validated-submit';
import { formErrorMessage } from '../../../lib/form-errors';
import { loginBody } from '../../../../shared/api/schemas';
import { useSignIn } from '../api/sign-in';

const FIELDS = ['email', 'password'] as const;

export function SignInForm({ onSignedIn }: { onSignedIn: () => void }) {
  const signIn = useSignIn();
  const [email, setEmail] = useState('');
  const [password, setPassword] = useState('');
  const { errors, submit } = useValidatedSubmit(loginBody, signIn);

  function onSubmit(event: FormEvent) {
    event.preventDefault();
    submit({ email, password }, onSignedIn);
  }

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      <FormAlert message={formErrorMessage(signIn.error, FIELDS)} />
      <TextField
        label="E-mail"
        type="email"
        name="email"
        autoComplete="username"
        // The page exists only for this form, so typing can start at once.
        autoFocus
        required
        value={email}
        onChange={(e) => setEmail(e.target.value)}
        error={errors.email}
      />
      <TextField
        label="Password"
        type="password"
        name="password"
        autoComplete="current-password"
        required
        value={password}
        onChange={(e) => setPassword(e.target.value)}
        error={errors.password}
      />
      <p className="-mt-2 text-right text-sm">
        <Link to="/forgot-password" className="text-accent-700 underline underline-offset-2">
          Forgot password?
        </Link>
      </p>
      <Button type="submit" variant="primary" busy={signIn.isPending} className="w-full">
        {signIn.isPending ? 'Signing in…' : 'Sign in'}
      </Button>
    </form>
  );
}
