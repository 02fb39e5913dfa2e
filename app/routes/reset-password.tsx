// /reset-password?token=…: the page a reset e-mail links to; a new password signs the person in.
import { useQueryClient } from '@tanstack/react-query';
import { Link, useNavigate, useSearchParams } from 'react-router';
import { tokenSchema, type Session } from '../../shared/api/schemas';
import { AuthFrame } from '../components/layouts/auth-frame';
import { buttonClasses } from '../components/ui/button';
import { LinkProblemNotice } from '../features/account/components/link-problem-notice';
import { ResetPasswordForm } from '../features/account/components/reset-password-form';
import { malformedAccountLink } from '../features/account/utils/account-link-problem';
import { replaceSession } from '../features/auth/api/replace-session';
import { useDocumentTitle } from '../hooks/use-document-title';

const newLink = (
  <Link to="/forgot-password" className={buttonClasses('secondary', 'sm')}>
    Ask for a new link
  </Link>
);

export function ResetPasswordRoute() {
  useDocumentTitle('Choose a new password');
  const token = useSearchParams()[0].get('token') ?? '';
  const queryClient = useQueryClient();
  const navigate = useNavigate();

  function onReset(session: Session) {
    replaceSession(queryClient, session);
    void navigate('/', { replace: true });
  }

  return (
    <AuthFrame title="Choose a new password">
      {tokenSchema.safeParse(token).success ? (
        <ResetPasswordForm token={token} onReset={onReset} newLinkAction={newLink} />
      ) : (
        <LinkProblemNotice problem={malformedAccountLink('reset')} action={newLink} />
      )}
    </AuthFrame>
  );
}
