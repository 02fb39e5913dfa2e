// GET /api/admin/users: every account on the site with its site role and state (site administrators only).
import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import { adminUserSchema, type AdminUser } from '../../../../shared/api/schemas';

export function getUsers(signal?: AbortSignal): Promise<AdminUser[]> {
  return api.get('/admin/users', z.array(adminUserSchema), { signal });
}

export function getUsersQueryOptions() {
  return queryOptions({
    queryKey: ['admin-users'] as const,
    queryFn: ({ signal }) => getUsers(signal),
  });
}

export function useUsers() {
  return useQuery(getUsersQueryOptions());
}
