// Guards the signed-in part of the app: waits for the session, sends visitors to /sign-in
// (remembering where they were going), and lets signed-in users through.
import type { ReactNode } from 'react';
import { Navigate, useLocation } from 'react-router';
import { ErrorPanel, Loading } from '../../../components/ui/status';
import { useSession } from '../api/get-session';

export function RequireUser({ children }: { children: ReactNode }) {
  const session = useSession();
  const location = useLocation();
  if (session.isPending) return <Loading label="Checking your session…" />;
  if (session.isError)
    return <ErrorPanel error={session.error} onRetry={() => void session.refetch()} />;
  if (!session.data.user) {
    const from = `${location.pathname}${location.search}`;
    return <Navigate to="/sign-in" replace state={{ from }} />;
  }
  return children;
}
