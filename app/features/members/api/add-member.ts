// POST /api/projects/:projectId/members: adds someone who already has an account (owners only).
import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { api } from '../../../lib/api-client';
import { addMemberBody, memberSchema, type Member } from '../../../../shared/api/schemas';
import { getMembersQueryOptions } from './get-members';

export type AddMemberInput = z.input<typeof addMemberBody>;

export function addMember(projectId: number, input: AddMemberInput): Promise<Member> {
  return api.post(`/projects/${projectId}/members`, addMemberBody.parse(input), memberSchema);
}

export function useAddMember(projectId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: AddMemberInput) => addMember(projectId, input),
    onSuccess: () =>
      queryClient.invalidateQueries({ queryKey: getMembersQueryOptions(projectId).queryKey }),
  });
}
