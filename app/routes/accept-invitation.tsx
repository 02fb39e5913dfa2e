// /invitations/accept?token=…: the page an invitation e-mail links to. Shows what the invitation
// offers and lets the person join: signed in as the invited account, or by creating it here.
import { useQueryClient } from '@tanstack/react-query';
import { Link, useNavigate, useSearchParams } from 'react-router';
import { tokenSchema } from '../../shared/api/schemas';
import { buttonClasses, Button } from '../components/ui/button';
import { AuthFrame } from '../components/layouts/auth-frame';
import { ErrorPanel, Loading } from '../components/ui/status';
import { LinkProblemNotice } from '../features/account/components/link-problem-notice';
import { useSession } from '../features/auth/api/get-session';
import { replaceSession } from '../features/auth/api/replace-session';
import { useSignOut } from '../features/auth/api/sign-out';
import type { AcceptInvitationResult } from '../features/invitations/api/accept-invitation';
import { useInvitationLookup } from '../features/invitations/api/get-invitation-lookup';
import { AcceptInvitation } from '../features/invitations/components/accept-invitation';
import {
  invitationLinkProblem,
  malformedLinkProblem,
} from '../features/invitations/utils/invitation-link-problem';
import { useDocumentTitle } from '../hooks/use-document-title';

const TITLE = 'Join a project';

export function AcceptInvitationRoute() {
  useDocumentTitle(TITLE);
  const token = useSearchParams()[0].get('token') ?? '';
  if (!tokenSchema.safeParse(token).success) {
    return (
      <AuthFrame title={TITLE}>
        <LinkProblemNotice problem={malformedLinkProblem} />
      </AuthFrame>
    );
  }
  return <InvitationPage token={token} />;
}

function InvitationPage({ token }: { token: string }) {
  const session = useSession();
  const lookup = useInvitationLookup(token);
  const queryClient = useQueryClient();
  const navigate = useNavigate();
  const signOut = useSignOut();
  const here = `/invitations/accept?token=${encodeURIComponent(token)}`;

  function onAccepted(result: AcceptInvitationResult) {
    replaceSession(queryClient, result.session);
    void navigate(`/projects/${result.projectId}`, { replace: true });
  }

  let body;
  if (session.isPending || lookup.isPending) body = <Loading label="Reading the invitation…" />;
  else if (session.isError)
    body = <ErrorPanel error={session.error} onRetry={() => void session.refetch()} />;
  else if (lookup.isError) {
    const problem = invitationLinkProblem(lookup.error);
    body = problem ? (
      <LinkProblemNotice
        problem={problem}
        action={
          <Link to="/sign-in" className={buttonClasses('secondary', 'sm')}>
            Go to sign-in
          </Link>
        }
      />
    ) : (
      <ErrorPanel error={lookup.error} onRetry={() => void lookup.refetch()} />
    );
  } else
    body = (
      <AcceptInvitation
        token={token}
        invitation={lookup.data}
        signedInEmail={session.data.user?.email ?? null}
        onAccepted={onAccepted}
        signInLink={
          <Link
            to="/sign-in"
            state={{ from: here }}
            className={buttonClasses('primary') + ' w-full'}
          >
            Sign in to accept
          </Link>
        }
        signOutControl={
          // Stay on this page: once signed out it offers to sign in as the invited account.
          <Button busy={signOut.isPending} onClick={() => signOut.mutate()}>
            {signOut.isPending ? 'Signing out…' : 'Sign out'}
          </Button>
        }
      />
    );

  return <AuthFrame title={TITLE}>{body}</AuthFrame>;
}
