// /sign-in: the way in; signed-in visitors go straight on to where they were heading.
import { Link, Navigate, useLocation, useNavigate } from 'react-router';
import { ErrorPanel, Loading } from '../components/ui/status';
import { useSession } from '../features/auth/api/get-session';
import { SignInForm } from '../features/auth/components/sign-in-form';
import { useDocumentTitle } from '../hooks/use-document-title';
import { AuthFrame } from '../components/layouts/auth-frame';

function destination(state: unknown): string {
  const from = (state as { from?: unknown } | null)?.from;
  return typeof from === 'string' && from.startsWith('/') && !from.startsWith('/sign-')
    ? from
    : '/';
}

export function SignInRoute() {
  useDocumentTitle('Sign in');
  const session = useSession();
  const location = useLocation();
  const navigate = useNavigate();
  const to = destination(location.state);

  if (session.isPending) return <Loading label="Checking your session…" />;
  if (session.isError)
    return <ErrorPanel error={session.error} onRetry={() => void session.refetch()} />;
  if (session.data.user) return <Navigate to={to} replace />;

  return (
    <AuthFrame
      title="Sign in to Lobewright"
      footer={
        session.data.signupEnabled ? (
          <>
            New here?{' '}
            <Link
              to="/sign-up"
              className="font-semibold text-accent-700 underline underline-offset-2"
            >
              Create an account
            </Link>
          </>
        ) : (
          'Accounts are created by your site administrator.'
        )
      }
    >
      <SignInForm onSignedIn={() => void navigate(to, { replace: true })} />
    </AuthFrame>
  );
}
