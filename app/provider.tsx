// App-wide providers: one query client, wired so that the API client takes its CSRF token from
// the cached session and a 401 anywhere re-checks the session (which sends the user to sign in).
import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import { useState, type ReactNode } from 'react';
import { getSessionQueryOptions } from './features/auth/api/get-session';
import { setCsrfTokenSource } from './lib/api-client';
import { createQueryClient } from './lib/query-client';

function createWiredQueryClient(): QueryClient {
  const sessionQuery = getSessionQueryOptions();
  const queryClient: QueryClient = createQueryClient(() => {
    void queryClient.invalidateQueries({ queryKey: sessionQuery.queryKey });
  });
  setCsrfTokenSource({
    current: async () => (await queryClient.ensureQueryData(sessionQuery)).csrfToken,
    refresh: async () =>
      (await queryClient.fetchQuery({ ...sessionQuery, staleTime: 0 })).csrfToken,
  });
  return queryClient;
}

export function AppProvider({ children }: { children: ReactNode }) {
  const [queryClient] = useState(createWiredQueryClient);
  return <QueryClientProvider client={queryClient}>{children}</QueryClientProvider>;
}
