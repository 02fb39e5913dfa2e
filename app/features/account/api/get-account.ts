// GET /api/account: the signed-in user's own account, when it was made, how many other sessions.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { accountSchema, type Account } from '../../../../shared/api/schemas';

export function getAccount(signal?: AbortSignal): Promise<Account> {
  return api.get('/account', accountSchema, { signal });
}

export function getAccountQueryOptions() {
  return queryOptions({
    queryKey: ['account'] as const,
    queryFn: ({ signal }) => getAccount(signal),
  });
}

export function useAccount() {
  return useQuery(getAccountQueryOptions());
}
