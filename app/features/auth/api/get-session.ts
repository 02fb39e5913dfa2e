// GET /api/auth/session: who is signed in, the CSRF token for changes, whether sign-up is open.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { sessionSchema, type Session } from '../../../../shared/api/schemas';

export function getSession(signal?: AbortSignal): Promise<Session> {
  return api.get('/auth/session', sessionSchema, { signal });
}

export function getSessionQueryOptions() {
  return queryOptions({
    queryKey: ['session'],
    queryFn: ({ signal }) => getSession(signal),
    staleTime: 60_000,
  });
}

export function useSession() {
  return useQuery(getSessionQueryOptions());
}
