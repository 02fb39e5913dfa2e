// DELETE /api/projects/:projectId/members/:userId: takes someone out of a project (owners only;
// 409 last_owner for the only owner).
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { getMembersQueryOptions } from './get-members';

export function removeMember(projectId: number, userId: number): Promise<void> {
  return api.delete(`/projects/${projectId}/members/${userId}`);
}

export function useRemoveMember(projectId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (userId: number) => removeMember(projectId, userId),
    onSuccess: () =>
      queryClient.invalidateQueries({ queryKey: getMembersQueryOptions(projectId).queryKey }),
  });
}
