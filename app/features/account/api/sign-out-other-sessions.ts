// POST /api/account/sign-out-others: ends every session of this account except this browser's.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import { getAccountQueryOptions } from './get-account';

// The answer's shape is not among the shared schemas; it is this one number.
const signedOutSchema = z.object({ signedOut: z.number().int().nonnegative() });

export function signOutOtherSessions(): Promise<z.output<typeof signedOutSchema>> {
  return api.post('/account/sign-out-others', {}, signedOutSchema);
}

export function useSignOutOtherSessions() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signOutOtherSessions,
    onSuccess: () =>
      queryClient.invalidateQueries({ queryKey: getAccountQueryOptions().queryKey }),
  });
}
