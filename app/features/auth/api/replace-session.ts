// After sign-in, sign-out or sign-up the server answers with the new session (and a new CSRF
// token): store it and drop every other cached answer, which belonged to the previous user.
import type { QueryClient } from '@tanstack/react-query';
import type { Session } from '../../../../shared/api/schemas';
import { getSessionQueryOptions } from './get-session';

export function replaceSession(queryClient: QueryClient, session: Session): void {
  const sessionKey = getSessionQueryOptions().queryKey;
  queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== sessionKey[0] });
  queryClient.setQueryData(sessionKey, session);
}
