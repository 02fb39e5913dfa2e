// PATCH /api/account: changes the name shown beside one's revisions and comments.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { api } from '../../../lib/api-client';
import { accountSchema, updateAccountBody, type Account } from '../../../../shared/api/schemas';
import { getAccountQueryOptions } from './get-account';

export type UpdateAccountInput = z.input<typeof updateAccountBody>;

export function updateAccount(input: UpdateAccountInput): Promise<Account> {
  return api.patch('/account', updateAccountBody.parse(input), accountSchema);
}

export function useUpdateAccount() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateAccount,
    onSuccess: (account) => queryClient.setQueryData(getAccountQueryOptions().queryKey, account),
  });
}
