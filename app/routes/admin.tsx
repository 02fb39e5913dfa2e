// /admin: site settings, for site administrators only.
import { useQueryClient } from '@tanstack/react-query';
import { PageHeader } from '../components/ui/page-header';
import { ErrorPanel, Loading } from '../components/ui/status';
import { useSiteSettings } from '../features/admin/api/get-site-settings';
import { SignUpSwitch } from '../features/admin/components/sign-up-switch';
import { UserList } from '../features/admin/components/user-list';
import { getSessionQueryOptions } from '../features/auth/api/get-session';
import { useSignedInUser } from '../features/auth/hooks/use-signed-in-user';
import { useDocumentTitle } from '../hooks/use-document-title';

export function AdminRoute() {
  useDocumentTitle('Site settings');
  const user = useSignedInUser();
  if (!user.isAdmin) {
    return (
      <>
        <PageHeader title="Site settings" />
        <p className="text-stone-700">Only site administrators can change site settings.</p>
      </>
    );
  }
  return <SiteSettingsPage currentUserId={user.id} />;
}

function SiteSettingsPage({ currentUserId }: { currentUserId: number }) {
  const settings = useSiteSettings();
  const queryClient = useQueryClient();
  return (
    <>
      <PageHeader title="Site settings" />
      <section
        aria-labelledby="accounts-title"
        className="max-w-2xl rounded-xl border border-stone-200 bg-white p-6"
      >
        <h2 id="accounts-title" className="mb-4 text-lg font-semibold">
          Accounts
        </h2>
        {settings.isPending ? (
          <Loading label="Loading settings…" />
        ) : settings.isError ? (
          <ErrorPanel error={settings.error} onRetry={() => void settings.refetch()} />
        ) : (
          <SignUpSwitch
            settings={settings.data}
            // The session carries signupEnabled for the sign-in page.
            onChanged={() =>
              void queryClient.invalidateQueries({ queryKey: getSessionQueryOptions().queryKey })
            }
          />
        )}
      </section>
      <section
        aria-labelledby="users-title"
        className="mt-6 rounded-xl border border-stone-200 bg-white p-6"
      >
        <h2 id="users-title" className="mb-4 text-lg font-semibold">
          Users
        </h2>
        <UserList currentUserId={currentUserId} />
      </section>
    </>
  );
}
