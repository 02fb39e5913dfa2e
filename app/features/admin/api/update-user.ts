// PATCH /api/admin/users/:userId: disables or re-enables an account, or gives or takes the site
// administrator role (409 self for one's own account).
import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { api } from '../../../lib/api-client';
import { adminUserSchema, updateAdminUserBody, type AdminUser } from '../../../../shared/api/schemas';
import { getUsersQueryOptions } from './get-users';

export type UpdateUserInput = z.input<typeof updateAdminUserBody>;

export function updateUser(userId: number, input: UpdateUserInput): Promise<AdminUser> {
  return api.patch(`/admin/users/${userId}`, updateAdminUserBody.parse(input), adminUserSchema);
}

export function useUpdateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, change }: { userId: number; change: UpdateUserInput }) =>
      updateUser(userId, change),
    onSettled: () => queryClient.invalidateQueries({ queryKey: getUsersQueryOptions().queryKey }),
  });
}
