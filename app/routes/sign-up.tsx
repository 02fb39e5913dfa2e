// /sign-up: account creation, when the site administrator has opened it.
import { Link, Navigate, useNavigate } from 'react-router';
import { ErrorPanel, Loading } from '../components/ui/status';
import { useSession } from '../features/auth/api/get-session';
import { SignUpForm } from '../features/auth/components/sign-up-form';
import { useDocumentTitle } from '../hooks/use-document-title';
import { AuthFrame } from '../components/layouts/auth-frame';

const signInLink = (
  <>
    Already have an account?{' '}
    <Link to="/sign-in" className="font-semibold text-accent-700 underline underline-offset-2">
      Sign in
    </Link>
  </>
);

export function SignUpRoute() {
  useDocumentTitle('Create an account');
  const session = useSession();
  const navigate = useNavigate();

  if (session.isPending) return <Loading label="Checking your session…" />;
  if (session.isError)
    return <ErrorPanel error={session.error} onRetry={() => void session.refetch()} />;
  if (session.data.user) return <Navigate to="/" replace />;

  return (
    <AuthFrame title="Create an account" footer={signInLink}>
      {session.data.signupEnabled ? (
        <SignUpForm onSignedUp={() => void navigate('/', { replace: true })} />
      ) : (
        <p className="text-sm text-stone-700">
          Sign-up is closed on this Lobewright site. Ask your site administrator for an account.
        </p>
      )}
    </AuthFrame>
  );
}
