// What an invitation link offers: who invited whom to which project with which role, and the one
// step left — join with the signed-in account, sign in (or out) first, or create the account here.
import { useState, type FormEvent, type ReactNode } from 'react';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/form-field';
import { roleName } from '../../../components/ui/role-badge';
import { FormAlert } from '../../../components/ui/status';
import { useValidatedSubmit } from '../../../hooks/use-validated-submit';
import { formErrorMessage } from '../../../lib/form-errors';
import { acceptInvitationBody, type InvitationLookup } from '../../../../shared/api/schemas';
import { useAcceptInvitation, type AcceptInvitationResult } from '../api/accept-invitation';

// Creating the account needs both; the shared schema leaves them optional for existing accounts.
const newAccountBody = acceptInvitationBody.required({ name: true, password: true });
const FIELDS = ['name', 'password'] as const;

interface AcceptInvitationProps {
  token: string;
  invitation: InvitationLookup;
  /** E-mail of whoever is signed in on this browser, if anyone. */
  signedInEmail: string | null;
  onAccepted: (result: AcceptInvitationResult) => void;
  /** A way to sign in that comes back to this link (the page supplies it). */
  signInLink: ReactNode;
  /** A way to sign out when someone else is signed in (the page supplies it). */
  signOutControl: ReactNode;
}

export function AcceptInvitation(props: AcceptInvitationProps) {
  const { invitation, signedInEmail, signOutControl } = props;
  // Someone else's session would stay signed in after accepting, so they step aside first.
  const someoneElse = signedInEmail !== null && !sameAddress(signedInEmail, invitation.email);
  return (
    <div className="space-y-4">
      <p className="text-stone-800">
        {invitation.invitedBy} invited <strong>{invitation.email}</strong> to join{' '}
        <strong>{invitation.projectName}</strong> as {roleName(invitation.role).toLowerCase()}.
      </p>
      {someoneElse ? (
        <>
          <p role="alert" className="text-sm text-stone-800">
            You are signed in as {signedInEmail}, but this invitation is for {invitation.email}.
            {invitation.accountExists
              ? ` Sign out, then sign in as ${invitation.email}.`
              : ' Sign out first to create the account for it here.'}
          </p>
          {signOutControl}
        </>
      ) : invitation.accountExists ? (
        <ExistingAccount {...props} />
      ) : (
        <NewAccount {...props} />
      )}
    </div>
  );
}

const sameAddress = (a: string, b: string) => a.trim().toLowerCase() === b.trim().toLowerCase();

function ExistingAccount({
  token,
  invitation,
  signedInEmail,
  onAccepted,
  signInLink,
}: AcceptInvitationProps) {
  const accept = useAcceptInvitation();
  if (signedInEmail === null) {
    return (
      <>
        <p className="text-sm text-stone-700">
          There is a Lobewright account for {invitation.email}. Sign in to it to accept; you will
          come back here.
        </p>
        {signInLink}
      </>
    );
  }
  return (
    <>
      <FormAlert message={formErrorMessage(accept.error)} />
      <Button
        variant="primary"
        className="w-full"
        busy={accept.isPending}
        onClick={() => accept.mutate({ token }, { onSuccess: onAccepted })}
      >
        {accept.isPending ? 'Joining…' : `Join ${invitation.projectName}`}
      </Button>
    </>
  );
}

function NewAccount({ token, invitation, onAccepted }: AcceptInvitationProps) {
  const accept = useAcceptInvitation();
  const [values, setValues] = useState({ name: '', password: '' });
  const { errors, submit } = useValidatedSubmit(newAccountBody, accept);

  const set = (field: keyof typeof values) => (e: { target: { value: string } }) =>
    setValues((v) => ({ ...v, [field]: e.target.value }));

  function onSubmit(event: FormEvent) {
    event.preventDefault();
    submit({ token, ...values }, onAccepted);
  }

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4" aria-label="Create your account">
      <FormAlert message={formErrorMessage(accept.error, FIELDS)} />
      <TextField label="E-mail" type="email" name="email" value={invitation.email} readOnly />
      <TextField
        label="Your name"
        name="name"
        autoComplete="name"
        required
        value={values.name}
        onChange={set('name')}
        error={errors.name}
        hint="As co-authors will see it beside your revisions and comments."
      />
      <TextField
        label="Password"
        type="password"
        name="password"
        autoComplete="new-password"
        required
        value={values.password}
        onChange={set('password')}
        error={errors.password}
        hint="At least 10 characters."
      />
      <Button type="submit" variant="primary" busy={accept.isPending} className="w-full">
        {accept.isPending ? 'Creating your account…' : 'Create account and join'}
      </Button>
    </form>
  );
}
