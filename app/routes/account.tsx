// /account: one's own name, e-mail, password and other signed-in browsers.
import { useQueryClient } from '@tanstack/react-query';
import { PageHeader } from '../components/ui/page-header';
import { Panel } from '../components/ui/panel';
import { ErrorPanel, Loading } from '../components/ui/status';
import { useAccount } from '../features/account/api/get-account';
import { AccountNameForm } from '../features/account/components/account-name-form';
import { ChangeEmailForm } from '../features/account/components/change-email-form';
import { ChangePasswordForm } from '../features/account/components/change-password-form';
import { OtherSessions } from '../features/account/components/other-sessions';
import { getSessionQueryOptions } from '../features/auth/api/get-session';
import { useDocumentTitle } from '../hooks/use-document-title';
import { formatDate } from '../utils/format-date';

export function AccountRoute() {
  useDocumentTitle('Your account');
  const account = useAccount();
  const queryClient = useQueryClient();

  return (
    <>
      <PageHeader title="Your account">
        {account.data && (
          <p className="text-sm text-stone-600">
            Created on {formatDate(account.data.createdAt)}
            {account.data.user.isAdmin && ' · site administrator'}
          </p>
        )}
      </PageHeader>
      {account.isPending ? (
        <Loading label="Loading your account…" />
      ) : account.isError ? (
        <ErrorPanel error={account.error} onRetry={() => void account.refetch()} />
      ) : (
        <div className="max-w-3xl space-y-6">
          <Panel id="account-name-title" title="Name">
            <AccountNameForm
              account={account.data}
              onSaved={() =>
                void queryClient.invalidateQueries({ queryKey: getSessionQueryOptions().queryKey })
              }
            />
          </Panel>
          <Panel id="account-email-title" title="E-mail">
            <ChangeEmailForm currentEmail={account.data.user.email} />
          </Panel>
          <Panel id="account-password-title" title="Password">
            <ChangePasswordForm />
          </Panel>
          <Panel id="account-sessions-title" title="Signed-in browsers">
            <OtherSessions count={account.data.otherSessions} />
          </Panel>
        </div>
      )}
    </>
  );
}
