// GET /api/projects/:projectId/members: everyone in a project and their role.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import { memberSchema, type Member } from '../../../../shared/api/schemas';

export function getMembers(projectId: number, signal?: AbortSignal): Promise<Member[]> {
  return api.get(`/projects/${projectId}/members`, z.array(memberSchema), { signal });
}

export function getMembersQueryOptions(projectId: number) {
  return queryOptions({
    queryKey: ['members', projectId] as const,
    queryFn: ({ signal }) => getMembers(projectId, signal),
  });
}

export function useMembers(projectId: number) {
  return useQuery(getMembersQueryOptions(projectId));
}
