// PATCH /api/projects/:projectId/members/:userId: gives a member another role (owners only;
// 409 last_owner when that would leave the project without an owner).
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { changeRoleBody, memberSchema, type Member } from '../../../../shared/api/schemas';
import type { ProjectRole } from '../../../../shared/api/roles';
import { getMembersQueryOptions } from './get-members';

export function changeMemberRole(
  projectId: number,
  userId: number,
  role: ProjectRole,
): Promise<Member> {
  return api.patch(
    `/projects/${projectId}/members/${userId}`,
    changeRoleBody.parse({ role }),
    memberSchema,
  );
}

export function useChangeMemberRole(projectId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, role }: { userId: number; role: ProjectRole }) =>
      changeMemberRole(projectId, userId, role),
    onSettled: () =>
      queryClient.invalidateQueries({ queryKey: getMembersQueryOptions(projectId).queryKey }),
  });
}
