// Opens the confirmation link mailed to a new address: confirms it once on arrival and says what
// the account's e-mail is now, or why the link cannot be used.
import { useEffect, useRef, type ReactNode } from 'react';
import { ErrorPanel, Loading } from '../../../components/ui/status';
import type { Account } from '../../../../shared/api/schemas';
import { useConfirmEmail } from '../api/confirm-email';
import { accountLinkProblem } from '../utils/account-link-problem';
import { LinkProblemNotice } from './link-problem-notice';

export function ConfirmEmailStatus({
  token,
  onConfirmed,
  accountLink,
}: {
  token: string;
  onConfirmed: (account: Account) => void;
  /** A way to the account page (the page supplies it). */
  accountLink: ReactNode;
}) {
  const confirm = useConfirmEmail();
  const { mutate } = confirm;
  // The token works once: a second request (StrictMode runs effects twice) would be refused.
  const sent = useRef(false);
  useEffect(() => {
    if (sent.current) return;
    sent.current = true;
    mutate({ token }, { onSuccess: onConfirmed });
  }, [mutate, token, onConfirmed]);

  if (confirm.isSuccess)
    return (
      <div role="status" className="space-y-3 text-sm text-stone-800">
        <p>
          Your e-mail is now <strong>{confirm.data.user.email}</strong>. Use it to sign in from now
          on.
        </p>
        {accountLink}
      </div>
    );
  if (confirm.isError) {
    const problem = accountLinkProblem(confirm.error, 'confirm-email');
    return problem ? (
      <LinkProblemNotice problem={problem} action={accountLink} />
    ) : (
      <ErrorPanel error={confirm.error} />
    );
  }
  return <Loading label="Confirming your new e-mail…" />;
}
