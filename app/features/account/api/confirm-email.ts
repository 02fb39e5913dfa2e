// POST /api/account/email/confirm: the link mailed to the new address makes it the account's e-mail.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { api } from '../../../lib/api-client';
import { accountSchema, confirmEmailBody, type Account } from '../../../../shared/api/schemas';
import { getAccountQueryOptions } from './get-account';

export type ConfirmEmailInput = z.input<typeof confirmEmailBody>;

export function confirmEmail(input: ConfirmEmailInput): Promise<Account> {
  return api.post('/account/email/confirm', confirmEmailBody.parse(input), accountSchema);
}

export function useConfirmEmail() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: confirmEmail,
    onSuccess: (account) => queryClient.setQueryData(getAccountQueryOptions().queryKey, account),
  });
}
