// POST /api/account/password: a new password, given the current one (400 with
// fields.currentPassword when that is wrong). Answers 204 No Content; every other session of the
// account ends.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import { changePasswordBody } from '../../../../shared/api/schemas';
import { getAccountQueryOptions } from './get-account';

export type ChangePasswordInput = z.input<typeof changePasswordBody>;

export async function changePassword(input: ChangePasswordInput): Promise<void> {
  await api.post('/account/password', changePasswordBody.parse(input), z.undefined());
}

export function useChangePassword() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: changePassword,
    onSuccess: () =>
      queryClient.invalidateQueries({ queryKey: getAccountQueryOptions().queryKey }),
  });
}
