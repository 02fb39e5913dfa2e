// /confirm-email?token=…: the page the link mailed to a new address opens (signed in).
import { useQueryClient } from '@tanstack/react-query';
import { useCallback } from 'react';
import { Link, useSearchParams } from 'react-router';
import { tokenSchema } from '../../shared/api/schemas';
import { buttonClasses } from '../components/ui/button';
import { PageHeader } from '../components/ui/page-header';
import { ConfirmEmailStatus } from '../features/account/components/confirm-email-status';
import { LinkProblemNotice } from '../features/account/components/link-problem-notice';
import { malformedAccountLink } from '../features/account/utils/account-link-problem';
import { getSessionQueryOptions } from '../features/auth/api/get-session';
import { useDocumentTitle } from '../hooks/use-document-title';

const accountLink = (
  <Link to="/account" className={buttonClasses('secondary', 'sm')}>
    Go to your account
  </Link>
);

export function ConfirmEmailRoute() {
  useDocumentTitle('Confirm new e-mail');
  const token = useSearchParams()[0].get('token') ?? '';
  const queryClient = useQueryClient();
  // The header and sign-in read the address from the session.
  const onConfirmed = useCallback(
    () => void queryClient.invalidateQueries({ queryKey: getSessionQueryOptions().queryKey }),
    [queryClient],
  );
  return (
    <>
      <PageHeader title="Confirm new e-mail" />
      <section className="max-w-2xl rounded-xl border border-stone-200 bg-white p-6">
        {tokenSchema.safeParse(token).success ? (
          <ConfirmEmailStatus token={token} onConfirmed={onConfirmed} accountLink={accountLink} />
        ) : (
          <LinkProblemNotice problem={malformedAccountLink('confirm-email')} action={accountLink} />
        )}
      </section>
    </>
  );
}
