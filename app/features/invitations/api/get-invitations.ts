// GET /api/projects/:projectId/invitations: everyone invited to a project, in any state (owners only).
import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import { invitationSchema, type Invitation } from '../../../../shared/api/schemas';

export function getInvitations(projectId: number, signal?: AbortSignal): Promise<Invitation[]> {
  return api.get(`/projects/${projectId}/invitations`, z.array(invitationSchema), { signal });
}

export function getInvitationsQueryOptions(projectId: number) {
  return queryOptions({
    queryKey: ['invitations', projectId] as const,
    queryFn: ({ signal }) => getInvitations(projectId, signal),
  });
}

export function useInvitations(projectId: number) {
  return useQuery(getInvitationsQueryOptions(projectId));
}
