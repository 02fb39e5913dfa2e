// /forgot-password: asks for a link to choose a new password.
import { Link } from 'react-router';
import { AuthFrame } from '../components/layouts/auth-frame';
import { ForgotPasswordForm } from '../features/account/components/forgot-password-form';
import { useDocumentTitle } from '../hooks/use-document-title';

export function ForgotPasswordRoute() {
  useDocumentTitle('Forgot password');
  return (
    <AuthFrame
      title="Forgot your password?"
      footer={
        <>
          Remembered it?{' '}
          <Link to="/sign-in" className="font-semibold text-accent-700 underline underline-offset-2">
            Sign in
          </Link>
        </>
      }
    >
      <ForgotPasswordForm />
    </AuthFrame>
  );
}
